import { useState } from 'react';
import type { OriginalSummary } from '@shared/contracts/originals';
import { Button } from '../../../components/ui/button';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useRetryOriginal } from '../api/retry-original';
import { DeleteOriginalDialog } from './delete-original-dialog';

export function FailedImportActions({ original, onDeleted }: { original: OriginalSummary; onDeleted?: () => void }) {
  const retry = useRetryOriginal();
  const [deleting, setDeleting] = useState(false);
  return (
    <div className="mt-3 flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        <Button size="sm" busy={retry.isPending} busyLabel="Starting again…" onClick={() => retry.mutate({ id: original.id })}>
          Try the import again
        </Button>
        <Button size="sm" variant="secondary" onClick={() => setDeleting(true)}>
          Delete it
        </Button>
      </div>
      {retry.isError && (
        <p role="alert" className="text-sm font-semibold text-rust">
          {errorMessageOf(retry.error)}
        </p>
      )}
      <DeleteOriginalDialog
        original={deleting ? original : null}
        onClose={() => setDeleting(false)}
        onDeleted={() => {
          setDeleting(false);
          onDeleted?.();
        }}
      />
    </div>
  );
}
