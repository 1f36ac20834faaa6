import type { RequestHandler } from 'express';
import { csrfSync } from 'csrf-sync';
import { AppError } from '../errors';

/**
 * Synchroniser-token CSRF protection: the token lives in the server-side session and must come
 * back in the X-CSRF-Token header on every state-changing request. A header cannot be sent by a
 * plain cross-site form, so JSON, form and text/plain forgeries all fail.
 */
export const csrf = csrfSync({
  getTokenFromRequest: (req) => {
    const header = req.headers['x-csrf-token'];
    return typeof header === 'string' ? header : undefined;
  },
  errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'invalid csrf token' },
});

/** Refuse state-changing requests that a browser says come from another site. */
export function sameOriginOnly(appOrigin: string): RequestHandler {
  return (req, _res, next) => {
    if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return next();
    const origin = req.headers.origin;
    if (origin !== undefined && origin !== appOrigin) {
      throw new AppError(403, 'csrf_invalid', 'Requests from other sites are not accepted.');
    }
    next();
  };
}
