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

/** What a guard admits; attached to the guard function so the authorisation matrix can read the router table. */
export type Guard = { kind: 'public' } | { kind: 'user' } | { kind: 'role'; roles: Role[] } | { kind: 'signature' };
export type GuardedHandler = RequestHandler & { guard: Guard };

const guarded = (fn: RequestHandler, guard: Guard): GuardedHandler => Object.assign(fn, { guard });

/** Any signed-in user. */
export const requireUser = guarded((req, _res, next) => {
  if (!req.user) return next(unauthenticated());
  next();
}, { kind: 'user' });

/** Signed in and holding at least one of the roles. */
export function requireRole(...roles: Role[]): GuardedHandler {
  return guarded((req, _res, next) => {
    if (!req.user) return next(unauthenticated());
    if (!roles.some((r) => req.user!.roles.includes(r))) return next(forbidden(`This needs the ${roles.join(' or ')} role`));
    next();
  }, { kind: 'role', roles });
}

/** Routes open to everyone say so explicitly, so the authorisation matrix can tell them from forgotten ones. */
export const publicRoute = guarded((_req, _res, next) => next(), { kind: 'public' });

/** Webhooks: no session, the request proves itself by a signature checked in the handler. */
export const signedRequest = guarded((_req, _res, next) => next(), { kind: 'signature' });

export function currentUser(req: Express.Request): SessionUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}
