import type { Router } from 'express';
import type { SharedServices } from '../app';
import type { Runtime } from '../runtime';
import { createMotifsRepository } from './motifs/motifs.repository';
import { motifsRouter } from './motifs/motifs.router';
import { createOriginalsCleanup } from './originals/originals-cleanup';
import { createOriginalsRepository } from './originals/originals.repository';
import { originalsRouter } from './originals/originals.router';
import { createOriginalsService } from './originals/originals.service';

// Feature routers that need the queue or storage beyond the foundation's.
export function featureRouters(runtime: Pick<Runtime, 'config' | 'db' | 'storage' | 'queue'>, _shared: SharedServices): Router[] {
  const { db, storage, queue, config } = runtime;
  const originals = createOriginalsService({
    repo: createOriginalsRepository(db.db),
    storage,
    queue,
    cleanup: createOriginalsCleanup(db.db, storage),
  });
  return [originalsRouter(originals, config), motifsRouter(createMotifsRepository(db.db), storage)];
}
