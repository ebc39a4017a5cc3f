import type { Request } from 'express';
import { issueCsrfToken } from '../../middleware/csrf';

// A new session id at every sign-in, so a session fixed before sign-in is worthless after it.
export function establishSession(req: Request, userId: string, studioId: string | null): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.studioId = studioId ?? undefined;
      issueCsrfToken(req);
      req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
    });
  });
}

export function endSession(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
}
