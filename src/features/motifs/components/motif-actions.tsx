import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { MotifDetail } from '@shared/contracts/motifs';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useDeleteMotif } from '../api/delete-motif';
import { useUpdateMotif } from '../api/update-motif';

export const downloadUrlOf = (motif: Pick<MotifDetail, 'imageUrl'>) => `${motif.imageUrl}${motif.imageUrl.includes('?') ? '&' : '?'}download=1`;

export function MotifActions({ motif, canEdit }: { motif: MotifDetail; canEdit: boolean }) {
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  const archive = useUpdateMotif();
  const remove = useDeleteMotif({ mutationConfig: { onSuccess: () => navigate('/library', { replace: true }) } });
  const used = motif.usage.length;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-2">
        <a href={downloadUrlOf(motif)} download className={buttonClasses('secondary', 'sm')}>
          Download PNG
        </a>
        {canEdit && (
          <>
            <Button
              size="sm"
              variant="secondary"
              busy={archive.isPending}
              busyLabel="Saving…"
              onClick={() => archive.mutate({ id: motif.id, changes: { archived: !motif.archived } })}
            >
              {motif.archived ? 'Bring back to the library' : 'Archive'}
            </Button>
            <Button size="sm" variant="danger" onClick={() => setConfirming(true)}>
              Delete…
            </Button>
          </>
        )}
      </div>
      {canEdit && (
        <p className="text-sm text-ink-soft">
          {motif.archived
            ? 'Archived: left out of the library view, still in the products that use it.'
            : 'Archiving hides it from the library but keeps it in products. Deleting is only possible while no product uses it.'}
        </p>
      )}
      {archive.isError && <StatusMessage tone="problem">{errorMessageOf(archive.error)}</StatusMessage>}
      <Dialog
        open={confirming}
        onClose={() => {
          remove.reset();
          setConfirming(false);
        }}
        title={`Delete ${motif.name}?`}
        description={
          used > 0
            ? `${used === 1 ? 'A product uses' : `${used} placements use`} this motif, so it cannot be deleted. Archive it instead: it leaves the library and stays in those products.`
            : 'Its pictures and every version go for good. The original file stays.'
        }
        actions={
          <>
            <Button variant="secondary" data-autofocus onClick={() => setConfirming(false)}>
              Keep it
            </Button>
            <Button variant="danger" busy={remove.isPending} busyLabel="Deleting…" onClick={() => remove.mutate({ id: motif.id })}>
              Delete motif
            </Button>
          </>
        }
      >
        {remove.isError && <StatusMessage tone="problem">{errorMessageOf(remove.error)}</StatusMessage>}
      </Dialog>
    </div>
  );
}
