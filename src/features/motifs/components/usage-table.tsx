import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { MotifUsage } from '@shared/contracts/motifs';
import { Badge } from '../../../components/ui/badge';
import { EmptyState } from '../../../components/ui/empty-state';
import { SortableTableHead, TablePager } from '../../../components/ui/table-parts';

const column = createColumnHelper<MotifUsage>();

const columnsFor = (currentVersion: number) => [
  column.accessor('productName', {
    header: 'Product',
    cell: (info) => (
      <Link to={`/products/${info.row.original.productId}`} className="font-semibold break-words text-tide-deep underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('stage', { header: 'Stage', cell: (info) => <span className="capitalize">{info.getValue()}</span> }),
  column.accessor('version', {
    header: 'Version used',
    cell: (info) => (
      <span className="flex flex-wrap items-center gap-2 tabular-nums">
        {info.getValue()}
        {info.getValue() < currentVersion && <Badge tone="ochre">Older than the current {currentVersion}</Badge>}
      </span>
    ),
  }),
];

export function UsageTable({ usage, currentVersion }: { usage: MotifUsage[]; currentVersion: number }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useReactTable({
    data: usage,
    columns: columnsFor(currentVersion),
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: 10 } },
    getRowId: (row) => row.placementId,
  });
  if (usage.length === 0) {
    return <EmptyState title="No product uses this motif yet">Once it is placed on a product, the product and its stage show here.</EmptyState>;
  }
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full min-w-[28rem] border-collapse">
          <caption className="sr-only">Products using this motif</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-sand/70 last:border-0">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="py-2.5 pr-4">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <TablePager table={table} noun="placements" />
    </div>
  );
}
