import type { Member } from '@shared/contracts/studio';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { StatusMessage } from '../../../components/ui/status-message';
import { firstName } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useDeleteMember } from '../api/delete-member';

type RemoveMemberDialogProps = {
  member: Member | null;
  isYou: boolean;
  studioName: string;
  onClose: () => void;
  onRemoved: (member: Member) => void;
};

export function RemoveMemberDialog({ member, isYou, studioName, onClose, onRemoved }: RemoveMemberDialogProps) {
  const deleteMember = useDeleteMember();
  // Per-call onSuccess runs once the members list is refetched, so the row is gone on close.
  const remove = (chosen: Member) =>
    deleteMember.mutate({ userId: chosen.userId }, { onSuccess: () => onRemoved(chosen) });
  const close = () => {
    deleteMember.reset();
    onClose();
  };

  const title = isYou ? `Leave ${studioName}?` : `Remove ${member?.name ?? ''}?`;
  const description = isYou
    ? 'You lose access to this studio straight away. An owner can invite you back.'
    : `${firstName(member?.name ?? '')} loses access to ${studioName} straight away. Their originals, motifs and products stay in the studio.`;

  return (
    <Dialog
      open={member !== null}
      onClose={close}
      title={title}
      description={description}
      actions={
        <>
          <Button variant="secondary" data-autofocus onClick={close}>
            Keep {isYou ? 'my place' : firstName(member?.name ?? '')}
          </Button>
          <Button
            variant="danger"
            busy={deleteMember.isPending}
            busyLabel="Removing…"
            onClick={() => member && remove(member)}
          >
            {isYou ? 'Leave studio' : 'Remove from studio'}
          </Button>
        </>
      }
    >
      {deleteMember.isError && <StatusMessage tone="problem">{errorMessageOf(deleteMember.error)}</StatusMessage>}
    </Dialog>
  );
}
