import { createVariantRequestSchema, updateVariantRequestSchema } from '../../../shared/contracts/variants';
import { createRoutes } from '../../lib/routes';
import { studioAuth } from '../../middleware/auth';
import { idParam } from '../../middleware/params';
import { parseBody } from '../../middleware/validate';
import type { VariantsService } from './variants.service';

// What a product is sold as (blank colour, handle colour, size) and each one's SKU.
export function variantsRouter(service: VariantsService) {
  const r = createRoutes('/api/products');
  const actorOf = (req: Parameters<typeof studioAuth>[0]) => {
    const auth = studioAuth(req);
    return { studioId: auth.studioId, userId: auth.user.id };
  };
  r.get('/:id/variants', 'studio.read', async (req, res) => {
    res.json(await service.list(studioAuth(req).studioId, idParam(req, 'id', 'That product')));
  });
  r.post('/:id/variants', 'stages.move', async (req, res) => {
    const actor = actorOf(req);
    const productId = idParam(req, 'id', 'That product');
    res.status(201).json(await service.create(actor, productId, parseBody(req, createVariantRequestSchema)));
  });
  r.patch('/:id/variants/:variantId', 'stages.move', async (req, res) => {
    const actor = actorOf(req);
    const productId = idParam(req, 'id', 'That product');
    const variantId = idParam(req, 'variantId', 'That variant');
    res.json(await service.update(actor, productId, variantId, parseBody(req, updateVariantRequestSchema)));
  });
  r.delete('/:id/variants/:variantId', 'stages.move', async (req, res) => {
    const actor = actorOf(req);
    await service.remove(actor, idParam(req, 'id', 'That product'), idParam(req, 'variantId', 'That variant'));
    res.status(204).end();
  });
  return r.router;
}
