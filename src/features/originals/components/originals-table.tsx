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
import type { OriginalSummary } from '@shared/contracts/originals';
import { formatDay } from '../../../lib/format';
import { formatBytes } from '../file-check';
import { fileKindWords } from '../import-words';
import { StatusBadge } from './status-badge';
import { SortableTableHead, TablePager } from '../../../components/ui/table-parts';

const column = createColumnHelper<OriginalSummary>();
const timeFormat = new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit' });
const statusOrder: Record<OriginalSummary['status'], number> = { failed: 0, importing: 1, queued: 2, ready: 3 };

const columns = [
  column.accessor('name', {
    header: 'Name',
    sortingFn: (a, b) => a.original.name.localeCompare(b.original.name, undefined, { sensitivity: 'base', numeric: true }),
    cell: (info) => (
      <Link to={`/originals/${info.row.original.id}`} className="font-semibold break-words text-tide-deep underline-offset-2 hover:underline">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor((o) => statusOrder[o.status], {
    id: 'status',
    header: 'Status',
    cell: (info) => {
      const o = info.row.original;
      return (
        <span className="flex max-w-56 flex-col items-start gap-1">
          <StatusBadge original={o} />
          {o.status === 'failed' && o.error && <span className="line-clamp-2 text-sm text-ink-soft">{o.error.message}</span>}
        </span>
      );
    },
  }),
  column.accessor('motifCount', {
    header: 'Motifs',
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
  column.accessor('byteSize', {
    header: 'Size',
    cell: (info) => {
      const o = info.row.original;
      return (
        <span className="tabular-nums">
          {formatBytes(o.byteSize)}
          {o.width && o.height ? <span className="block text-sm whitespace-nowrap text-ink-soft">{`${o.width} × ${o.height} px`}</span> : null}
        </span>
      );
    },
  }),
  column.accessor('fileKind', { header: 'Kind', enableSorting: false, cell: (info) => fileKindWords[info.getValue()] }),
  column.accessor('createdAt', {
    header: 'Uploaded',
    cell: (info) => (
      <time dateTime={info.getValue()} className="whitespace-nowrap">
        {formatDay(info.getValue())}
        <span className="block text-sm text-ink-soft">{timeFormat.format(new Date(info.getValue()))}</span>
      </time>
    ),
  }),
];

export const ORIGINALS_PAGE_SIZE = 20;

export function OriginalsTable({ originals, studioName }: { originals: OriginalSummary[]; studioName: string }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'createdAt', desc: true }]);
  const table = useReactTable({
    data: originals,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageSize: ORIGINALS_PAGE_SIZE } },
    getRowId: (row) => row.id,
  });

  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full min-w-[40rem] border-collapse">
          <caption className="sr-only">Originals of {studioName}; column headers sort the table</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-sand/70 align-top last:border-0">
                {row.getVisibleCells().map((cell, index) =>
                  index === 0 ? (
                    <th key={cell.id} scope="row" className="py-3 pr-4 text-left font-normal">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </th>
                  ) : (
                    <td key={cell.id} className="py-3 pr-4">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ),
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <TablePager table={table} noun="originals" />
    </div>
  );
}
