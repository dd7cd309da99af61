import type { RequestHandler } from 'express';
import type { Role } from '@shared/workflow/statuses';
import { forbidden, unauthenticated } from '../lib/errors';
import type { SessionUser } from '../lib/session-user';

export function requireSignIn(): RequestHandler {
  return (req, _res, next) => next(req.user ? undefined : unauthenticated());
}

/** Admins can do everything office staff can; pass the roles the route is for. */
export function requireRole(...allowed: readonly Role[]): RequestHandler {
  return (req, _res, next) => {
    const user = req.user as SessionUser | undefined;
    if (!user) return next(unauthenticated());
    if (!allowed.includes(user.role)) return next(forbidden());
    next();
  };
}

// The office's roles are one fact in shared/, which the client's screens use too.
export { officeRoles } from '@shared/workflow/roles';
