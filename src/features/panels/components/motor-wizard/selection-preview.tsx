import type { LoadView } from '../../../../../shared/schemas/panel';
import { Caution } from '../../../../components/ui/feedback';
import { OverrideEditor } from '../override-editor';
import { SelectionSummary } from '../selection-summary';
import type { SelectionPreviewState } from './use-selection-preview';

/** The aside beside the wizard: the live selection, the saved motor's overrides, the caution. */
export function SelectionPreview({
  preview,
  codeEdition,
  panelId,
  existing,
}: {
  preview: SelectionPreviewState;
  codeEdition: string;
  panelId: number;
  existing: LoadView | undefined;
}) {
  return (
    <aside className="space-y-3" aria-label="Selection preview">
      <div className="rounded border border-line bg-panel p-4">
        <h2 className="mb-2 flex items-center justify-between text-lg font-semibold">
          Selection <span className="text-xs font-normal text-ink-soft">live, NEC {codeEdition}</span>
        </h2>
        {preview.error ? <p className="mb-2 text-sm text-state-review">◔ {preview.error}</p> : null}
        {preview.sel ? <SelectionSummary selection={preview.sel} /> : null}
      </div>
      {existing?.selection ? <OverrideEditor panelId={panelId} load={existing} /> : null}
      <Caution compact />
    </aside>
  );
}
