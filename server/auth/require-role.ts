import type { RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/auth';
import { forbidden, unauthenticated } from '../errors';

export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  roles: Role[];
  emailVerified: boolean;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

/** Any signed-in user. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(unauthenticated());
  next();
};

/** Signed in and holding at least one of the roles. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    if (!roles.some((r) => req.user!.roles.includes(r))) return next(forbidden(`This needs the ${roles.join(' or ')} role`));
    next();
  };
}

/** Routes open to everyone say so explicitly, so the authorisation matrix can tell them from forgotten ones. */
export const publicRoute: RequestHandler = (_req, _res, next) => next();

export function currentUser(req: Express.Request): SessionUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}
