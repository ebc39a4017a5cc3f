import { acceptInvitationRequestSchema } from '../../../shared/contracts/auth';
import { createInvitationRequestSchema } from '../../../shared/contracts/studio';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { AuthService } from '../auth/auth.service';
import { establishSession } from '../auth/session';
import type { InvitationsService } from './invitations.service';

function tokenParam(token: unknown): string {
  if (typeof token !== 'string' || token.length < 20 || token.length > 200) throw notFound('That invitation');
  return token;
}

export function studioInvitationsRouter(service: InvitationsService) {
  const r = createRoutes('/api/studio/invitations');
  r.post('/', 'members.manage', async (req, res) => {
    const { email, role } = parseBody(req, createInvitationRequestSchema);
    const auth = studioAuth(req);
    res.status(201).json(await service.invite(auth.studioId, auth.user, email, role));
  });
  r.delete('/:id', 'members.manage', async (req, res) => {
    await service.revoke(studioAuth(req).studioId, idParam(req, 'id', 'That invitation'));
    res.status(204).end();
  });
  return r.router;
}

export function publicInvitationsRouter(service: InvitationsService, auth: AuthService) {
  const r = createRoutes('/api/invitations');
  r.get('/:token', 'public', async (req, res) => {
    res.json(await service.preview(tokenParam(req.params.token)));
  });
  r.post('/:token/accept', 'public', async (req, res) => {
    const input = parseBody(req, acceptInvitationRequestSchema);
    const { userId, studioId } = await service.accept(tokenParam(req.params.token), req.auth, input);
    await establishSession(req, userId, studioId);
    const { studioId: _s, ...me } = await auth.describe(userId, studioId);
    res.json(me);
  });
  return r.router;
}
