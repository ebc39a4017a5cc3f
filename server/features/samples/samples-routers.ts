import type { Router } from 'express';
import type { Runtime } from '../../runtime';
import { createSamplesRepository } from './samples.repository';
import { productSamplesRouter, samplePhotosRouter, samplesRouter } from './samples.router';
import { createSamplesService } from './samples.service';

// Sample orders of products, their photos and verdicts.
export function samplesRouters(runtime: Pick<Runtime, 'config' | 'db' | 'storage'>): Router[] {
  const { config, db, storage } = runtime;
  const service = createSamplesService({
    repo: createSamplesRepository(db.db),
    storage,
    maxPixels: config.SAMPLE_PHOTO_MAX_PIXELS,
    photoLimitBytes: config.SAMPLE_PHOTO_LIMIT_BYTES,
  });
  return [productSamplesRouter(service), samplesRouter(service, config), samplePhotosRouter(service, storage)];
}
