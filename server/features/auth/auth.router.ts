import type { AppConfig } from '../../config';
import {
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  signInRequestSchema,
  signUpRequestSchema,
  switchStudioRequestSchema,
} from '../../../shared/contracts/auth';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { signedInUser } from '../../middleware/auth';
import { issueCsrfToken } from '../../middleware/csrf';
import { limitAttempts } from '../../middleware/rate-limit';
import { parseBody } from '../../middleware/validate';
import type { AuthService } from './auth.service';
import { endSession, establishSession } from './session';

const publicMe = <T extends { studioId?: unknown }>({ studioId: _studioId, ...me }: T) => me;

export function authRouter(service: AuthService, config: AppConfig) {
  const r = createRoutes('/api/auth');
  const windowMs = config.RATE_LIMIT_WINDOW_MS;

  r.get('/csrf', 'public', (req, res) => {
    const csrfToken = issueCsrfToken(req);
    req.session.save(() => res.json({ csrfToken }));
  });

  r.post('/sign-up', 'public', limitAttempts({ windowMs, limit: config.RATE_LIMIT_SIGN_UP, what: 'sign-up' }), async (req, res) => {
    const input = parseBody(req, signUpRequestSchema);
    const me = await service.signUp(input);
    await establishSession(req, me.user.id, me.studioId);
    res.status(201).json(publicMe(me));
  });

  r.post('/sign-in', 'public', limitAttempts({ windowMs, limit: config.RATE_LIMIT_SIGN_IN, what: 'sign-in', perEmail: true, countFailuresOnly: true }), async (req, res) => {
    const input = parseBody(req, signInRequestSchema);
    const me = await service.signIn(input);
    await establishSession(req, me.user.id, me.studioId);
    res.json(publicMe(me));
  });

  r.post('/sign-out', 'public', async (req, res) => {
    await endSession(req);
    res.clearCookie('motifold.sid');
    res.status(204).end();
  });

  r.get('/me', 'signed-in', async (req, res) => {
    res.json(publicMe(await service.describe(signedInUser(req).id, req.auth?.studioId)));
  });

  r.post('/switch-studio', 'signed-in', async (req, res) => {
    const { studioId } = parseBody(req, switchStudioRequestSchema);
    const me = await service.describe(signedInUser(req).id, studioId);
    if (me.studioId !== studioId) throw notFound('That studio');
    req.session.studioId = studioId;
    res.json(publicMe(me));
  });

  const resetLimit = limitAttempts({ windowMs, limit: config.RATE_LIMIT_RESET, what: 'password reset' });
  r.post('/password-reset/request', 'public', resetLimit, async (req, res) => {
    const { email } = parseBody(req, passwordResetRequestSchema);
    await service.requestPasswordReset(email);
    res.status(202).json({ message: 'If an account uses that address, a reset link is on its way.' });
  });

  r.post('/password-reset/confirm', 'public', resetLimit, async (req, res) => {
    const { token, password } = parseBody(req, passwordResetConfirmSchema);
    await service.confirmPasswordReset(token, password);
    res.status(204).end();
  });

  return r.router;
}
