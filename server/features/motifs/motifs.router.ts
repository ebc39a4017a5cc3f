import { z } from 'zod';
import { bulkMotifsRequestSchema, motifListQuerySchema, updateMotifRequestSchema } from '../../../shared/contracts/motifs';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import type { ObjectStorage } from '../../lib/storage';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody, parseQuery } from '../../middleware/validate';
import type { MotifsRepository } from './motifs.repository';
import type { MotifsService } from './motifs.service';

const imageQuery = z.object({
  size: z.enum(['full', 'thumb']).default('full'),
  version: z.coerce.number().int().min(1).optional(),
  download: z.enum(['1', 'true']).optional(),
});

function versionParam(value: unknown): number {
  const n = typeof value === 'string' && /^\d+$/.test(value) ? Number(value) : Number.NaN;
  if (!Number.isInteger(n) || n < 1 || n > 1_000_000) throw notFound('That motif version');
  return n;
}

export function motifsRouter(service: MotifsService, repo: MotifsRepository, storage: ObjectStorage) {
  const r = createRoutes('/api/motifs');
  const motifId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That motif');

  r.get('/', 'studio.read', async (req, res) => {
    res.json(await service.list(studioAuth(req).studioId, parseQuery(req, motifListQuerySchema)));
  });

  r.post('/bulk', 'motifs.edit', async (req, res) => {
    res.json(await service.bulk(studioAuth(req).studioId, parseBody(req, bulkMotifsRequestSchema)));
  });

  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.detail(studioAuth(req).studioId, motifId(req)));
  });

  r.patch('/:id', 'motifs.edit', async (req, res) => {
    const auth = studioAuth(req);
    const id = motifId(req);
    res.json(await service.update(auth.studioId, id, parseBody(req, updateMotifRequestSchema)));
  });

  r.delete('/:id', 'motifs.edit', async (req, res) => {
    await service.remove(studioAuth(req).studioId, motifId(req));
    res.status(204).end();
  });

  r.get('/:id/versions', 'studio.read', async (req, res) => {
    res.json(await service.versions(studioAuth(req).studioId, motifId(req)));
  });

  r.post('/:id/versions/:version/restore', 'motifs.edit', async (req, res) => {
    const auth = studioAuth(req);
    const id = motifId(req);
    res.json(await service.restore(auth.studioId, id, versionParam(req.params.version)));
  });

  r.get('/:id/looks-like', 'studio.read', async (req, res) => {
    res.json(await service.looksLike(studioAuth(req).studioId, motifId(req)));
  });

  r.get('/:id/image', 'studio.read', async (req, res) => {
    const q = parseQuery(req, imageQuery);
    const row = await repo.findWithVersion(studioAuth(req).studioId, motifId(req), q.version);
    if (!row) throw notFound('That motif');
    const key = q.size === 'thumb' ? row.version.thumbKey : row.version.pngKey;
    const object = await storage.get(key);
    res.setHeader('Content-Type', q.size === 'thumb' ? 'image/webp' : 'image/png');
    if (object.contentLength) res.setHeader('Content-Length', String(object.contentLength));
    // Versioned addresses never change content; private because images belong to one studio.
    res.setHeader('Cache-Control', q.version ? 'private, max-age=31536000, immutable' : 'private, no-cache');
    if (q.download) {
      const safe = row.motif.name.replace(/[^\p{L}\p{N} _.-]+/gu, '_').slice(0, 80) || 'motif';
      res.setHeader('Content-Disposition', `attachment; filename*=UTF-8''${encodeURIComponent(`${safe}-v${row.version.version}.png`)}`);
    }
    object.body.on('error', (err) => res.destroy(err));
    object.body.pipe(res);
  });

  return r.router;
}
