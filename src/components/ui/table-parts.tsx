import { flexRender, type Header, type Table } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Button } from './button';

type SortableHeaderProps<T> = { header: Header<T, unknown>; children: ReactNode };

// A column header that sorts on click, announcing its order through aria-sort (WAI-ARIA
// "Sortable Table" example).
export function SortableHeader<T>({ header, children }: SortableHeaderProps<T>) {
  const column = header.column;
  if (!column.getCanSort()) {
    return (
      <th scope="col" className="pb-2 pr-4 font-semibold">
        {children}
      </th>
    );
  }
  const order = column.getIsSorted();
  return (
    <th
      scope="col"
      aria-sort={order === 'asc' ? 'ascending' : order === 'desc' ? 'descending' : 'none'}
      className="pb-2 pr-4 font-semibold"
    >
      <button
        type="button"
        onClick={column.getToggleSortingHandler()}
        className="inline-flex items-center gap-1 rounded-sm font-semibold text-ink-soft hover:text-ink"
      >
        {children}
        <svg viewBox="0 0 16 16" className="size-3.5" aria-hidden="true" focusable="false">
          <path d="M5 6.5 8 3.5l3 3" fill="none" stroke="currentColor" strokeWidth="1.6" opacity={order === 'asc' ? 1 : 0.35} />
          <path d="M5 9.5 8 12.5l3-3" fill="none" stroke="currentColor" strokeWidth="1.6" opacity={order === 'desc' ? 1 : 0.35} />
        </svg>
      </button>
    </th>
  );
}

export function TablePager<T>({ table, noun }: { table: Table<T>; noun: string }) {
  const { pageIndex, pageSize } = table.getState().pagination;
  const count = table.getRowCount();
  if (count <= pageSize) return null;
  const first = pageIndex * pageSize + 1;
  const last = Math.min(count, first + pageSize - 1);
  return (
    <nav aria-label={`Pages of ${noun}`} className="flex flex-wrap items-center justify-between gap-3 text-sm">
      <p className="text-ink-soft tabular-nums" aria-live="polite">
        {first}–{last} of {count} {noun}
      </p>
      <div className="flex gap-2">
        <Button size="sm" variant="secondary" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
          Previous page
        </Button>
        <Button size="sm" variant="secondary" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
          Next page
        </Button>
      </div>
    </nav>
  );
}

// The header row of a TanStack table, every column sortable where its definition allows.
export function SortableTableHead<T>({ table }: { table: Table<T> }) {
  return (
    <thead>
      {table.getHeaderGroups().map((group) => (
        <tr key={group.id} className="border-b border-sand text-left text-sm text-ink-soft">
          {group.headers.map((header) => (
            <SortableHeader key={header.id} header={header}>
              {flexRender(header.column.columnDef.header, header.getContext())}
            </SortableHeader>
          ))}
        </tr>
      ))}
    </thead>
  );
}
