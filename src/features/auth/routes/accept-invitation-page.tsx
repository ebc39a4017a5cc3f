import { useNavigate, useParams } from 'react-router-dom';
import type { InvitationPreview, MeResponse } from '@shared/contracts/auth';
import { Button, ButtonLink } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { StatusMessage } from '../../../components/ui/status-message';
import { isApiRequestError } from '../../../lib/api-client';
import { formatDay } from '../../../lib/format';
import { errorMessageOf } from '../../../lib/use-form-errors';
import { useAcceptInvitation, type AcceptInvitation } from '../api/accept-invitation';
import { useInvitation } from '../api/get-invitation';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-out';
import { AuthPanel } from '../components/auth-panel';
import { ExistingAccountForm, NewAccountForm } from '../components/invitation-forms';
import { roleNames, roleSummaries } from '../components/role-words';

export function AcceptInvitationPage() {
  const token = useParams().token ?? '';
  const invitation = useInvitation(token);
  const me = useMe();

  if (invitation.isPending || me.isPending) {
    return (
      <AuthPanel title="Your invitation">
        <LoadingState label="Opening your invitation…" className="py-4" />
      </AuthPanel>
    );
  }
  if (invitation.isError) {
    const unusable = isApiRequestError(invitation.error) && invitation.error.status >= 400 && invitation.error.status < 500;
    return (
      <AuthPanel title="Your invitation">
        <ErrorState
          error={invitation.error}
          title={unusable ? 'This invitation cannot be used' : 'The invitation could not be opened'}
          onRetry={unusable ? undefined : () => void invitation.refetch()}
          retrying={invitation.isRefetching}
        >
          {unusable && (
            <ButtonLink to="/sign-in" variant="secondary" size="sm" className="mt-4">
              Go to sign in
            </ButtonLink>
          )}
        </ErrorState>
      </AuthPanel>
    );
  }

  return (
    <AuthPanel title={`Join ${invitation.data.studioName}`} description={<InvitationSummary invitation={invitation.data} />}>
      <InvitationAnswer token={token} invitation={invitation.data} me={me.data ?? null} />
    </AuthPanel>
  );
}

function InvitationSummary({ invitation }: { invitation: InvitationPreview }) {
  return (
    <div className="flex flex-col gap-3">
      <p>{invitation.invitedBy} invited you to work with them in Motifold.</p>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md border border-sand bg-shell/60 px-4 py-3 text-sm">
        <dt className="text-ink-soft">Role</dt>
        <dd className="text-ink">
          <span className="font-semibold">{roleNames[invitation.role]}</span> · {roleSummaries[invitation.role]}
        </dd>
        <dt className="text-ink-soft">For</dt>
        <dd className="wrap-anywhere text-ink">{invitation.email}</dd>
        <dt className="text-ink-soft">Valid until</dt>
        <dd className="text-ink">{formatDay(invitation.expiresAt)}</dd>
      </dl>
    </div>
  );
}

type AnswerProps = { token: string; invitation: InvitationPreview; me: MeResponse | null };

function InvitationAnswer({ token, invitation, me }: AnswerProps) {
  const navigate = useNavigate();
  const acceptInvitation = useAcceptInvitation({ mutationConfig: { onSuccess: () => navigate('/', { replace: true }) } });
  const signOut = useSignOut();
  const accept = (body: Omit<AcceptInvitation, 'token'>, onError: (error: unknown) => void) =>
    acceptInvitation.mutate({ token, ...body }, { onError });

  if (me && me.user.email.toLowerCase() === invitation.email.toLowerCase()) {
    return (
      <div className="flex flex-col gap-4">
        <p>You are signed in as {me.user.name}, so there is nothing to fill in.</p>
        {acceptInvitation.isError && <StatusMessage tone="problem">{errorMessageOf(acceptInvitation.error)}</StatusMessage>}
        <div>
          <Button busy={acceptInvitation.isPending} busyLabel="Joining…" onClick={() => accept({}, () => undefined)}>
            Join {invitation.studioName}
          </Button>
        </div>
      </div>
    );
  }

  if (me) {
    return (
      <div className="flex flex-col gap-4">
        <StatusMessage tone="warning" title="This invitation is for someone else">
          You are signed in as <span className="wrap-anywhere">{me.user.email}</span>, but the invitation was sent to{' '}
          <span className="wrap-anywhere">{invitation.email}</span>. Sign out to accept it with that address.
        </StatusMessage>
        {signOut.isError && <StatusMessage tone="problem">{errorMessageOf(signOut.error)}</StatusMessage>}
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" busy={signOut.isPending} busyLabel="Signing out…" onClick={() => signOut.mutate()}>
            Sign out
          </Button>
          <ButtonLink to="/" variant="quiet">
            Back to my studio
          </ButtonLink>
        </div>
      </div>
    );
  }

  return invitation.accountExists ? (
    <ExistingAccountForm invitation={invitation} accept={accept} pending={acceptInvitation.isPending} />
  ) : (
    <NewAccountForm invitation={invitation} accept={accept} pending={acceptInvitation.isPending} />
  );
}
