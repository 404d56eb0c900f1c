// A catalogue item's outline (width × height × depth, mm) and, for a drive or soft starter, the clearance it
// needs above and below: each figure edited in place like the price; the server checks the whole item.
import type { CatalogueEntry, ItemChanges } from '../../../../shared/schemas/catalogue';
import { EditableNumber } from './editable-cell';

const FIELDS = [
  ['outlineWidthMm', 'width'],
  ['outlineHeightMm', 'height'],
  ['outlineDepthMm', 'depth'],
] as const;
const CLEARANCES = [
  ['clearanceAboveMm', 'clearance above'],
  ['clearanceBelowMm', 'clearance below'],
] as const;
const CLEARANCE_CATEGORIES = new Set(['vfd', 'soft-starter', 'dc-drive']);
const mm = (n: number) => (n > 0 ? String(n) : '—');

export function OutlineCell({
  item,
  canEdit,
  onChange,
}: {
  item: CatalogueEntry;
  canEdit: boolean;
  onChange: (item: CatalogueEntry, changes: ItemChanges) => void;
}) {
  const figure = (key: (typeof FIELDS)[number][0] | (typeof CLEARANCES)[number][0], what: string) => {
    const value = item[key] ?? 0;
    return canEdit ? (
      <EditableNumber label={`${what} of ${item.code} (mm)`} value={value} format={mm} onSave={(n) => onChange(item, { [key]: n })} />
    ) : (
      <span>{mm(value)}</span>
    );
  };
  const clearance = CLEARANCE_CATEGORIES.has(item.category) || (item.clearanceAboveMm ?? 0) > 0 || (item.clearanceBelowMm ?? 0) > 0;
  return (
    <span className="inline-flex flex-col items-end text-right tabular-nums">
      <span className="inline-flex items-center gap-0.5">
        {FIELDS.map(([key, what], i) => (
          <span key={key} className="inline-flex items-center gap-0.5">
            {i > 0 ? <span aria-hidden="true">×</span> : null}
            {figure(key, what)}
          </span>
        ))}
      </span>
      {clearance ? (
        <span className="inline-flex items-center gap-0.5 text-xs text-ink-soft">
          clear ↑{figure(CLEARANCES[0][0], CLEARANCES[0][1])} ↓{figure(CLEARANCES[1][0], CLEARANCES[1][1])}
        </span>
      ) : null}
    </span>
  );
}
