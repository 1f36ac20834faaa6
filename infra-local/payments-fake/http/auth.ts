import type { RequestHandler } from 'express';
import { invalidRequest, unauthenticated, type StripeApiError } from '../errors';
import { sendJson } from './respond';

const NO_KEY_MESSAGE =
  "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY'). See https://stripe.com/docs/api#authentication for details, or we can help at https://support.stripe.com/.";

function keyFrom(header: string | undefined): string | null {
  if (!header) return null;
  const bearer = /^Bearer\s+(\S+)\s*$/i.exec(header);
  if (bearer?.[1]) return bearer[1];
  // `curl -u sk_test_…:` sends the key as the Basic user name, which Stripe also accepts.
  const basic = /^Basic\s+(\S+)\s*$/i.exec(header);
  if (basic?.[1]) {
    const user = Buffer.from(basic[1], 'base64').toString('utf8').split(':')[0];
    return user || null;
  }
  return null;
}

function masked(key: string): string {
  const prefix = /^[a-z]+_[a-z]+_/.exec(key)?.[0] ?? '';
  return `${prefix}${'*'.repeat(Math.max(4, key.length - prefix.length - 4))}${key.slice(-4)}`;
}

/** Requires a test-mode secret (or restricted) key, as Stripe's test mode does. */
export function requireTestKey(): RequestHandler {
  return (req, res, next) => {
    const key = keyFrom(req.get('Authorization'));
    let error: StripeApiError | null = null;
    if (key === null) error = unauthenticated(NO_KEY_MESSAGE);
    else if (/^(sk|rk)_live_/.test(key))
      error = unauthenticated(`The payments fake accepts only test-mode keys; got a live key ${masked(key)}.`);
    else if (!/^(sk|rk)_test_[A-Za-z0-9_]+$/.test(key))
      error = unauthenticated(`Invalid API Key provided: ${masked(key)}`);
    else if (req.get('Stripe-Account')) {
      error = invalidRequest(
        'The Stripe-Account header (acting as a connected account) is not modelled by the payments fake.',
        {
          param: 'Stripe-Account',
        },
      );
    }
    if (error) {
      sendJson(
        res,
        error.status,
        { error: error.body },
        error.status === 401 ? { 'WWW-Authenticate': 'Bearer realm="Stripe"' } : {},
      );
      return;
    }
    next();
  };
}
