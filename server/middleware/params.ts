import type { Request } from 'express';
import { notFound } from '../lib/http-error';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// An id that cannot exist answers like one that belongs to nobody: 404.
export function idParam(req: Request, name: string, what: string): string {
  const value = req.params[name];
  if (typeof value !== 'string' || !uuidPattern.test(value)) throw notFound(what);
  return value.toLowerCase();
}
