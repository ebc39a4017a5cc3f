import { Router } from 'express';
import type { LibraryCache } from './library-cache';

// A signed-in studio's page loads (GETs: the home page's notifications, a product) start building
// that studio's search library in this process if it has none yet, so the library page does not
// wait for the build. Edits are left alone: their work stays what they ask for. Never delays the
// request itself.
export function libraryWarmUp(cache: Pick<LibraryCache, 'warm'>): Router {
  const router = Router();
  router.use('/api', (req, _res, next) => {
    const studioId = req.auth?.studioId;
    if (studioId && req.method === 'GET') cache.warm(studioId);
    next();
  });
  return router;
}
