import type { AppConfig } from '../../config';
import type { SignInRequest, SignUpRequest, MeResponse } from '../../../shared/contracts/auth';
import { badRequest, conflict, HttpError, unauthorised } from '../../lib/http-error';
import type { Mailer } from '../../lib/mail';
import { burnPasswordCheck, hashPassword, verifyPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import type { AuthContext } from '../../middleware/session-types';
import { passwordResetMail } from './auth-mails';
import type { AuthRepository } from './auth.repository';

type Deps = { repo: AuthRepository; mailer: Mailer; config: Pick<AppConfig, 'appUrl' | 'RESET_TOKEN_TTL_MINUTES'> };

export function createAuthService({ repo, mailer, config }: Deps) {
  async function describe(userId: string, preferredStudioId?: string | null): Promise<MeResponse & { studioId: string | null }> {
    const user = await repo.findUserById(userId);
    if (!user) throw unauthorised();
    const studios = await repo.studiosOfUser(userId);
    const current = studios.find((s) => s.id === preferredStudioId) ?? studios[0] ?? null;
    return {
      user: { id: user.id, name: user.name, email: user.email },
      studio: current,
      role: current?.role ?? null,
      studios,
      studioId: current?.id ?? null,
    };
  }

  return {
    describe,

    async loadContext(userId: string, studioId: string | undefined): Promise<AuthContext | null> {
      const user = await repo.findUserById(userId);
      if (!user) return null;
      const studios = await repo.studiosOfUser(userId);
      const current = studios.find((s) => s.id === studioId) ?? studios[0] ?? null;
      return { user: { id: user.id, name: user.name, email: user.email }, studioId: current?.id ?? null, role: current?.role ?? null };
    },

    async signUp(input: SignUpRequest) {
      if (await repo.findUserByEmail(input.email)) {
        throw conflict('auth.email_taken', 'An account with this e-mail address already exists. Sign in instead, or reset your password.');
      }
      const passwordHash = await hashPassword(input.password);
      try {
        const { user, studio } = await repo.createUserWithStudio({ ...input, passwordHash });
        return describe(user.id, studio.id);
      } catch (err) {
        // Two sign-ups racing for one address: the unique index decides.
        if ((err as { code?: string }).code === '23505' || (err as { cause?: { code?: string } }).cause?.code === '23505') {
          throw conflict('auth.email_taken', 'An account with this e-mail address already exists. Sign in instead, or reset your password.');
        }
        throw err;
      }
    },

    async signIn(input: SignInRequest) {
      const user = await repo.findUserByEmail(input.email);
      if (!user) {
        await burnPasswordCheck(input.password);
        throw new HttpError(401, 'auth.invalid_credentials', 'That e-mail address and password do not match an account.');
      }
      if (!(await verifyPassword(user.passwordHash, input.password))) {
        throw new HttpError(401, 'auth.invalid_credentials', 'That e-mail address and password do not match an account.');
      }
      return describe(user.id);
    },

    async requestPasswordReset(email: string): Promise<void> {
      const user = await repo.findUserByEmail(email);
      // Same answer whether or not the account exists, so the form cannot probe addresses.
      if (!user) return;
      const { token, hash } = newToken();
      const expiresAt = new Date(Date.now() + config.RESET_TOKEN_TTL_MINUTES * 60_000);
      await repo.createPasswordReset(user.id, hash, expiresAt);
      const link = `${config.appUrl}/reset-password?token=${encodeURIComponent(token)}`;
      await mailer.send(passwordResetMail(user.email, user.name, link, config.RESET_TOKEN_TTL_MINUTES));
    },

    async confirmPasswordReset(token: string, password: string): Promise<void> {
      const reset = await repo.findPasswordReset(hashToken(token));
      if (!reset) throw badRequest('reset.invalid_token', 'This reset link is not valid. Ask for a new one.');
      if (reset.usedAt) throw badRequest('reset.used', 'This reset link has already been used. Ask for a new one if you need it.');
      if (reset.expiresAt.getTime() < Date.now()) throw badRequest('reset.expired', 'This reset link has expired. Ask for a new one.');
      const ok = await repo.consumePasswordReset(reset.id, reset.userId, await hashPassword(password));
      if (!ok) throw badRequest('reset.used', 'This reset link has already been used. Ask for a new one if you need it.');
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
