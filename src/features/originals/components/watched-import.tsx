import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useOriginal } from '../api/get-original';
import { ImportProgress } from './import-progress';

// An upload made on this page, followed until its import is done.
export function WatchedImport({ id, canImport, onGone }: { id: string; canImport: boolean; onGone: () => void }) {
  const original = useOriginal(id);
  if (original.isPending) return <LoadingState label="Waiting for the import to start…" className="py-3" />;
  if (original.isError) return <ErrorState error={original.error} title="The import could not be followed" onRetry={() => void original.refetch()} />;
  return <ImportProgress original={original.data} canImport={canImport} showName onDeleted={onGone} />;
}
