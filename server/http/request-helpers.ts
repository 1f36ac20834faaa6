import type { Request } from 'express';
import type { SessionView } from '../../shared/types/user';
import { csrf } from './middlewares/csrf';
import { presentUser } from '../features/users/user.presenter';

/** The caller's address as Express derives it (honours TRUST_PROXY_HOPS only). */
export const clientIp = (req: Request): string => req.ip ?? req.socket.remoteAddress ?? 'unknown';

/** The session as the client sees it, with a CSRF token bound to this session. */
export function sessionView(req: Request, rotate = false): SessionView {
  return { user: req.user ? presentUser(req.user) : null, csrfToken: csrf.generateToken(req, rotate) };
}

/** Sign `user` in on this request: passport regenerates the session id (no fixation). */
export function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => {
    req.logIn(user, (error) => {
      if (error) return reject(error);
      const now = Date.now();
      req.session.signedInAt = now;
      req.session.lastSeenAt = now;
      resolve();
    });
  });
}

export function logOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logout((error) => (error ? reject(error) : resolve())));
}
