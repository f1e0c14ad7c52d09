// @ts-nocheck
import { flexRender, type Header } from '@tanstack/react-table';

/** A column heading of a TanStack table: a button that sorts by the column when it can, with the order shown. */
export function SortHeader<T>({ header, className = '' }: { header: Header<T, unknown>; className?: string }) {
  const sorted = header.column.getIsSorted();
  const label = flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th scope="col" aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined} className={className}>
      {header.column.getCanSort() ? (
        <button type="button" onClick={header.column.getToggleSortingHandler()} className="hover:text-ink">
          {label}
          <span aria-hidden className="ml-0.5">
            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : ''}
          </span>
        </button>
      ) : (
        label
      )}
    </th>
  );
}
