import type { AppConfig } from '../../config';
import type { InvitationPreview } from '../../../shared/contracts/auth';
import { badRequest, conflict, HttpError, notFound } from '../../lib/http-error';
import type { Mailer } from '../../lib/mail';
import { hashPassword, verifyPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import type { AuthContext } from '../../middleware/session-types';
import type { AuthRepository } from '../auth/auth.repository';
import type { StudioRepository } from '../studio/studio.repository';
import { invitationMail } from './invitation-mail';
import type { InvitationsRepository } from './invitations.repository';

type Deps = {
  repo: InvitationsRepository;
  studios: StudioRepository;
  users: AuthRepository;
  mailer: Mailer;
  config: Pick<AppConfig, 'appUrl' | 'INVITATION_TTL_DAYS'>;
};

export function createInvitationsService({ repo, studios, users, mailer, config }: Deps) {
  async function openInvitation(token: string) {
    const found = await repo.findByTokenHash(hashToken(token));
    if (!found) throw notFound('That invitation');
    const inv = found.invitation;
    if (inv.acceptedAt) throw new HttpError(410, 'invitation.used', 'This invitation has already been accepted. Sign in to reach the studio.');
    if (inv.revokedAt) throw new HttpError(410, 'invitation.revoked', 'This invitation was withdrawn or replaced by a newer one. Ask the studio owner for a fresh link.');
    if (inv.expiresAt.getTime() < Date.now()) throw new HttpError(410, 'invitation.expired', 'This invitation has expired. Ask the studio owner for a fresh link.');
    return found;
  }

  return {
    async invite(studioId: string, inviter: AuthContext['user'], email: string, role: 'editor' | 'reviewer') {
      if (await studios.findMemberByEmail(studioId, email)) {
        throw conflict('invitation.already_member', `${email} is already a member of this studio.`);
      }
      const studio = await studios.findStudio(studioId);
      if (!studio) throw notFound('That studio');
      const { token, hash } = newToken();
      const expiresAt = new Date(Date.now() + config.INVITATION_TTL_DAYS * 86_400_000);
      const row = await repo.create({ studioId, email, role, tokenHash: hash, invitedBy: inviter.id, expiresAt });
      const link = `${config.appUrl}/invitations/${encodeURIComponent(token)}`;
      await mailer.send(invitationMail({ to: email, studioName: studio.name, inviterName: inviter.name, role, link, expiresAt }));
      return { id: row.id, email: row.email, role: row.role, invitedBy: inviter.name, createdAt: row.createdAt.toISOString(), expiresAt: row.expiresAt.toISOString() };
    },

    async revoke(studioId: string, id: string) {
      if (!(await repo.revoke(studioId, id))) throw notFound('That invitation');
    },

    async preview(token: string): Promise<InvitationPreview> {
      const { invitation, studioName, invitedBy } = await openInvitation(token);
      return {
        studioName,
        email: invitation.email,
        role: invitation.role,
        invitedBy,
        accountExists: Boolean(await users.findUserByEmail(invitation.email)),
        expiresAt: invitation.expiresAt.toISOString(),
      };
    },

    // Returns the user who joined and the studio they joined.
    async accept(token: string, current: AuthContext | undefined, input: { name?: string; password?: string }) {
      const { invitation } = await openInvitation(token);
      const existing = await users.findUserByEmail(invitation.email);
      if (current && current.user.email !== invitation.email) {
        throw conflict('invitation.other_account', `You are signed in as ${current.user.email}, but this invitation is for ${invitation.email}. Sign out first, then open the link again.`);
      }
      let userId: string | null;
      if (existing) {
        if (!current) {
          if (!input.password) throw badRequest('validation.failed', 'Enter the password of your existing account.', { password: 'Enter your password' });
          if (!(await verifyPassword(existing.passwordHash, input.password))) {
            throw new HttpError(401, 'auth.invalid_credentials', 'That password does not match the account for this address.');
          }
        }
        userId = await repo.accept(invitation.id, invitation.studioId, existing.id, invitation.role);
      } else {
        const fields: Record<string, string> = {};
        if (!input.name?.trim()) fields.name = 'Enter your name';
        if (!input.password || input.password.length < 10) fields.password = 'Use at least 10 characters';
        if (Object.keys(fields).length) throw badRequest('validation.failed', 'Please check the form: choose your name and a password.', fields);
        const passwordHash = await hashPassword(input.password!);
        userId = await repo.accept(invitation.id, invitation.studioId, '', invitation.role, { name: input.name!.trim(), email: invitation.email, passwordHash });
      }
      if (!userId) throw new HttpError(410, 'invitation.used', 'This invitation has already been accepted. Sign in to reach the studio.');
      return { userId, studioId: invitation.studioId };
    },
  };
}

export type InvitationsService = ReturnType<typeof createInvitationsService>;
