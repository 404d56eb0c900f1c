import { useEffect, useMemo, useRef, useState } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getExpandedRowModel,
  getGroupedRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { extendedCost, extendedLabourHours } from '../../../../shared/calc/bom';
import type { BomTotals } from '../../../../shared/schemas/catalogue';
import type { StoredLine } from '../api/bom';
import { bucketLabel, categoryLabel, hours, qty } from './format';
import { formatAmount as money } from '../../../../shared/format/money';
import { DataCell, DataTableHead, DenseTable } from '../../../components/ui/data-table-parts';

type Row = StoredLine & { extended: number; labour: number };
const col = createColumnHelper<Row>();

function Status({ line }: { line: StoredLine }) {
  if (line.status === 'unmatched') {
    return (
      <span className="inline-flex items-center gap-1 whitespace-nowrap rounded-sm border border-state-returned/40 bg-bad-bg px-1 text-xs font-semibold text-state-returned">
        <span aria-hidden>✖</span> Unmatched
      </span>
    );
  }
  if (line.source === 'swapped')
    return (
      <span className="whitespace-nowrap text-xs font-semibold text-copper-700">
        <span aria-hidden>⇄</span> Swapped
      </span>
    );
  if (line.source === 'manual')
    return (
      <span className="whitespace-nowrap text-xs font-semibold text-state-draft">
        <span aria-hidden>✎</span> Manual
      </span>
    );
  return (
    <span className="whitespace-nowrap text-xs text-state-signed">
      <span aria-hidden>✔</span> Matched
    </span>
  );
}

export interface LineActions {
  onSwap?: (line: StoredLine) => void;
  onRemove?: (line: StoredLine) => void;
  onQuantity?: (line: StoredLine, quantity: number) => void;
}

function QuantityInput({ line, onSave }: { line: StoredLine; onSave: (q: number) => void }) {
  const [text, setText] = useState(String(line.quantity));
  const commit = () => {
    const n = Number(text);
    if (Number.isFinite(n) && n > 0 && n !== line.quantity) onSave(n);
    else setText(String(line.quantity));
  };
  return (
    <input
      aria-label={`Quantity of ${line.description}`}
      inputMode="decimal"
      value={text}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => e.key === 'Enter' && commit()}
      className="w-16 rounded border border-line bg-panel px-1 py-0.5 text-right"
    />
  );
}

/** The key another section uses to point at a line: its bucket and part code. */
export const lineKey = (bucket: string, code: string | null) => `${bucket}|${code ?? ''}`;

/**
 * The bill of materials grouped by bucket (or category), with group subtotals and the panel's totals in the footer.
 * `highlight` (bucket|code, see lineKey) marks the lines another section points at and scrolls to the first.
 */
