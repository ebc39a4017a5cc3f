import { Router } from 'express';
import type { LibraryCache } from './library-cache';

// Any signed-in request of a studio (the home page's notifications, a product) starts building
// that studio's search library in this process if it has none yet, so the library page does not
// wait for the build. Never delays the request itself.
export function libraryWarmUp(cache: Pick<LibraryCache, 'warm'>): Router {
  const router = Router();
  router.use('/api', (req, _res, next) => {
    const studioId = req.auth?.studioId;
    if (studioId) cache.warm(studioId);
    next();
  });
  return router;
}
