import { collectionMembersRequestSchema, createCollectionRequestSchema, updateCollectionRequestSchema } from '../../../shared/contracts/collections';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { CollectionsService } from './collections.service';

export function collectionsRouter(service: CollectionsService) {
  const r = createRoutes('/api/collections');
  const collectionId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That collection');

  r.get('/', 'studio.read', async (req, res) => {
    res.json({ collections: await service.list(studioAuth(req).studioId) });
  });

  r.post('/', 'motifs.edit', async (req, res) => {
    const created = await service.create(studioAuth(req).studioId, parseBody(req, createCollectionRequestSchema));
    res.status(201).location(`/api/collections/${created.id}`).json(created);
  });

  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.detail(studioAuth(req).studioId, collectionId(req)));
  });

  r.patch('/:id', 'motifs.edit', async (req, res) => {
    const auth = studioAuth(req);
    const id = collectionId(req);
    res.json(await service.update(auth.studioId, id, parseBody(req, updateCollectionRequestSchema)));
  });

  r.delete('/:id', 'motifs.edit', async (req, res) => {
    await service.remove(studioAuth(req).studioId, collectionId(req));
    res.status(204).end();
  });

  r.post('/:id/motifs', 'motifs.edit', async (req, res) => {
    const auth = studioAuth(req);
    const id = collectionId(req);
    res.json(await service.addMotifs(auth.studioId, id, parseBody(req, collectionMembersRequestSchema).ids));
  });

  r.delete('/:id/motifs', 'motifs.edit', async (req, res) => {
    const auth = studioAuth(req);
    const id = collectionId(req);
    res.json(await service.removeMotifs(auth.studioId, id, parseBody(req, collectionMembersRequestSchema).ids));
  });

  return r.router;
}
