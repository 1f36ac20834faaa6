/** An error with an HTTP status and a stable code; the error handler turns it into JSON. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const badRequest = (code: string, message: string) => new AppError(400, code, message);
export const validationFailed = (fields: Record<string, string>, message = 'Some fields need attention.') =>
  new AppError(422, 'validation_failed', message, fields);
export const notSignedIn = () => new AppError(401, 'not_signed_in', 'Sign in to continue.');
export const forbidden = (message = 'Your account cannot do this.') => new AppError(403, 'forbidden', message);
export const notFound = (what = 'That page') => new AppError(404, 'not_found', `${what} was not found.`);
export const conflict = (code: string, message: string) => new AppError(409, code, message);
export const tooManyRequests = (retryAfterSeconds: number, message: string) =>
  new AppError(429, 'rate_limited', message, undefined, retryAfterSeconds);
export const serviceUnavailable = (message: string) => new AppError(503, 'service_unavailable', message);
