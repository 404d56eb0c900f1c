import { useMemo, useState } from 'react';
import {
  createColumnHelper,
  getCoreRowModel,
  getExpandedRowModel,
  getFilteredRowModel,
  getGroupedRowModel,
  getSortedRowModel,
  useReactTable,
  type ExpandedState,
  type GroupingState,
  type SortingState,
} from '@tanstack/react-table';
import {
  CATEGORY_IDS,
  CATEGORY_LABELS,
  type CatalogueEntry,
  type Category,
  type ItemChanges,
  type Ratings,
} from '../../../../shared/schemas/catalogue';
import { OutlineCell } from './outline-cell';
import { EditableNumber } from './editable-cell';
import { formatAmount as money } from '../../../../shared/format/money';
import { ratingValueLabel } from '../../../../shared/labels';
import { DataCell, DataTableHead, DenseTable } from '../../../components/ui/data-table-parts';

/** The ratings that identify an item, in a short line (volts, amps, hp, size, range …). */
export function ratingsSummary(r: Ratings): string {
  const p: string[] = [];
  if (r.nemaSize) p.push(`NEMA ${r.nemaSize}`);
  if (r.volts) p.push(`${r.voltsMin ? `${r.voltsMin}–` : ''}${r.volts} V`);
  if (r.amps) p.push(`${r.amps} A`);
  if (r.iecAc3Amps) p.push(`AC-3 ${r.iecAc3Amps} A`);
  if (r.settingMinAmps !== undefined && r.settingMaxAmps !== undefined) p.push(`${r.settingMinAmps}–${r.settingMaxAmps} A`);
  if (r.tripClasses) p.push(`class ${r.tripClasses.join('/')}`);
  if (r.normalDutyAmps) p.push(`ND ${r.normalDutyAmps} A / HD ${r.heavyDutyAmps} A`);
  if (r.fuseClass) p.push(`class ${r.fuseClass}`);
  if (r.va) p.push(`${r.va} VA`);
  if (r.kaic) p.push(`${r.kaic} kA IC`);
  if (r.hpByVolts)
    p.push(
      Object.entries(r.hpByVolts)
        .map(([v, hp]) => `${hp} hp@${v}`)
        .join(' '),
    );
  if (r.wireSize) p.push(`${r.wireSize} AWG/kcmil`);
  if (r.nemaType) p.push(`Type ${r.nemaType}`);
  if (r.heightMm) p.push(`${r.heightMm}×${r.widthMm}×${r.depthMm} mm`);
  if (r.kind) p.push(ratingValueLabel(r.kind));
  if (r.function) p.push(ratingValueLabel(r.function));
  return p.join(' · ');
}

const col = createColumnHelper<CatalogueEntry>();
const CATEGORY_ORDER = new Map(CATEGORY_IDS.map((c, i) => [c, i]));

