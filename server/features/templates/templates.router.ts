import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import type { TemplatesService } from './templates.service';

export function templatesRouter(service: TemplatesService) {
  const r = createRoutes('/api/templates');
  r.get('/', 'studio.read', async (req, res) => {
    res.json({ templates: await service.list(studioAuth(req).studioId) });
  });
  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.resolve(studioAuth(req).studioId, String(req.params.id)));
  });
  r.post('/', 'products.compose', async (req, res) => {
    res.status(201).json(await service.create(studioAuth(req).studioId, req.body?.template));
  });
  r.put('/:id', 'products.compose', async (req, res) => {
    res.json(await service.update(studioAuth(req).studioId, idParam(req, 'id', 'That template'), req.body?.template));
  });
  r.delete('/:id', 'products.compose', async (req, res) => {
    await service.remove(studioAuth(req).studioId, idParam(req, 'id', 'That template'));
    res.status(204).end();
  });
  return r.router;
}
