import type { Request } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import { HttpError } from '../lib/http-error';

// Counters live in the process; behind a load balancer each web process limits on its own,
// which still bounds guessing to (limit x processes) per window.
export function limitAttempts(options: { windowMs: number; limit: number; what: string; perEmail?: boolean; countFailuresOnly?: boolean }) {
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    // Sign-in counts only failed guesses, so a person signing in often is never locked out.
    skipSuccessfulRequests: options.countFailuresOnly ?? false,
    keyGenerator: (req: Request) => {
      const ip = ipKeyGenerator(req.ip ?? 'unknown');
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return options.perEmail ? `${ip}|${email}` : ip;
    },
    handler: (_req, _res, next) => {
      const minutes = Math.ceil(options.windowMs / 60_000);
      next(new HttpError(429, 'rate.limited', `Too many ${options.what} attempts. Wait ${minutes} minutes and try again.`));
    },
  });
}
