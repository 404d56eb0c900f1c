import { useMemo } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { LabourUnitEntry } from '../api/catalogue';
import { EditableNumber } from './editable-cell';

const col = createColumnHelper<LabourUnitEntry>();
const PER: Record<LabourUnitEntry['per'], string> = { each: 'each', termination: 'per termination', foot: 'per foot' };

export function LabourUnitsTable({ units, canEdit, onChange }: { units: LabourUnitEntry[]; canEdit: boolean; onChange: (u: LabourUnitEntry, hours: number) => void }) {
  const columns = useMemo(
    () => [
      col.accessor('key', { header: 'Unit', cell: (c) => <span className="font-semibold">{c.getValue()}</span> }),
      col.accessor('description', { header: 'What it covers' }),
      col.accessor('per', { header: 'Counted', cell: (c) => PER[c.getValue()] }),
      col.accessor('hours', {
        header: 'Hours (h)',
        meta: { numeric: true },
        cell: (c) =>
          canEdit ? <EditableNumber label={`Hours for ${c.row.original.key}`} value={c.getValue()} format={(n) => n.toFixed(3)} onSave={(n) => onChange(c.row.original, n)} /> : c.getValue().toFixed(3),
      }),
      col.accessor((u) => u.hours * 60, { id: 'minutes', header: 'Minutes (min)', meta: { numeric: true }, cell: (c) => c.getValue().toFixed(1) }),
    ],
    [canEdit, onChange],
  );
  const table = useReactTable({ data: units, columns, getCoreRowModel: getCoreRowModel() });
  return (
    <div className="overflow-x-auto rounded border border-line bg-panel">
      <table className="dense w-full text-sm" aria-label="Labour units">
        <thead className="border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => (
                <th key={h.id} className={`px-2 py-2 ${(h.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric ? 'text-right' : ''}`}>
                  {flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className="border-b border-line/60 last:border-0">
              {r.getVisibleCells().map((c) => (
                <td key={c.id} className={`px-2 py-1.5 ${(c.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric ? 'text-right tabular-nums' : ''}`}>
                  {flexRender(c.column.columnDef.cell, c.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
