import { useMemo } from 'react';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { LabourUnitEntry } from '../../../../shared/schemas/catalogue';
import { EditableNumber } from './editable-cell';
import { DataCell, DataTableHead, DenseTable } from '../../../components/ui/data-table-parts';

const col = createColumnHelper<LabourUnitEntry>();
const PER: Record<LabourUnitEntry['per'], string> = { each: 'each', termination: 'per termination', foot: 'per foot' };

export function LabourUnitsTable({
  units,
  canEdit,
  onChange,
}: {
  units: LabourUnitEntry[];
  canEdit: boolean;
  onChange: (u: LabourUnitEntry, hours: number) => void;
}) {
  const columns = useMemo(
    () => [
      col.accessor('key', { header: 'Unit', cell: (c) => <span className="font-semibold">{c.getValue()}</span> }),
      col.accessor('description', { header: 'What it covers' }),
      col.accessor('per', { header: 'Counted', cell: (c) => PER[c.getValue()] }),
      col.accessor('hours', {
        header: 'Hours (h)',
        meta: { numeric: true },
        cell: (c) =>
          canEdit ? (
            <EditableNumber
              label={`Hours for ${c.row.original.key}`}
              value={c.getValue()}
              format={(n) => n.toFixed(3)}
              onSave={(n) => onChange(c.row.original, n)}
            />
          ) : (
            c.getValue().toFixed(3)
          ),
      }),
      col.accessor((u) => u.hours * 60, {
        id: 'minutes',
        header: 'Minutes (min)',
        meta: { numeric: true },
        cell: (c) => c.getValue().toFixed(1),
      }),
    ],
    [canEdit, onChange],
  );
  const table = useReactTable({ data: units, columns, getCoreRowModel: getCoreRowModel() });
  return (
    <DenseTable label="Labour units">
      <DataTableHead table={table} canSort={() => false} />
      <tbody>
        {table.getRowModel().rows.map((r) => (
          <tr key={r.id} className="border-b border-line/60 last:border-0">
            {r.getVisibleCells().map((c) => (
              <DataCell key={c.id} cell={c} className="px-2 py-1.5" />
            ))}
          </tr>
        ))}
      </tbody>
    </DenseTable>
  );
}
