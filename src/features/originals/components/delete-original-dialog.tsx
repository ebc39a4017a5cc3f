import type { OriginalSummary } from '@shared/contracts/originals';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { StatusMessage } from '../../../components/ui/status-message';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useDeleteOriginal } from '../api/delete-original';

type DeleteOriginalDialogProps = {
  original: Pick<OriginalSummary, 'id' | 'name' | 'motifCount'> | null;
  onClose: () => void;
  onDeleted: () => void;
};

export function DeleteOriginalDialog({ original, onClose, onDeleted }: DeleteOriginalDialogProps) {
  const remove = useDeleteOriginal({ mutationConfig: { onSuccess: onDeleted } });
  const close = () => {
    remove.reset();
    onClose();
  };
  return (
    <Dialog
      open={original !== null}
      onClose={close}
      title={`Delete ${original?.name ?? 'this original'}?`}
      description={
        original && original.motifCount > 0
          ? `The stored file and its ${original.motifCount === 1 ? 'motif' : `${original.motifCount} motifs`} go too, unless another original yields the same motifs. This cannot be undone.`
          : 'The stored file goes. This cannot be undone.'
      }
      actions={
        <>
          <Button variant="secondary" data-autofocus onClick={close}>
            Keep it
          </Button>
          <Button
            variant="danger"
            busy={remove.isPending}
            busyLabel="Deleting…"
            onClick={() => original && remove.mutate({ id: original.id })}
          >
            Delete original
          </Button>
        </>
      }
    >
      {remove.isError && <StatusMessage tone="problem">{errorMessageOf(remove.error)}</StatusMessage>}
    </Dialog>
  );
}
