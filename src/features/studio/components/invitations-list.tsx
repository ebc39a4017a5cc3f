import { useState } from 'react';
import type { PendingInvitation } from '@shared/contracts/studio';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { VisuallyHidden } from '../../../components/ui/visually-hidden';
import { formatDay } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { roleNames } from '../../auth/components/role-words';
import { useDeleteInvitation } from '../api/delete-invitation';
import type { Notice } from './notice';
import { NoticeArea } from './notice-area';

type InvitationsListProps = { invitations: PendingInvitation[]; canManage: boolean };

export function InvitationsList({ invitations, canManage }: InvitationsListProps) {
  const [notice, setNotice] = useState<Notice | null>(null);
  const deleteInvitation = useDeleteInvitation();
  const withdraw = (invitation: PendingInvitation) =>
    deleteInvitation.mutate(
      { invitationId: invitation.id },
      {
        onSuccess: () =>
          setNotice({
            tone: 'ok',
            focus: true,
            text: `The invitation to ${invitation.email} is withdrawn. Its link no longer works.`,
          }),
        onError: (error) => setNotice({ tone: 'problem', text: errorMessageOf(error) }),
      },
    );
  const withdrawing = deleteInvitation.isPending ? deleteInvitation.variables?.invitationId : undefined;

  return (
    <div className="flex flex-col gap-4">
      <NoticeArea notice={notice} />
      {invitations.length === 0 ? (
        <EmptyState title="No invitations waiting">
          {canManage ? 'Invitations you send show here until they are accepted.' : 'Nobody is waiting to join.'}
        </EmptyState>
      ) : (
        <ul className="divide-y divide-sand">
          {invitations.map((invitation) => (
            <li key={invitation.id} className="flex flex-wrap items-center justify-between gap-3 py-3">
              <div className="min-w-0">
                <p className="font-semibold wrap-anywhere">{invitation.email}</p>
                <p className="text-sm text-ink-soft">
                  {roleNames[invitation.role]} · invited by {invitation.invitedBy} on {formatDay(invitation.createdAt)} ·
                  valid until {formatDay(invitation.expiresAt)}
                </p>
              </div>
              {canManage && (
                <Button
                  variant="quiet"
                  size="sm"
                  busy={withdrawing === invitation.id}
                  busyLabel="Withdrawing…"
                  onClick={() => withdraw(invitation)}
                >
                  Withdraw<VisuallyHidden> the invitation to {invitation.email}</VisuallyHidden>
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
