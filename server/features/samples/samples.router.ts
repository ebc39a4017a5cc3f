import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Response } from 'express';
import multer from 'multer';
import type { AppConfig } from '../../config';
import { createSampleRequestSchema, sampleVerdictRequestSchema, updateSampleRequestSchema } from '../../../shared/contracts/samples';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import type { ObjectStorage } from '../../lib/storage';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { SamplePhotoRow } from './samples.repository';
import type { SamplesService } from './samples.service';

type PhotoSize = 'thumb' | 'display' | 'original';

// A photo's bytes never change under its id: browsers may keep them, privately (one studio's).
async function sendPhoto(res: Response, storage: ObjectStorage, photo: SamplePhotoRow, size: PhotoSize) {
  const key = size === 'thumb' ? photo.thumbKey : size === 'display' ? photo.displayKey : photo.originalKey;
  const object = await storage.get(key);
  res.setHeader('Content-Type', size === 'original' ? photo.contentType : 'image/webp');
  if (object.contentLength) res.setHeader('Content-Length', String(object.contentLength));
  res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
  if (size === 'original') {
    const safe = photo.fileName.replace(/[^\p{L}\p{N} _.-]+/gu, '_').slice(0, 120) || 'sample-photo';
    res.setHeader('Content-Disposition', `attachment; filename="${safe.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(safe)}`);
  }
  object.body.on('error', (err) => res.destroy(err));
  object.body.pipe(res);
}

export function productSamplesRouter(service: SamplesService) {
  const r = createRoutes('/api/products');
  const productId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That product');

  r.get('/:id/samples', 'studio.read', async (req, res) => {
    res.json(await service.listForProduct(studioAuth(req).studioId, productId(req)));
  });

  r.post('/:id/samples', 'samples.record', async (req, res) => {
    const auth = studioAuth(req);
    const id = productId(req);
    const sample = await service.record(auth.studioId, auth.user.id, id, parseBody(req, createSampleRequestSchema));
    res.status(201).location(`/api/samples/${sample.id}`).json(sample);
  });

  return r.router;
}

export function samplesRouter(service: SamplesService, config: AppConfig) {
  const r = createRoutes('/api/samples');
  const sampleId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That sample');
  const uploadDir = path.resolve(config.STORAGE_DIR, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  // Streams to disk like the originals' upload: a photo is never held in memory whole.
  const upload = multer({
    storage: multer.diskStorage({ destination: uploadDir, filename: (_req, _file, cb) => cb(null, `${randomUUID()}.photo`) }),
    limits: { fileSize: config.SAMPLE_PHOTO_LIMIT_BYTES, files: 1, fields: 5, fieldSize: 1024 },
    defParamCharset: 'utf8',
  }).single('file');
  const limitMb = Math.round((config.SAMPLE_PHOTO_LIMIT_BYTES / 1024 / 1024) * 10) / 10;

  r.patch('/:id', 'samples.record', async (req, res) => {
    res.json(await service.update(studioAuth(req).studioId, sampleId(req), parseBody(req, updateSampleRequestSchema)));
  });

  r.delete('/:id', 'samples.record', async (req, res) => {
    await service.remove(studioAuth(req).studioId, sampleId(req));
    res.status(204).end();
  });

  r.post('/:id/verdict', 'samples.record', async (req, res) => {
    const auth = studioAuth(req);
    res.json(await service.verdict(auth.studioId, auth.user.id, sampleId(req), parseBody(req, sampleVerdictRequestSchema)));
  });

  r.post(
    '/:id/photos',
    'samples.record',
    (req, res, next) =>
      upload(req, res, (err: unknown) => {
        if ((err as { code?: string })?.code === 'LIMIT_FILE_SIZE') {
          res.status(413).json({ error: { code: 'upload.too_large', message: `This photo is larger than the limit of ${limitMb} MB. Export a smaller JPEG and upload that.` } });
          return;
        }
        next(err);
      }),
    async (req, res) => {
      const auth = studioAuth(req);
      const id = sampleId(req);
      if (!req.file) throw badRequest('upload.missing_file', 'Choose a photo to upload (form field "file").');
      const photo = await service.addPhoto({ studioId: auth.studioId, userId: auth.user.id, sampleId: id, filePath: req.file.path, fileName: req.file.originalname, byteSize: req.file.size });
      res.status(201).json(photo);
    },
  );

  return r.router;
}

export function samplePhotosRouter(service: SamplesService, storage: ObjectStorage) {
  const r = createRoutes('/api/sample-photos');
  const photoId = (req: Parameters<typeof idParam>[0]) => idParam(req, 'id', 'That photo');
  for (const size of ['thumb', 'display', 'original'] as const) {
    r.get(`/:id/${size}`, 'studio.read', async (req, res) => {
      await sendPhoto(res, storage, await service.photo(studioAuth(req).studioId, photoId(req)), size);
    });
  }
  r.delete('/:id', 'samples.record', async (req, res) => {
    await service.removePhoto(studioAuth(req).studioId, photoId(req));
    res.status(204).end();
  });
  return r.router;
}
