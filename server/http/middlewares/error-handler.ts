import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AppError, notFound } from '../errors';

interface HttpLikeError {
  status?: number;
  statusCode?: number;
  type?: string;
  code?: string;
  expose?: boolean;
  /** Set by the MariaDB driver (mysql2) on errors that end a connection: refused, lost, timed out. */
  fatal?: boolean;
}

/** The database cannot be reached: the request was not wrong, and nothing it asked for was done. */
const databaseUnavailable = () =>
  new AppError(
    503,
    'database_unavailable',
    'Benchwright cannot reach its database just now. Nothing was changed; please try again in a minute.',
    undefined,
    30,
  );

/** The payments provider cannot be reached (its SDK gave up connecting): nothing was charged or set up. */
const paymentsUnavailable = () =>
  new AppError(
    503,
    'payments_unavailable',
    'Payments cannot be reached just now. Nothing was changed; please try again in a few minutes.',
    undefined,
    60,
  );

/** Errors thrown by libraries (body parser, CSRF check, database and payments drivers) mapped to our codes and words. */
function fromLibrary(error: HttpLikeError): AppError | null {
  if (error.type === 'entity.parse.failed')
    return new AppError(400, 'malformed_json', 'The request body is not valid JSON.');
  if (error.type === 'entity.too.large') return new AppError(413, 'payload_too_large', 'The request is too large.');
  if (error.type === 'charset.unsupported' || error.type === 'encoding.unsupported') {
    return new AppError(415, 'unsupported_media_type', 'Send the request as UTF-8 JSON.');
  }
  if (error.code === 'EBADCSRFTOKEN') {
    return new AppError(403, 'csrf_invalid', 'Your session check failed. Reload the page and try again.');
  }
  if (error.fatal === true && typeof error.code === 'string') return databaseUnavailable();
  if (error.type === 'StripeConnectionError') return paymentsUnavailable();
  const status = error.status ?? error.statusCode;
  if (status && status >= 400 && status < 500 && error.expose) {
    return new AppError(status, 'bad_request', 'The request could not be understood.');
  }
  return null;
}

/** API routes that match nothing answer JSON 404, not the client app. */
export const apiNotFound: RequestHandler = () => {
  throw notFound('That API route');
};

/** The one place that turns any error into `{ error: { code, message, fields? } }`. */
export const errorHandler: ErrorRequestHandler = (error: unknown, req, res, next) => {
  if (res.headersSent) return next(error);
  const known = error instanceof AppError ? error : fromLibrary((error ?? {}) as HttpLikeError);
  if (!known) {
    req.log?.error({ err: error }, 'unhandled error');
    res
      .status(500)
      .json({ error: { code: 'internal', message: 'Something went wrong on our side. Please try again.' } });
    return;
  }
  if (known.status >= 500) req.log?.error({ err: error }, known.message);
  if (known.retryAfterSeconds) res.setHeader('Retry-After', String(known.retryAfterSeconds));
  res.status(known.status).json({
    error: {
      code: known.code,
      message: known.message,
      ...(known.fields ? { fields: known.fields } : {}),
      ...(known.retryAfterSeconds ? { retryAfterSeconds: known.retryAfterSeconds } : {}),
    },
  });
};
