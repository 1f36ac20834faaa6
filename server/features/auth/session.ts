import type { RequestHandler } from 'express';
import session from 'express-session';
import MySQLStoreFactory from 'express-mysql-session';
import type { Pool } from 'mysql2';
import type { Config } from '../../config';

export const SESSION_COOKIE = 'bw.sid';

/** Cookie sessions stored in MariaDB, so any app server can serve any request. */
export function createSessionMiddleware(
  config: Config,
  pool: Pool,
): { middleware: RequestHandler; close: () => Promise<void> } {
  const MySQLStore = MySQLStoreFactory(session);
  const idleMs = config.session.idleMinutes * 60_000;
  const store = new MySQLStore(
    {
      createDatabaseTable: false,
      endConnectionOnClose: false,
      clearExpired: true,
      checkExpirationInterval: 15 * 60_000,
      expiration: idleMs,
    },
    pool,
  );
  const middleware = session({
    name: SESSION_COOKIE,
    secret: config.session.secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    unset: 'destroy',
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.session.cookieSecure,
      maxAge: idleMs,
      path: '/',
    },
  });
  return { middleware, close: () => store.close() };
}

/**
 * End a session that has been idle too long or has passed its absolute lifetime, even if the
 * browser still presents the cookie.
 */
export function sessionTimeouts(config: Config): RequestHandler {
  const idleMs = config.session.idleMinutes * 60_000;
  const absoluteMs = config.session.absoluteHours * 3_600_000;
  return (req, _res, next) => {
    const s = req.session;
    if (!s) return next();
    const now = Date.now();
    const idle = s.lastSeenAt !== undefined && now - s.lastSeenAt > idleMs;
    const expired = s.signedInAt !== undefined && now - s.signedInAt > absoluteMs;
    if (idle || expired) {
      s.regenerate((error) => {
        req.user = undefined;
        next(error);
      });
      return;
    }
    if (s.signedInAt !== undefined) s.lastSeenAt = now;
    next();
  };
}
