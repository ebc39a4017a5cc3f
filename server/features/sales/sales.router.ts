import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { rm } from 'node:fs/promises';
import path from 'node:path';
import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';
import { motifSalesQuerySchema, salesImportFieldsSchema, salesSettingsRequestSchema, salesSummaryQuerySchema } from '../../../shared/contracts/sales';
import type { AppConfig } from '../../config';
import { badRequest } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody, parseQuery } from '../../middleware/validate';
import { parseMappingField } from './sales-import';
import type { SalesService } from './sales.service';

// A year of a busy shop's order lines is a few MB; 50 MB leaves room without inviting misuse.
export const SALES_UPLOAD_LIMIT_BYTES = 50 * 1024 * 1024;

export function salesRouter(service: SalesService, config: Pick<AppConfig, 'STORAGE_DIR'>) {
  const r = createRoutes('/api/sales');
  const uploadDir = path.resolve(config.STORAGE_DIR, 'uploads');
  mkdirSync(uploadDir, { recursive: true });
  const upload = multer({
    storage: multer.diskStorage({ destination: uploadDir, filename: (_req, _file, cb) => cb(null, `${randomUUID()}.sales.csv`) }),
    limits: { fileSize: SALES_UPLOAD_LIMIT_BYTES, files: 1, fields: 5, fieldSize: 64 * 1024 },
    defParamCharset: 'utf8',
  }).single('file');

  const receive = (req: Request, res: Response, next: NextFunction) =>
    upload(req, res, (err: unknown) => {
      if ((err as { code?: string })?.code === 'LIMIT_FILE_SIZE') {
        res.status(413).json({ error: { code: 'upload.too_large', message: `This file is larger than the limit of ${SALES_UPLOAD_LIMIT_BYTES / 1024 / 1024} MB for sales files.` } });
        return;
      }
      next(err);
    });

  // The spooled upload is removed whatever happens; only its rows are kept.
  const withFile = async <T>(req: Request, use: (file: { filePath: string; fileName: string }) => Promise<T>): Promise<T> => {
    if (!req.file) throw badRequest('upload.missing_file', 'Choose a CSV file (form field "file").');
    try {
      return await use({ filePath: req.file.path, fileName: req.file.originalname });
    } finally {
      await rm(req.file.path, { force: true });
    }
  };

  r.post('/imports/preview', 'sales.import', receive, async (req, res) => {
    const studioId = studioAuth(req).studioId;
    const mapping = parseMappingField(typeof req.body?.mapping === 'string' ? req.body.mapping : undefined);
    res.json(await withFile(req, (file) => service.preview(studioId, file, mapping)));
  });

  r.post('/imports', 'sales.import', receive, async (req, res) => {
    const auth = studioAuth(req);
    const outcome = await withFile(req, (file) => {
      const fields = parseBody(req, salesImportFieldsSchema);
      const mapping = parseMappingField(fields.mapping)!;
      return service.importFile(auth.studioId, auth.user.id, file, mapping, fields.skipBadRows);
    });
    if (!outcome.ok) {
      const v = outcome.validation;
      const unknown = v.unknownSkus.length > 0 ? ` (${v.unknownSkus.length} unknown SKU${v.unknownSkus.length === 1 ? '' : 's'})` : '';
      res.status(422).json({
        error: { code: 'sales.rows_invalid', message: `${v.badRowCount.toLocaleString('en')} of ${v.rowCount.toLocaleString('en')} rows cannot be imported${unknown}; nothing was imported. Fix the file, or import the good rows and skip these.` },
        validation: v,
      });
      return;
    }
    res.status(201).location(`/api/sales/imports/${outcome.import.id}`).json({ ...outcome.import, importedBy: { id: auth.user.id, name: auth.user.name } });
  });

  r.get('/imports', 'studio.read', async (req, res) => {
    res.json({ imports: await service.list(studioAuth(req).studioId) });
  });

  r.delete('/imports/:id', 'sales.import', async (req, res) => {
    await service.remove(studioAuth(req).studioId, idParam(req, 'id', 'That sales import'));
    res.status(204).end();
  });

  r.get('/summary', 'studio.read', async (req, res) => {
    res.json(await service.summary(studioAuth(req).studioId, parseQuery(req, salesSummaryQuerySchema)));
  });

  r.get('/settings', 'studio.read', async (req, res) => {
    res.json(await service.settings(studioAuth(req).studioId));
  });

  r.patch('/settings', 'sales.import', async (req, res) => {
    res.json(await service.setSplitRule(studioAuth(req).studioId, parseBody(req, salesSettingsRequestSchema).splitRule));
  });

  return r.router;
}

// The motif page's sales line, under the motif's own address.
export function motifSalesRouter(service: SalesService) {
  const r = createRoutes('/api/motifs');
  r.get('/:id/sales', 'studio.read', async (req, res) => {
    const studioId = studioAuth(req).studioId;
    res.json(await service.motifSales(studioId, idParam(req, 'id', 'That motif'), parseQuery(req, motifSalesQuerySchema)));
  });
  return r.router;
}
