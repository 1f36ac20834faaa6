import type { ApiErrorBody } from '@shared/types/api-error';

/** What kind of failure an {@link ApiError} is, so screens can react without reading status numbers. */
export type ApiErrorKind =
  | 'network'
  | 'bad_request'
  | 'unauthorized'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'validation'
  | 'rate_limited'
  | 'server'
  | 'unknown';

/** Message shown when the browser gets no answer at all. */
export const NETWORK_ERROR_MESSAGE = 'Benchwright could not be reached. Check your connection and try again.';

/** Map an HTTP status to the kind of failure it means. */
export function kindForStatus(status: number): ApiErrorKind {
  if (status === 0) return 'network';
  if (status === 400) return 'bad_request';
  if (status === 401) return 'unauthorized';
  if (status === 403) return 'forbidden';
  if (status === 404) return 'not_found';
  if (status === 409) return 'conflict';
  if (status === 422) return 'validation';
  if (status === 429) return 'rate_limited';
  if (status >= 500) return 'server';
  return 'unknown';
}

/** A sentence for failures whose body carried no message of its own. */
function fallbackMessage(status: number): string {
  if (status === 401) return 'Please sign in to continue.';
  if (status === 403) return 'Your account may not do that.';
  if (status === 404) return 'That could not be found.';
  if (status === 429) return 'Too many attempts. Wait a little and try again.';
  if (status >= 502 && status <= 504) return 'Benchwright could not be reached just now. Try again in a moment.';
  if (status >= 500) return 'Something went wrong at Benchwright. Try again in a moment.';
  return 'The request could not be completed.';
}

/** Any failed call to the Benchwright API, carrying the server's code, message and field errors. */
export class ApiError extends Error {
  override readonly name: string = 'ApiError';
  /** HTTP status; 0 when there was no answer. */
  readonly status: number;
  /** Stable machine-readable code from the server, e.g. `invalid_credentials`. */
  readonly code: string;
  readonly kind: ApiErrorKind;
  /** Messages per input field name (422 `validation_failed`). */
  readonly fields: Record<string, string>;
  /** Seconds to wait before trying again (429). */
  readonly retryAfterSeconds: number | undefined;

  constructor(
    status: number,
    code: string,
    message: string,
    fields: Record<string, string> = {},
    retryAfterSeconds?: number,
  ) {
    super(message);
    this.status = status;
    this.code = code;
    this.kind = kindForStatus(status);
    this.fields = fields;
    this.retryAfterSeconds = retryAfterSeconds;
  }
}

/** The browser got no answer: offline, DNS, or the server is down. */
export class NetworkError extends ApiError {
  override readonly name = 'NetworkError';

  constructor() {
    super(0, 'network_error', NETWORK_ERROR_MESSAGE);
  }
}

function isErrorBody(body: unknown): body is ApiErrorBody {
  if (typeof body !== 'object' || body === null || !('error' in body)) return false;
  const error = (body as { error: unknown }).error;
  return typeof error === 'object' && error !== null && typeof (error as { code?: unknown }).code === 'string';
}

/** Read a `Retry-After` header given in seconds. */
function retryAfterFromHeader(headers: Headers): number | undefined {
  const value = Number(headers.get('Retry-After'));
  return Number.isFinite(value) && value > 0 ? value : undefined;
}

/** Build the {@link ApiError} for a failed response from its status, headers and (maybe JSON) body. */
export function errorFromResponse(status: number, headers: Headers, body: unknown): ApiError {
  if (!isErrorBody(body)) {
    return new ApiError(status, `http_${status}`, fallbackMessage(status), {}, retryAfterFromHeader(headers));
  }
  const { code, message, fields, retryAfterSeconds } = body.error;
  return new ApiError(
    status,
    code,
    message || fallbackMessage(status),
    fields ?? {},
    retryAfterSeconds ?? retryAfterFromHeader(headers),
  );
}

/** Whether `error` is an {@link ApiError}, optionally with one of the given codes. */
export function isApiError(error: unknown, ...codes: string[]): error is ApiError {
  return error instanceof ApiError && (codes.length === 0 || codes.includes(error.code));
}

/** Turn anything thrown into an {@link ApiError}, so screens deal with one shape. */
export function toApiError(error: unknown): ApiError {
  if (error instanceof ApiError) return error;
  return new ApiError(0, 'client_error', 'Something went wrong on this page. Reload it and try again.');
}

/** Whether the server says there is no session any more (not a wrong password at sign-in). */
export function isSessionLost(error: unknown): boolean {
  return error instanceof ApiError && error.status === 401 && error.code !== 'invalid_credentials';
}
