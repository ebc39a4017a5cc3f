import { createColumnHelper, flexRender, getCoreRowModel, getPaginationRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { ProductSummary } from '@shared/contracts/products';
import { productStages } from '@shared/contracts/stages';
import { Badge } from '../../../components/ui/badge';
import { SortableTableHead, TablePager } from '../../../components/ui/table-parts';
import { stageLabels, stageTones, verdictLabels } from './stage-labels';

const column = createColumnHelper<ProductSummary>();
const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

const columns = [
  column.accessor('name', {
    header: 'Product',
    cell: (info) => <Link to={`/products/${info.row.original.id}`} className="font-semibold break-words text-tide-deep underline">{info.getValue()}</Link>,
  }),
  column.accessor('stage', {
    header: 'Stage',
    // along the path, not alphabetically
    sortingFn: (a, b) => productStages.indexOf(a.original.stage) - productStages.indexOf(b.original.stage),
    cell: (info) => <Badge tone={stageTones[info.getValue()]}>{stageLabels[info.getValue()]}</Badge>,
  }),
  column.accessor('templateName', { header: 'Template' }),
  column.accessor((p) => p.collectionName ?? '', { id: 'collection', header: 'Collection', cell: (info) => info.getValue() || <span className="text-ink-soft">–</span> }),
  column.accessor((p) => p.tags.join(', '), { id: 'tags', header: 'Tags', enableSorting: false, cell: (info) => info.getValue() || <span className="text-ink-soft">–</span> }),
  column.accessor('variantCount', { header: 'Variants', cell: (info) => <span className="tabular-nums">{info.getValue()}</span> }),
  column.accessor((p) => p.latestSampleVerdict ?? '', {
    id: 'sample',
    header: 'Sample',
    cell: (info) => {
      const v = info.row.original.latestSampleVerdict;
      return v ? <Badge tone={v === 'approved' ? 'kelp' : 'ochre'}>{verdictLabels[v]}</Badge> : <span className="text-ink-soft">None yet</span>;
    },
  }),
  column.accessor('updatedAt', { header: 'Changed', cell: (info) => <span className="tabular-nums">{dateFormat.format(new Date(info.getValue()))}</span> }),
];

export function ProductsTable({ products }: { products: ProductSummary[] }) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useReactTable({
    data: products,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    autoResetPageIndex: true,
    initialState: { pagination: { pageSize: 20 } },
    getRowId: (row) => row.id,
  });
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto rounded-lg border border-sand bg-paper px-4 pt-3">
        <table className="w-full min-w-[48rem] border-collapse">
          <caption className="sr-only">Products of the studio</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-sand/70 last:border-0">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="py-2.5 pr-4 align-top">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <TablePager table={table} noun="products" />
    </div>
  );
}
