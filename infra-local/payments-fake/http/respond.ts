import type { Response } from 'express';
import { newId } from '../ids';

export function newRequestId(): string {
  return newId('req').slice(0, 18);
}

/** Sends JSON the way Stripe does: pretty-printed, with a `Request-Id` header. */
export function sendJson(
  res: Response,
  status: number,
  body: string | object,
  headers: Record<string, string> = {},
): void {
  const text = typeof body === 'string' ? body : JSON.stringify(body, null, 2);
  res.status(status);
  res.set({
    'Content-Type': 'application/json',
    'Cache-Control': 'no-cache, no-store',
    ...(headers['Request-Id'] ? {} : { 'Request-Id': newRequestId() }),
    ...headers,
  });
  res.send(text);
}
