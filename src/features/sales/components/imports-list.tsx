import { useState } from 'react';
import type { SalesImport } from '@shared/contracts/sales';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { formatDay } from '../../../lib/format';
import { useDeleteSalesImport } from '../api/delete-sales-import';
import { useSalesImports } from '../api/get-sales-imports';
import { ValidationReport } from './validation-report';

export function ImportsList({ canUndo }: { canUndo: boolean }) {
  const imports = useSalesImports();
  const [undoing, setUndoing] = useState<SalesImport | null>(null);
  const [report, setReport] = useState<SalesImport | null>(null);
  const remove = useDeleteSalesImport({ onSuccess: () => setUndoing(null) });

  if (imports.isPending) return <LoadingState label="Loading the imports…" />;
  if (imports.isError) return <ErrorState error={imports.error} onRetry={() => void imports.refetch()} retrying={imports.isRefetching} />;
  const list = imports.data.imports;
  if (list.length === 0) return <EmptyState title="No sales imported yet">Import your shop’s sales export to see what sells.</EmptyState>;
  return (
    <>
      <ul className="flex flex-col divide-y divide-sand">
        {list.map((item) => (
          <li key={item.id} className="flex flex-wrap items-start justify-between gap-3 py-3">
            <div className="min-w-0">
              <p className="font-semibold break-all text-ink">{item.fileName}</p>
              <p className="text-sm text-ink-soft">
                {item.rowCount.toLocaleString()} rows
                {item.report.firstDay && item.report.lastDay ? `, sales ${formatDay(item.report.firstDay)} – ${formatDay(item.report.lastDay)}` : ''}
                {item.skippedRows > 0 ? `, ${item.skippedRows.toLocaleString()} skipped` : ''}
                {item.report.alreadyImported > 0 ? `, ${item.report.alreadyImported.toLocaleString()} already imported` : ''} · {formatDay(item.createdAt)}
                {item.importedBy ? ` by ${item.importedBy.name}` : ''}
              </p>
            </div>
            <div className="flex gap-2">
              {item.skippedRows > 0 && <Button size="sm" variant="quiet" onClick={() => setReport(item)}>Skipped rows</Button>}
              {canUndo && <Button size="sm" variant="secondary" onClick={() => setUndoing(item)}>Undo</Button>}
            </div>
          </li>
        ))}
      </ul>
      <Dialog
        open={undoing !== null}
        onClose={() => setUndoing(null)}
        title="Undo this import?"
        description={undoing ? `The ${undoing.rowCount.toLocaleString()} sales rows from “${undoing.fileName}” are removed; you can import the file again later.` : undefined}
        actions={
          <>
            <Button variant="secondary" onClick={() => setUndoing(null)}>Keep it</Button>
            <Button variant="danger" busy={remove.isPending} busyLabel="Removing…" onClick={() => undoing && remove.mutate(undoing.id)}>Undo the import</Button>
          </>
        }
      >
        {remove.isError && <p className="text-rust">{remove.error.message}</p>}
      </Dialog>
      <Dialog open={report !== null} onClose={() => setReport(null)} title="Rows skipped by this import" actions={<Button variant="secondary" onClick={() => setReport(null)}>Close</Button>}>
        {report && <ValidationReport validation={{ rowCount: report.rowCount + report.skippedRows, goodRowCount: report.rowCount, badRowCount: report.report.badRowCount, badRows: report.report.badRows, unknownSkus: report.report.unknownSkus, firstDay: report.report.firstDay, lastDay: report.report.lastDay }} />}
      </Dialog>
    </>
  );
}
