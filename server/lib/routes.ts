import express, { type RequestHandler } from 'express';
import { requireAccess, type Access } from '../middleware/auth';

export type RouteRecord = { method: string; path: string; access: Access };

// Every route of the API, with the access it declared: tests walk this list to check each
// role against each route, and docs are checked against it.
export const routeRegistry: RouteRecord[] = [];

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Add = (path: string, access: Access, ...handlers: RequestHandler[]) => void;

export function createRoutes(prefix: string) {
  const inner = express.Router();
  // Mounted under its prefix, so `app.use(featureRouter)` is all a caller writes.
  const router = express.Router().use(prefix, inner);
  const add = (method: Method): Add => (path, access, ...handlers) => {
    const fullPath = `${prefix}${path === '/' ? '' : path}`;
    if (!routeRegistry.some((r) => r.method === method && r.path === fullPath)) {
      routeRegistry.push({ method, path: fullPath, access });
    }
    inner[method](path, requireAccess(access), ...handlers);
  };
  return { router, prefix, get: add('get'), post: add('post'), put: add('put'), patch: add('patch'), delete: add('delete') };
}
