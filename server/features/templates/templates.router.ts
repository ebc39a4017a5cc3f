import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import multer from 'multer';
import type { AppConfig } from '../../config';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { GUIDE_UPLOAD_LIMIT_BYTES } from './guide-image';
import type { TemplatesService } from './templates.service';

export function templatesRouter(service: TemplatesService, config: Pick<AppConfig, 'STORAGE_DIR'>) {
  const r = createRoutes('/api/templates');
  const uploadDir = path.resolve(config.STORAGE_DIR, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  // Streams to disk; the guide is read back only after the size limit has held.
  const upload = multer({
    storage: multer.diskStorage({ destination: uploadDir, filename: (_req, _file, cb) => cb(null, `${randomUUID()}.guide`) }),
    limits: { fileSize: GUIDE_UPLOAD_LIMIT_BYTES, files: 1, fields: 0 },
  }).single('file');

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

  r.put(
    '/:id/guide-image',
    'products.compose',
    (req, res, next) =>
      upload(req, res, (err: unknown) => {
        if ((err as { code?: string })?.code === 'LIMIT_FILE_SIZE') {
          res.status(413).json({ error: { code: 'upload.too_large', message: `A guide image may be at most ${GUIDE_UPLOAD_LIMIT_BYTES / 1024 / 1024} MB.` } });
          return;
        }
        next(err);
      }),
    async (req, res) => {
      if (!req.file) throw badRequest('upload.missing_file', 'Choose an image to upload (form field "file").');
      res.json(await service.setGuideImage(studioAuth(req).studioId, String(req.params.id), req.file.path));
    },
  );
  r.get('/:id/guide-image', 'studio.read', async (req, res) => {
    const object = await service.guideImage(studioAuth(req).studioId, String(req.params.id));
    res.setHeader('Content-Type', 'image/webp');
    if (object.contentLength) res.setHeader('Content-Length', String(object.contentLength));
    // the address carries the stored key's stamp, so a new upload is a new address
    res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
    object.body.on('error', (err) => res.destroy(err));
    object.body.pipe(res);
  });
  r.delete('/:id/guide-image', 'products.compose', async (req, res) => {
    await service.removeGuideImage(studioAuth(req).studioId, String(req.params.id));
    res.status(204).end();
  });
  return r.router;
}
