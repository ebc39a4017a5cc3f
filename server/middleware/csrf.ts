import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import { forbidden } from '../lib/http-error';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

export function issueCsrfToken(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

// Synchronizer token bound to the session: every state-changing request repeats it in a header
// that a cross-site form cannot set.
export function csrfProtection(req: Request, _res: Response, next: NextFunction) {
  if (safeMethods.has(req.method)) return next();
  const expected = req.session?.csrfToken;
  const sent = req.get('x-csrf-token');
  if (!expected || !sent) {
    return next(forbidden('csrf.invalid', 'This request is missing its security token; reload the page and try again.'));
  }
  const a = Buffer.from(expected);
  const b = Buffer.from(sent);
  if (a.length !== b.length || !timingSafeEqual(a, b)) {
    return next(forbidden('csrf.invalid', 'This request carried an out-of-date security token; reload the page and try again.'));
  }
  next();
}
