import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import multer from 'multer';
import type { AppConfig } from '../../config';
import { recutOriginalRequestSchema, uploadOriginalFieldsSchema } from '../../../shared/contracts/originals';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { OriginalsService } from './originals.service';

export function originalsRouter(service: OriginalsService, config: AppConfig) {
  const r = createRoutes('/api/originals');
  const uploadDir = path.resolve(config.STORAGE_DIR, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  // Streams to disk: an upload is never held in memory whole.
  const upload = multer({
    storage: multer.diskStorage({ destination: uploadDir, filename: (_req, _file, cb) => cb(null, `${randomUUID()}.upload`) }),
    limits: { fileSize: config.UPLOAD_LIMIT_BYTES, files: 1, fields: 10, fieldSize: 4096 },
    defParamCharset: 'utf8',
  }).single('file');

  const limitMb = Math.round(config.UPLOAD_LIMIT_BYTES / 1024 / 1024);

  r.get('/', 'studio.read', async (req, res) => {
    res.json({ originals: await service.list(studioAuth(req).studioId) });
  });

  r.post(
    '/',
    'originals.import',
    (req, res, next) =>
      upload(req, res, (err: unknown) => {
        if ((err as { code?: string })?.code === 'LIMIT_FILE_SIZE') {
          res.status(413).json({ error: { code: 'upload.too_large', message: `This file is larger than the upload limit of ${limitMb} MB.` } });
          return;
        }
        next(err);
      }),
    async (req, res) => {
      const auth = studioAuth(req);
      if (!req.file) throw badRequest('upload.missing_file', 'Choose a file to upload (form field "file").');
      const fields = parseBody(req, uploadOriginalFieldsSchema);
      const result = await service.upload({
        studioId: auth.studioId,
        userId: auth.user.id,
        filePath: req.file.path,
        fileName: req.file.originalname,
        byteSize: req.file.size,
        cut: fields.cut,
        previousOriginalId: fields.previousOriginalId,
      });
      res.status(202).location(`/api/originals/${result.id}`).json(result);
    },
  );

  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.detail(studioAuth(req).studioId, idParam(req, 'id', 'That original')));
  });

  r.post('/:id/retry', 'originals.import', async (req, res) => {
    res.status(202).json(await service.retry(studioAuth(req).studioId, idParam(req, 'id', 'That original')));
  });

  r.post('/:id/recut', 'originals.import', async (req, res) => {
    const auth = studioAuth(req);
    const { cut } = parseBody(req, recutOriginalRequestSchema);
    res.status(202).json(await service.recut(auth.studioId, auth.user.id, idParam(req, 'id', 'That original'), cut));
  });

  r.delete('/:id', 'originals.import', async (req, res) => {
    await service.remove(studioAuth(req).studioId, idParam(req, 'id', 'That original'));
    res.status(204).end();
  });

  return r.router;
}
