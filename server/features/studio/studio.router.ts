import { updateMemberRequestSchema, updateStudioRequestSchema } from '../../../shared/contracts/studio';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { StudioService } from './studio.service';

export function studioRouter(service: StudioService) {
  const r = createRoutes('/api/studio');

  r.get('/', 'studio.read', async (req, res) => {
    res.json(await service.settings(studioAuth(req).studioId));
  });

  r.patch('/', 'studio.manage', async (req, res) => {
    const patch = parseBody(req, updateStudioRequestSchema);
    res.json(await service.updateSettings(studioAuth(req).studioId, patch));
  });

  r.get('/members', 'members.read', async (req, res) => {
    res.json(await service.members(studioAuth(req).studioId));
  });

  r.patch('/members/:userId', 'members.manage', async (req, res) => {
    const userId = idParam(req, 'userId', 'That member');
    const { role } = parseBody(req, updateMemberRequestSchema);
    await service.changeRole(studioAuth(req).studioId, userId, role);
    res.json(await service.members(studioAuth(req).studioId));
  });

  r.delete('/members/:userId', 'members.manage', async (req, res) => {
    const userId = idParam(req, 'userId', 'That member');
    await service.removeMember(studioAuth(req).studioId, userId);
    res.status(204).end();
  });

  return r.router;
}
