import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { can, type Permission } from '../../shared/auth/permissions';
import { forbidden, unauthorised } from '../lib/http-error';
import type { AuthContext } from './session-types';

// Every route declares one of these; nothing else decides who may call it.
export type Access = 'public' | 'signed-in' | Permission;

export type LoadAuthContext = (userId: string, studioId: string | undefined) => Promise<AuthContext | null>;

export function loadAuth(load: LoadAuthContext): RequestHandler {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const context = await load(userId, req.session.studioId);
    if (!context) {
      // The account is gone: forget it rather than answer as someone who no longer exists.
      delete req.session.userId;
      delete req.session.studioId;
      return next();
    }
    req.session.studioId = context.studioId ?? undefined;
    req.auth = context;
    next();
  };
}

export function requireAccess(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === 'public') return next();
    if (!req.auth) return next(unauthorised());
    if (access === 'signed-in') return next();
    if (!req.auth.studioId || !req.auth.role) {
      return next(forbidden('studio.none', 'You are not a member of any studio yet.'));
    }
    if (!can(req.auth.role, access)) {
      return next(forbidden('role.forbidden', `Your role (${req.auth.role}) may not do this.`));
    }
    next();
  };
}

export type StudioAuth = AuthContext & { studioId: string; role: NonNullable<AuthContext['role']> };

// For handlers behind a studio permission: the studio every query must be scoped to.
export function studioAuth(req: Request): StudioAuth {
  const auth = req.auth;
  if (!auth) throw unauthorised();
  if (!auth.studioId || !auth.role) throw forbidden('studio.none', 'You are not a member of any studio yet.');
  return auth as StudioAuth;
}

export function signedInUser(req: Request): AuthContext['user'] {
  if (!req.auth) throw unauthorised();
  return req.auth.user;
}
