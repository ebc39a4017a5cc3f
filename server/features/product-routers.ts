import type { Router } from 'express';
import type { Runtime } from '../runtime';
import { createProductsRepository } from './products/products.repository';
import { productsRouter } from './products/products.router';
import { createProductsService } from './products/products.service';
import { createTemplatesRepository } from './templates/templates.repository';
import { templatesRouter } from './templates/templates.router';
import { createTemplatesService } from './templates/templates.service';

// Templates and products: the compositor's server side.
export function productRouters(runtime: Pick<Runtime, 'db'>): Router[] {
  const templates = createTemplatesService(createTemplatesRepository(runtime.db.db));
  const products = createProductsService(createProductsRepository(runtime.db.db), templates);
  return [templatesRouter(templates), productsRouter(products)];
}
