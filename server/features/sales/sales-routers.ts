import type { Router } from 'express';
import type { Runtime } from '../../runtime';
import { createSalesRepository } from './sales.repository';
import { motifSalesRouter, salesRouter } from './sales.router';
import { createSalesService } from './sales.service';

// Sales imports, "what sells" and each motif's sales line.
export function salesRouters(runtime: Pick<Runtime, 'db' | 'config'>): Router[] {
  const service = createSalesService(createSalesRepository(runtime.db.db));
  return [salesRouter(service, runtime.config), motifSalesRouter(service)];
}
