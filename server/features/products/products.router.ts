import { createProductRequestSchema, productListQuerySchema, updateProductDetailsRequestSchema, updateProductRequestSchema } from '../../../shared/contracts/products';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody, parseQuery } from '../../middleware/validate';
import type { ProductsService } from './products.service';

export function productsRouter(service: ProductsService) {
  const r = createRoutes('/api/products');
  r.get('/', 'studio.read', async (req, res) => {
    res.json({ products: await service.list(studioAuth(req).studioId, parseQuery(req, productListQuerySchema)) });
  });
  r.post('/', 'products.compose', async (req, res) => {
    const auth = studioAuth(req);
    res.status(201).json(await service.create(auth.studioId, auth.user.id, parseBody(req, createProductRequestSchema)));
  });
  r.get('/:id', 'studio.read', async (req, res) => {
    res.json(await service.detail(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  r.patch('/:id', 'products.compose', async (req, res) => {
    const input = parseBody(req, updateProductRequestSchema);
    res.json(await service.update(studioAuth(req).studioId, idParam(req, 'id', 'That product'), input));
  });
  r.patch('/:id/details', 'products.compose', async (req, res) => {
    const input = parseBody(req, updateProductDetailsRequestSchema);
    res.json(await service.updateDetails(studioAuth(req).studioId, idParam(req, 'id', 'That product'), input));
  });
  r.delete('/:id', 'products.compose', async (req, res) => {
    await service.remove(studioAuth(req).studioId, idParam(req, 'id', 'That product'));
    res.status(204).end();
  });
  return r.router;
}
