import type { SessionView } from '@shared/types/user';
import { errorFromResponse, isApiError, NetworkError } from './errors';

/** HTTP methods the API uses. Every method but GET must carry the CSRF token. */
export type HttpMethod = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

/** Query-string values; `undefined`, `null` and empty strings are left out. */
export type QueryParams = Record<string, string | number | boolean | null | undefined>;

/** Options for one call. */
export interface RequestOptions {
  /** Sent as JSON. */
  body?: unknown;
  query?: QueryParams;
  signal?: AbortSignal;
}

/** Header the server reads the CSRF token from. */
export const CSRF_HEADER = 'X-CSRF-Token';
const SESSION_PATH = '/api/auth/session';

let csrfToken: string | null = null;
let sessionListener: ((session: SessionView) => void) | null = null;

/** Remember the CSRF token to send with every non-GET request (the auth store calls this). */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

/** The CSRF token that will be sent next. */
export function getCsrfToken(): string | null {
  return csrfToken;
}

/** Be told when the wrapper refreshes the session by itself (after a `csrf_invalid` answer). */
export function onSessionRefreshed(listener: ((session: SessionView) => void) | null): void {
  sessionListener = listener;
}

/** Join a path and its query string, leaving out empty values. */
export function buildUrl(path: string, query?: QueryParams): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  const type = response.headers.get('Content-Type') ?? '';
  if (!type.includes('json')) return text;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

async function send<T>(method: HttpMethod, path: string, options: RequestOptions): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers[CSRF_HEADER] = csrfToken;

  let response: Response;
  try {
    response = await fetch(buildUrl(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new NetworkError();
  }

  const body = await readBody(response);
  if (!response.ok) throw errorFromResponse(response.status, response.headers, body);
  return body as T;
}

/** Fetch a fresh session (and with it a fresh CSRF token), telling the listener. */
async function refreshSession(): Promise<void> {
  const session = await send<SessionView>('GET', SESSION_PATH, {});
  csrfToken = session.csrfToken;
  sessionListener?.(session);
}

/**
 * The one way the client talks to the API: JSON in and out, same-origin cookies,
 * the CSRF header on changes, and typed {@link ApiError}s on failure.
 * A change refused with `csrf_invalid` (e.g. the session expired) is retried once
 * after fetching a fresh session.
 */
export async function request<T>(method: HttpMethod, path: string, options: RequestOptions = {}): Promise<T> {
  try {
    return await send<T>(method, path, options);
  } catch (error) {
    if (method === 'GET' || !isApiError(error, 'csrf_invalid')) throw error;
    await refreshSession();
    return send<T>(method, path, options);
  }
}

/** Shorthands for {@link request}. */
export const http = {
  get: <T>(path: string, query?: QueryParams, signal?: AbortSignal) => request<T>('GET', path, { query, signal }),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, { body }),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, { body }),
  delete: <T>(path: string, body?: unknown) => request<T>('DELETE', path, { body }),
};