export function CatalogueTable({
  items,
  canEdit,
  onChange,
  onHistory,
  historyOf,
}: {
  items: CatalogueEntry[];
  canEdit: boolean;
  onChange: (item: CatalogueEntry, changes: ItemChanges) => void;
  onHistory: (item: CatalogueEntry) => void;
  historyOf: number | null;
}) {
  const [sorting, setSorting] = useState<SortingState>([]);
  // the catalogue's own category order, then code: the order groups and rows show in until a column is sorted
  const data = useMemo(
    () =>
      [...items].sort(
        (a, b) => (CATEGORY_ORDER.get(a.category) ?? 99) - (CATEGORY_ORDER.get(b.category) ?? 99) || a.code.localeCompare(b.code),
      ),
    [items],
  );
  const [text, setText] = useState('');
  const [category, setCategory] = useState<Category | ''>('');
  const [grouped, setGrouped] = useState(true);
  const [expanded, setExpanded] = useState<ExpandedState>({});
  // stable state objects: a new array each render would regroup every render (and loop through the table's auto-resets)
  const grouping = useMemo<GroupingState>(() => (grouped ? ['category'] : []), [grouped]);
  const columnFilters = useMemo(() => (category ? [{ id: 'category', value: category }] : []), [category]);
  const columns = useMemo(
    () => [
      col.accessor('category', {
        header: 'Category',
        cell: (c) => CATEGORY_LABELS[c.getValue()],
        filterFn: 'equalsString',
      }),
      col.accessor('code', { header: 'Code', cell: (c) => <span className="font-semibold">{c.getValue()}</span> }),
      col.accessor('description', { header: 'Description' }),
      col.accessor((i) => ratingsSummary(i.ratings), { id: 'ratings', header: 'Ratings', enableSorting: false }),
      col.accessor('sccrKa', { header: 'SCCR (kA)', meta: { numeric: true }, cell: (c) => c.getValue() ?? '—' }),
      col.accessor('heatLossW', { header: 'Heat (W)', meta: { numeric: true } }),
      col.display({
        id: 'outline',
        header: 'Size W × H × D (mm)',
        meta: { numeric: true },
        cell: (c) => <OutlineCell item={c.row.original} canEdit={canEdit} onChange={onChange} />,
      }),
      col.accessor('unitCost', {
        header: 'Unit cost ($)',
        meta: { numeric: true },
        cell: (c) =>
          canEdit ? (
            <EditableNumber
              label={`Unit cost of ${c.row.original.code}`}
              value={c.getValue()}
              format={money}
              onSave={(n) => onChange(c.row.original, { unitCost: n })}
            />
          ) : (
            money(c.getValue())
          ),
      }),
      col.accessor('labourHours', {
        header: 'Labour adder (h)',
        meta: { numeric: true },
        cell: (c) =>
          canEdit ? (
            <EditableNumber
              label={`Labour adder of ${c.row.original.code}`}
              value={c.getValue()}
              onSave={(n) => onChange(c.row.original, { labourHours: n })}
            />
          ) : (
            c.getValue()
          ),
      }),
      col.accessor('leadTimeDays', {
        header: 'Lead time (d)',
        meta: { numeric: true },
        cell: (c) =>
          canEdit ? (
            <EditableNumber
              label={`Lead time of ${c.row.original.code}`}
              integer
              value={c.getValue()}
              onSave={(n) => onChange(c.row.original, { leadTimeDays: n })}
            />
          ) : (
            c.getValue()
          ),
      }),
      col.accessor('active', {
        header: 'Active',
        cell: (c) =>
          canEdit ? (
            <label className="inline-flex items-center gap-1 text-xs">
              <input
                type="checkbox"
                checked={c.getValue()}
                onChange={(e) => onChange(c.row.original, { active: e.target.checked })}
                aria-label={`${c.row.original.code} active`}
              />
              {c.getValue() ? 'active' : <span className="font-semibold text-state-returned">✖ inactive</span>}
            </label>
          ) : c.getValue() ? (
            'active'
          ) : (
            <span className="font-semibold text-state-returned">✖ inactive</span>
          ),
      }),
      col.display({
        id: 'history',
        header: () => <span className="sr-only">History</span>,
        cell: (c) => (
          <button
            type="button"
            aria-pressed={historyOf === c.row.original.id}
            className="text-xs font-semibold text-copper-700 hover:underline"
            onClick={() => onHistory(c.row.original)}
          >
            History
          </button>
        ),
      }),
    ],
    [canEdit, onChange, onHistory, historyOf],
  );

  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: text, columnFilters, grouping, expanded: text || category ? true : expanded },
    onSortingChange: setSorting,
    onExpandedChange: setExpanded,
    globalFilterFn: (row, _id, value: string) => {
      const q = value.toLowerCase();
      const i = row.original;
      return i.code.toLowerCase().includes(q) || i.description.toLowerCase().includes(q);
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getGroupedRowModel: getGroupedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
    autoResetExpanded: false,
    autoResetPageIndex: false,
  });
  const rows = table.getRowModel().rows;
  const leafCount = table.getFilteredRowModel().rows.length;

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end gap-3" role="search" aria-label="Filter the catalogue">
        <label className="flex flex-col gap-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Code or description
          <input
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="e.g. contactor 460"
            className="w-64 rounded border border-line bg-panel px-2 py-1.5 text-sm font-normal normal-case text-ink"
          />
        </label>
        <label className="flex flex-col gap-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Category
          <select
            value={category}
            onChange={(e) => setCategory(e.target.value as Category | '')}
            className="w-72 rounded border border-line bg-panel px-2 py-1.5 text-sm font-normal normal-case text-ink"
          >
            <option value="">All categories</option>
            {Object.entries(CATEGORY_LABELS).map(([id, label]) => (
              <option key={id} value={id}>
                {label}
              </option>
            ))}
          </select>
        </label>
        <label className="flex items-center gap-1.5 pb-1.5 text-sm">
          <input type="checkbox" checked={grouped} onChange={(e) => setGrouped(e.target.checked)} /> Group by category
        </label>
        {grouped && !text && !category ? (
          <span className="flex gap-2 pb-1.5 text-sm">
            <button type="button" className="text-copper-700 hover:underline" onClick={() => setExpanded(true)}>
              Expand all
            </button>
            <button type="button" className="text-copper-700 hover:underline" onClick={() => setExpanded({})}>
              Collapse all
            </button>
          </span>
        ) : null}
        <span className="ml-auto pb-1.5 text-sm text-ink-soft" aria-live="polite">
          {leafCount} item{leafCount === 1 ? '' : 's'}
        </span>
      </div>
      <DenseTable label="Catalogue" frameClassName="max-h-[70vh] overflow-auto">
        <DataTableHead table={table} sticky />
        <tbody>
          {rows.map((row) =>
            row.getIsGrouped() ? (
              <tr key={row.id} className="border-b border-line bg-copper-50/60">
                <td colSpan={row.getVisibleCells().length} className="px-2 py-1.5">
                  <button
                    type="button"
                    className="inline-flex items-center gap-2 font-semibold"
                    aria-expanded={row.getIsExpanded()}
                    onClick={row.getToggleExpandedHandler()}
                  >
                    <span aria-hidden>{row.getIsExpanded() ? '▾' : '▸'}</span>
                    {CATEGORY_LABELS[row.getValue('category') as Category]}
                    <span className="font-normal text-ink-soft">({row.subRows.length})</span>
                  </button>
                </td>
              </tr>
            ) : (
              <tr
                key={row.id}
                className={`border-b border-line/60 last:border-0 ${row.original.active ? 'hover:bg-copper-50' : 'text-ink-soft'}`}
              >
                {row.getVisibleCells().map((cell) => (
                  <DataCell
                    key={cell.id}
                    cell={cell}
                    className={`px-2 py-1 ${cell.column.id === 'ratings' ? 'text-xs text-ink-soft' : ''}`}
                    empty={cell.getIsPlaceholder()}
                  />
                ))}
              </tr>
            ),
          )}
        </tbody>
      </DenseTable>
    </div>
  );
}
