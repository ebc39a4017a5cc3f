import { createExportRequestSchema, downloadQuerySchema, preflightQuerySchema, previewQuerySchema, previewViewSchema, softProofQuerySchema } from '../../../shared/contracts/exports';
import { notFound } from '../../lib/http-error';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody, parseQuery } from '../../middleware/validate';
import type { ExportsService } from './exports.service';

/** Routes under a product: ask for an export, its preflight and its previews. */
export function productExportsRouter(service: ExportsService) {
  const r = createRoutes('/api/products');
  r.post('/:id/exports', 'exports.create', async (req, res) => {
    const auth = studioAuth(req);
    res.status(202).json(await service.request(auth.studioId, auth.user.id, idParam(req, 'id', 'That product'), parseBody(req, createExportRequestSchema)));
  });
  r.get('/:id/exports', 'studio.read', async (req, res) => {
    res.set('Cache-Control', 'private, no-cache').json(await service.listForProduct(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  r.get('/:id/preflight', 'studio.read', async (req, res) => {
    const { variant } = parseQuery(req, preflightQuerySchema);
    res.json(await service.preflight(studioAuth(req).studioId, idParam(req, 'id', 'That product'), variant ?? null));
  });
  r.get('/:id/soft-proof.png', 'studio.read', async (req, res) => {
    const query = parseQuery(req, softProofQuerySchema);
    const proof = await service.softProofImage(studioAuth(req).studioId, idParam(req, 'id', 'That product'), query);
    // The share and the condition ride along, so the editor can label the view without a second request.
    res.type('image/png').set({
      'Cache-Control': 'private, no-cache',
      'X-Soft-Proof-Share': proof.share.toFixed(4),
      'X-Soft-Proof-Profile': encodeURIComponent(proof.profileName),
    }).send(proof.png);
  });
  r.get('/:id/previews/:view.png', 'studio.read', async (req, res) => {
    const view = previewViewSchema.safeParse(req.params.view);
    if (!view.success) throw notFound('That preview');
    const { variant } = parseQuery(req, previewQuerySchema);
    const png = await service.preview(studioAuth(req).studioId, idParam(req, 'id', 'That product'), view.data, variant ?? null);
    res.type('image/png').set('Cache-Control', 'private, no-cache').send(png);
  });
  return r.router;
}

export function exportsRouter(service: ExportsService) {
  const r = createRoutes('/api/exports');
  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.status(studioAuth(req).studioId, idParam(req, 'id', 'That export')));
  });
  r.get('/:id/download', 'studio.read', async (req, res) => {
    const { file } = parseQuery(req, downloadQuerySchema);
    const found = await service.download(studioAuth(req).studioId, idParam(req, 'id', 'That export'), file);
    const safeName = found.name.replace(/[^A-Za-z0-9._-]/g, '_');
    res.set({ 'Content-Type': found.contentType, 'Content-Length': String(found.bytes), 'Content-Disposition': `attachment; filename="${safeName}"` });
    found.body.pipe(res);
  });
  return r.router;
}
