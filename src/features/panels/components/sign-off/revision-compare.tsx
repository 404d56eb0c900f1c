import { useState } from 'react';
import type { PanelDetail } from '../../../../../shared/schemas/panel';
import { inputClass } from '../../../../components/ui/field';
import { ChangeReport } from '../change-report';

function RevisionSelect({
  label,
  value,
  revisions,
  onPick,
}: {
  label: string;
  value: number | null;
  revisions: PanelDetail['revisions'];
  onPick: (n: number) => void;
}) {
  return (
    <select aria-label={label} className={`${inputClass} w-24`} value={value ?? ''} onChange={(e) => onPick(Number(e.target.value))}>
      {revisions.map((r) => (
        <option key={r.number} value={r.number}>
          R{r.number}
        </option>
      ))}
    </select>
  );
}

/** The change report between two signed-off revisions, the last two unless the reader picks others. */
export function RevisionCompare({ panelId, revisions }: { panelId: number; revisions: PanelDetail['revisions'] }) {
  const [from, setFrom] = useState<number | null>(null);
  const [to, setTo] = useState<number | null>(null);
  const a = from ?? (revisions.length > 1 ? revisions[revisions.length - 2].number : null);
  const b = to ?? (revisions.length > 1 ? revisions[revisions.length - 1].number : null);
  return (
    <section className="rounded border border-line bg-panel p-4">
      <h2 className="mb-2 text-lg font-semibold">Change report</h2>
      {revisions.length < 2 ? (
        <p className="text-sm text-ink-soft">
          Two signed-off revisions are needed to compare. {revisions.length === 1 ? `R${revisions[0].number} exists.` : ''}
        </p>
      ) : (
        <>
          <div className="mb-2 flex items-center gap-2 text-sm">
            Compare
            <RevisionSelect label="From revision" value={a} revisions={revisions} onPick={setFrom} />
            with
            <RevisionSelect label="To revision" value={b} revisions={revisions} onPick={setTo} />
          </div>
          {a !== null && b !== null ? <ChangeReport panelId={panelId} from={a} to={b} /> : null}
        </>
      )}
    </section>
  );
}
