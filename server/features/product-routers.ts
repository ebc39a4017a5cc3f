import type { Router } from 'express';
import type { Runtime } from '../runtime';
import { createExportsRepository } from './exports/exports.repository';
import { exportsRouter, productExportsRouter } from './exports/exports.router';
import { createExportsService } from './exports/exports.service';
import { createProductsRepository } from './products/products.repository';
import { productsRouter } from './products/products.router';
import { createProductsService } from './products/products.service';
import { createStagesRepository } from './stages/stages.repository';
import { stagesRouter } from './stages/stages.router';
import { createStagesService } from './stages/stages.service';
import { createTemplatesRepository } from './templates/templates.repository';
import { templatesRouter } from './templates/templates.router';
import { createTemplatesService } from './templates/templates.service';
import { createVariantsRepository } from './variants/variants.repository';
import { variantsRouter } from './variants/variants.router';
import { createVariantsService } from './variants/variants.service';

// Templates, products and their exports: the compositor's and the print output's server side.
export function productRouters(runtime: Pick<Runtime, 'config' | 'db' | 'storage' | 'queue'>): Router[] {
  const templates = createTemplatesService(createTemplatesRepository(runtime.db.db), runtime.storage);
  const products = createProductsService(createProductsRepository(runtime.db.db), templates);
  const exports = createExportsService({ repo: createExportsRepository(runtime.db.db), products, storage: runtime.storage, queue: runtime.queue });
  return [templatesRouter(templates, runtime.config), productsRouter(products), productExportsRouter(exports), exportsRouter(exports),
    stagesRouter(createStagesService(createStagesRepository(runtime.db.db))),
    variantsRouter(createVariantsService(createVariantsRepository(runtime.db.db), templates))];
}
