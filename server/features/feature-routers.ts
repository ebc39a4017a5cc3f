import type { Router } from 'express';
import type { SharedServices } from '../app';
import type { Runtime } from '../runtime';
import { productRouters } from './product-routers';
import { createCollectionsRepository } from './collections/collections.repository';
import { collectionsRouter } from './collections/collections.router';
import { createCollectionsService } from './collections/collections.service';
import { createLibraryCache } from './motifs/library-cache';
import { warmSignedInStudios } from './motifs/library-start-warm';
import { libraryWarmUp } from './motifs/library-warm-up';
import { createMotifsRepository } from './motifs/motifs.repository';
import { motifsRouter } from './motifs/motifs.router';
import { createMotifsService } from './motifs/motifs.service';
import type { EarlyUnpacks } from './originals/early-unpacks';
import { createOriginalsCleanup } from './originals/originals-cleanup';
import { createOriginalsRepository } from './originals/originals.repository';
import { originalsRouter } from './originals/originals.router';
import { createOriginalsService } from './originals/originals.service';
import { reviewsRouters } from './reviews/reviews-routers';
import { salesRouters } from './sales/sales-routers';
import { samplesRouters } from './samples/samples-routers';
import { calendarRouters } from './calendar/calendar-routers';
import { studioDataRouters } from './studio-data/studio-data-routers';
import { createTagsRepository } from './tags/tags.repository';
import { tagsRouter } from './tags/tags.router';

// Feature routers that need the queue or storage beyond the foundation's. `earlyUnpacks` only
// when this process also runs the import worker (shared with it). `warmLibrariesOnStart`: the
// server builds the search libraries of studios still signed in, in the background.
export function featureRouters(
  runtime: Pick<Runtime, 'config' | 'db' | 'storage' | 'queue' | 'mailer'>,
  _shared: SharedServices,
  options: { earlyUnpacks?: EarlyUnpacks; warmLibrariesOnStart?: boolean } = {},
): Router[] {
  const { db, storage, queue, config } = runtime;
  const originals = createOriginalsService({
    repo: createOriginalsRepository(db.db),
    storage,
    queue,
    cleanup: createOriginalsCleanup(db.db, storage),
    earlyUnpacks: options.earlyUnpacks,
  });
  // One library cache per process: each keeps itself fresh against Postgres (library-changes.ts).
  const libraryCache = createLibraryCache(db.db);
  if (options.warmLibrariesOnStart) void warmSignedInStudios(db.db, libraryCache);
  const motifsRepo = createMotifsRepository(db.db);
  const motifs = createMotifsService({ db: db.db, repo: motifsRepo, cache: libraryCache, storage });
  const collections = createCollectionsService({ db: db.db, repo: createCollectionsRepository(db.db), cache: libraryCache });
  return [
    libraryWarmUp(libraryCache),
    originalsRouter(originals, config),
    motifsRouter(motifs, motifsRepo, storage),
    tagsRouter(createTagsRepository(db.db)),
    collectionsRouter(collections),
    ...productRouters(runtime),
    ...samplesRouters(runtime),
    ...reviewsRouters(runtime),
    ...salesRouters(runtime),
    ...calendarRouters(runtime),
    ...studioDataRouters(runtime),
  ];
}
