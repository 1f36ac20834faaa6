import type { RequestHandler } from 'express';
import { hasAnyRole, type Role } from '../../../shared/roles';
import { forbidden, notSignedIn } from '../errors';

/** Only signed-in accounts pass. */
export const requireSignedIn: RequestHandler = (req, _res, next) => {
  if (!req.user) throw notSignedIn();
  next();
};

/** Only accounts holding one of `roles` pass (an administrator also passes a moderator check). */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw notSignedIn();
    if (!hasAnyRole(req.user.role, roles)) throw forbidden();
    next();
  };
}
