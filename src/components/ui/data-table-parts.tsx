// Parts of the dense data tables built with TanStack Table: the frame, the header rows with click-to-sort
// headers, and a body cell. A column marked `meta: { numeric: true }` is right-aligned with tabular figures.
import type { ReactNode } from 'react';
import { flexRender, type Cell, type Column, type Header, type RowData, type Table } from '@tanstack/react-table';

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData extends RowData, TValue> {
    /** right-aligned, with tabular figures */
    numeric?: boolean;
  }
}

export const isNumeric = <T,>(column: Column<T, unknown>): boolean => column.columnDef.meta?.numeric === true;

/** A dense table in a bordered frame; the frame scrolls sideways unless `frameClassName` says otherwise. */
export function DenseTable({
  label,
  frameClassName = 'overflow-x-auto',
  children,
}: {
  label: string;
  frameClassName?: string;
  children: ReactNode;
}) {
  return (
    <div className={`${frameClassName} rounded border border-line bg-panel`}>
      <table className="dense w-full text-sm" aria-label={label}>
        {children}
      </table>
    </div>
  );
}

/** A column header: a button that sorts the column (▲ ascending, ▼ descending) when `sortable`, plain text otherwise. */
export function SortableHeader<T>({ header, sortable }: { header: Header<T, unknown>; sortable: boolean }) {
  const sorted = header.column.getIsSorted();
  const label = flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th
      className={`px-2 py-2 ${isNumeric(header.column) ? 'text-right' : ''}`}
      aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
    >
      {sortable ? (
        <button
          type="button"
          className="inline-flex items-center gap-1 uppercase hover:text-ink"
          onClick={header.column.getToggleSortingHandler()}
        >
          {label}
          <span aria-hidden>{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}</span>
        </button>
      ) : (
        label
      )}
    </th>
  );
}

/** The header rows of a table; by default a header sorts when its column can sort. `sticky` keeps it in view while the frame scrolls. */
export function DataTableHead<T>({
  table,
  sticky = false,
  canSort = (column) => column.getCanSort(),
}: {
  table: Table<T>;
  sticky?: boolean;
  canSort?: (column: Column<T, unknown>) => boolean;
}) {
  return (
    <thead
      className={`${sticky ? 'sticky top-0 z-10 ' : ''}border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft`}
    >
      {table.getHeaderGroups().map((hg) => (
        <tr key={hg.id}>
          {hg.headers.map((h) => (
            <SortableHeader key={h.id} header={h} sortable={canSort(h.column)} />
          ))}
        </tr>
      ))}
    </thead>
  );
}

/** A body cell showing the column's cell renderer, or `children` when given; `empty` leaves it blank. */
export function DataCell<T>({
  cell,
  className,
  empty = false,
  children,
}: {
  cell: Cell<T, unknown>;
  className: string;
  empty?: boolean;
  children?: ReactNode;
}) {
  const content = empty ? null : children !== undefined ? children : flexRender(cell.column.columnDef.cell, cell.getContext());
  return <td className={`${className} ${isNumeric(cell.column) ? 'text-right tabular-nums' : ''}`}>{content}</td>;
}