export function BomTable({
  lines,
  totals,
  actions,
  groupBy,
  highlight = null,
}: {
  lines: StoredLine[];
  totals: BomTotals;
  actions: LineActions;
  groupBy: 'bucket' | 'category';
  highlight?: string | null;
}) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const firstMarked = useRef<HTMLTableRowElement | null>(null);
  // scroll again whenever another section points at another line
  // biome-ignore lint/correctness/useExhaustiveDependencies: highlight is the trigger, read through the marked row's ref
  useEffect(() => {
    firstMarked.current?.scrollIntoView({ block: 'center' });
  }, [highlight]);
  let marked = 0;
  const data = useMemo<Row[]>(() => lines.map((l) => ({ ...l, extended: extendedCost(l), labour: extendedLabourHours(l) })), [lines]);
  const editable = !!(actions.onSwap || actions.onRemove || actions.onQuantity);
  const columns = useMemo(
    () => [
      col.accessor('bucket', { header: 'Bucket', cell: (c) => c.getValue(), sortingFn: 'alphanumeric' }),
      col.accessor('category', { header: 'Category', cell: (c) => categoryLabel(c.getValue()) }),
      col.accessor('code', {
        header: 'Code',
        cell: (c) => (c.getValue() ? <span className="font-semibold">{c.getValue()}</span> : <span className="text-ink-soft">—</span>),
      }),
      col.accessor('description', {
        header: 'Description',
        cell: (c) => {
          const l = c.row.original;
          return (
            <div>
              <div>{l.status === 'unmatched' ? <span className="font-semibold">{l.description}</span> : l.description}</div>
              {l.status === 'unmatched' ? <div className="text-xs text-state-returned">Needs: {l.requiredRatings}</div> : null}
              {l.source === 'swapped' ? (
                <div className="text-xs text-copper-700">
                  {l.swappedFrom ? <>In place of {l.swappedFrom}. </> : null}Reason: {l.swapReason}
                </div>
              ) : null}
            </div>
          );
        },
      }),
      col.display({ id: 'status', header: 'Status', cell: (c) => <Status line={c.row.original} /> }),
      col.accessor('quantity', {
        header: 'Qty',
        meta: { numeric: true },
        cell: (c) =>
          c.row.original.source === 'manual' && actions.onQuantity ? (
            <QuantityInput line={c.row.original} onSave={(q) => actions.onQuantity!(c.row.original, q)} />
          ) : (
            qty(c.getValue())
          ),
      }),
      col.accessor('unit', { header: 'Unit' }),
      col.accessor('unitCost', { header: 'Unit cost ($)', meta: { numeric: true }, cell: (c) => money(c.getValue()) }),
      col.accessor('extended', {
        header: 'Extended ($)',
        meta: { numeric: true },
        aggregationFn: 'sum',
        cell: (c) => money(c.getValue()),
        aggregatedCell: (c) => <strong>{money(Math.round((c.getValue() as number) * 100) / 100)}</strong>,
      }),
      col.accessor('unitLabourHours', { header: 'Labour / unit (h)', meta: { numeric: true }, cell: (c) => c.getValue().toFixed(3) }),
      col.accessor('labour', {
        header: 'Labour (h)',
        meta: { numeric: true },
        aggregationFn: 'sum',
        cell: (c) => hours(c.getValue()),
        aggregatedCell: (c) => <strong>{hours(c.getValue() as number)}</strong>,
      }),
      ...(editable
        ? [
            col.display({
              id: 'actions',
              header: () => <span className="sr-only">Actions</span>,
              cell: (c) => {
                const l = c.row.original;
                return (
                  <span className="flex justify-end gap-2 whitespace-nowrap">
                    {l.source !== 'manual' && actions.onSwap ? (
                      <button
                        type="button"
                        className="text-xs font-semibold text-copper-700 hover:underline"
                        onClick={() => actions.onSwap!(l)}
                      >
                        {l.status === 'unmatched' ? 'Choose part' : 'Swap'}
                      </button>
                    ) : null}
                    {l.source === 'manual' && actions.onRemove ? (
                      <button
                        type="button"
                        className="text-xs font-semibold text-state-returned hover:underline"
                        onClick={() => actions.onRemove!(l)}
                      >
                        Remove
                      </button>
                    ) : null}
                  </span>
                );
              },
            }),
          ]
        : []),
    ],
    [actions, editable],
  );
  const grouping = useMemo(() => [groupBy], [groupBy]);
  const columnVisibility = useMemo(() => ({ [groupBy]: false }), [groupBy]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting, grouping, expanded: true, columnVisibility },
    autoResetPageIndex: false,
    autoResetExpanded: false,
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getGroupedRowModel: getGroupedRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
    groupedColumnMode: false,
  });
  const leafColumns = table.getVisibleLeafColumns();
  const span = leafColumns.findIndex((c) => c.id === 'extended');
  const after = leafColumns.length - span - 1;
  const footer: Array<[string, string, string]> = [
    ['Material', money(totals.materialCost), ''],
    ['Labour', `${hours(totals.labourHours)} h × ${money(totals.labourRate)} /h`, money(totals.labourCost)],
    ['Cost (material + labour)', '', money(totals.cost)],
    [`Markup ${totals.markupPercent} %`, '', money(totals.markup)],
    ['Sell', '', money(totals.sell)],
  ];
  return (
    <DenseTable label="Bill of materials">
      <DataTableHead table={table} canSort={(c) => c.getCanSort() && c.id !== groupBy} />
      <tbody>
        {table.getRowModel().rows.map((row) => {
          if (row.getIsGrouped()) {
            const key = String(row.getValue(groupBy));
            const unmatched = row.subRows.filter((r) => r.original.status === 'unmatched').length;
            return (
              <tr key={row.id} className="border-y border-line bg-copper-50/70" aria-label={`Subtotal ${key}`}>
                <td colSpan={span} className="px-2 py-1.5 font-semibold">
                  {groupBy === 'bucket' ? bucketLabel(key) : categoryLabel(key as StoredLine['category'])}
                  <span className="ml-2 font-normal text-ink-soft">
                    {row.subRows.length} line{row.subRows.length === 1 ? '' : 's'} · subtotal
                  </span>
                  {unmatched ? <span className="ml-2 text-xs font-semibold text-state-returned">✖ {unmatched} unmatched</span> : null}
                </td>
                {leafColumns.slice(span).map((c) => {
                  const cell = row.getAllCells().find((x) => x.column.id === c.id)!;
                  return (
                    <DataCell key={c.id} cell={cell} className="px-2 py-1.5">
                      {cell.getIsAggregated() && (c.id === 'extended' || c.id === 'labour')
                        ? flexRender(c.columnDef.aggregatedCell ?? c.columnDef.cell, cell.getContext())
                        : null}
                    </DataCell>
                  );
                })}
              </tr>
            );
          }
          const l = row.original;
          const isMarked = highlight !== null && lineKey(l.bucket, l.code) === highlight;
          const first = isMarked && marked++ === 0;
          return (
            <tr
              key={row.id}
              id={`bom-line-${l.id}`}
              ref={first ? firstMarked : undefined}
              aria-current={isMarked ? 'true' : undefined}
              className={`border-b border-line/60 ${isMarked ? 'bg-warn-bg outline outline-2 -outline-offset-2 outline-state-review' : l.status === 'unmatched' ? 'bg-bad-bg' : 'hover:bg-copper-50'}`}
            >
              {row.getVisibleCells().map((cell) => (
                <DataCell key={cell.id} cell={cell} className="px-2 py-1 align-top" />
              ))}
            </tr>
          );
        })}
      </tbody>
      <tfoot className="border-t-2 border-ink/30 bg-surface" aria-label="Totals">
        {footer.map(([label, middle, right], i) => (
          <tr key={label} className={i === footer.length - 1 ? 'text-base font-bold' : 'font-semibold'}>
            <th scope="row" colSpan={span - 2} className="px-2 py-1 text-right">
              {label}
            </th>
            <td colSpan={2} className="px-2 py-1 text-right text-xs font-normal text-ink-soft">
              {middle && i > 0 ? middle : ''}
            </td>
            <td className="px-2 py-1 text-right tabular-nums">{i === 0 ? middle : right}</td>
            <td className="px-2 py-1" />
            <td className="px-2 py-1 text-right tabular-nums">{i === 0 ? hours(totals.labourHours) : ''}</td>
            {after > 2 ? <td colSpan={after - 2} /> : null}
          </tr>
        ))}
      </tfoot>
    </DenseTable>
  );
}
