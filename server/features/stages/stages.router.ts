import { moveStageRequestSchema } from '../../../shared/contracts/stages';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { StagesService } from './stages.service';

// A product's stage: move it (the sample gate and the owner's override live in shared/stages) and its history.
export function stagesRouter(service: StagesService) {
  const r = createRoutes('/api/products');
  r.post('/:id/stage', 'stages.move', async (req, res) => {
    const auth = studioAuth(req);
    const productId = idParam(req, 'id', 'That product');
    const input = parseBody(req, moveStageRequestSchema);
    res.json(await service.move({ studioId: auth.studioId, userId: auth.user.id, role: auth.role }, productId, input));
  });
  // The owner's way past the sample gate: the same move with the override asked for (a note is required).
  r.post('/:id/stage/override', 'stages.override', async (req, res) => {
    const auth = studioAuth(req);
    const productId = idParam(req, 'id', 'That product');
    const input = parseBody(req, moveStageRequestSchema);
    res.json(await service.move({ studioId: auth.studioId, userId: auth.user.id, role: auth.role }, productId, { ...input, override: true }));
  });
  r.get('/:id/stages', 'studio.read', async (req, res) => {
    res.json(await service.history(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  return r.router;
}
