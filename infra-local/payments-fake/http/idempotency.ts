import { createHash } from 'node:crypto';
import { idempotencyError, invalidRequest, type StripeApiError } from '../errors';
import type { IdempotencyRecord, Store } from '../store';

/** Stripe keeps idempotency keys for at least 24 hours. */
const KEY_LIFETIME_SECONDS = 24 * 60 * 60;
/** The SDK sends a key with every POST; keep the newest ones only, so the state file stays small. */
const MAX_KEYS = 2000;

function stable(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(stable);
  if (typeof value === 'object' && value !== null) {
    return Object.fromEntries(
      Object.keys(value)
        .sort()
        .map((key) => [key, stable((value as Record<string, unknown>)[key])]),
    );
  }
  return value;
}

/** A hash of the parameters that ignores key order. */
export function fingerprint(params: unknown): string {
  return createHash('sha256')
    .update(JSON.stringify(stable(params ?? {})))
    .digest('hex');
}

export type IdempotencyOutcome =
  { kind: 'new' } | { kind: 'replay'; record: IdempotencyRecord } | { kind: 'conflict'; error: StripeApiError };

export function checkIdempotencyKey(
  store: Store,
  key: string,
  method: string,
  path: string,
  print: string,
  now: number,
): IdempotencyOutcome {
  if (key.length > 255) {
    return {
      kind: 'conflict',
      error: invalidRequest('Idempotency-Key must be at most 255 characters.', { param: 'Idempotency-Key' }),
    };
  }
  const record = store.state.idempotency[key];
  if (!record || record.createdAt + KEY_LIFETIME_SECONDS < now) return { kind: 'new' };
  if (record.method !== method || record.path !== path) {
    return {
      kind: 'conflict',
      error: idempotencyError(
        `Keys for idempotent requests can only be used for the same endpoint they were first used for ('${record.method} ${record.path}'). Try using a key other than '${key}' if you meant to execute a different request.`,
      ),
    };
  }
  if (record.fingerprint !== print) {
    return {
      kind: 'conflict',
      error: idempotencyError(
        `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
      ),
    };
  }
  return { kind: 'replay', record };
}

export function rememberIdempotentResult(store: Store, key: string, record: IdempotencyRecord, now: number): void {
  for (const [oldKey, old] of Object.entries(store.state.idempotency)) {
    if (old.createdAt + KEY_LIFETIME_SECONDS < now) delete store.state.idempotency[oldKey];
  }
  store.state.idempotency[key] = record;
  const keys = Object.keys(store.state.idempotency);
  for (const oldKey of keys.slice(0, Math.max(0, keys.length - MAX_KEYS))) delete store.state.idempotency[oldKey];
}
