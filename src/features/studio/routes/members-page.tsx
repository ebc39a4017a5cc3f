import { can } from '@shared/auth/permissions';
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { PageHeader } from '../../../components/ui/page-header';
import { LoadingState } from '../../../components/ui/spinner';
import { useSession } from '../../auth/components/session';
import { useMembers } from '../api/get-members';
import { InvitationsList } from '../components/invitations-list';
import { InviteForm } from '../components/invite-form';
import { MembersTable } from '../components/members-table';

export function MembersPage() {
  const me = useSession();
  const members = useMembers();
  const canManage = can(me.role, 'members.manage');
  const studioName = me.studio?.name ?? '';

  const header = (
    <PageHeader
      title="Members"
      description={
        canManage
          ? `Who works in ${studioName}, and what each person may do.`
          : `Who works in ${studioName}. Only owners invite people and change roles.`
      }
    />
  );

  if (!me.studio) {
    return (
      <>
        {header}
        <EmptyState title="You are not in a studio right now">Members show here once you join a studio.</EmptyState>
      </>
    );
  }
  if (members.isPending) {
    return (
      <>
        {header}
        <LoadingState label="Loading members…" />
      </>
    );
  }
  if (members.isError) {
    return (
      <>
        {header}
        <ErrorState
          error={members.error}
          title="Members could not be loaded"
          onRetry={() => void members.refetch()}
          retrying={members.isRefetching}
        />
      </>
    );
  }

  return (
    <>
      {header}
      <div className="flex flex-col gap-6">
        <Card title="People" description={`${members.data.members.length} in ${studioName}`}>
          <MembersTable
            members={members.data.members}
            myUserId={me.user.id}
            studioName={studioName}
            canManage={canManage}
          />
        </Card>
        {canManage && (
          <Card title="Invite someone" description={`They get an e-mail with a link to join ${studioName}; the invitation waits below until then.`}>
            <InviteForm />
          </Card>
        )}
        <Card title="Waiting to join">
          <InvitationsList invitations={members.data.invitations} canManage={canManage} />
        </Card>
      </div>
    </>
  );
}
