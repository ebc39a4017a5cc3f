import { z } from 'zod';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import type { ObjectStorage } from '../../lib/storage';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseQuery } from '../../middleware/validate';
import { toMotifSummary } from '../originals/motif-dto';
import type { MotifsRepository } from './motifs.repository';

const imageQuery = z.object({
  size: z.enum(['full', 'thumb']).default('full'),
  version: z.coerce.number().int().min(1).optional(),
  download: z.enum(['1', 'true']).optional(),
});

export function motifsRouter(repo: MotifsRepository, storage: ObjectStorage) {
  const r = createRoutes('/api/motifs');

  r.get('/', 'studio.read', async (req, res) => {
    const rows = await repo.listCurrent(studioAuth(req).studioId);
    res.json({ motifs: rows.map((row) => toMotifSummary(row.motif, row.version)), total: rows.length });
  });

  r.get('/:id', 'studio.read', async (req, res) => {
    const row = await repo.findWithVersion(studioAuth(req).studioId, idParam(req, 'id', 'That motif'));
    if (!row) throw notFound('That motif');
    res.json(toMotifSummary(row.motif, row.version));
  });

  r.get('/:id/image', 'studio.read', async (req, res) => {
    const q = parseQuery(req, imageQuery);
    const row = await repo.findWithVersion(studioAuth(req).studioId, idParam(req, 'id', 'That motif'), q.version);
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
