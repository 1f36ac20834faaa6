import type { Runtime } from '../runtime';
import type { Store } from '../store';
import type { StripeEvent, StripeObject } from '../types';

/** What an API handler gets for one request. */
export interface ApiContext {
  runtime: Runtime;
  store: Store;
  /** Form body for POST, query string for GET and DELETE (both parsed by `qs`). */
  raw: unknown;
  /** Route parameters (`:id`). */
  path: Record<string, string>;
  requestId: string;
  idempotencyKey: string | null;
  /** Address of the fake as the client reached it, e.g. `http://127.0.0.1:12111`. */
  baseUrl: string;
  /** The request path without query, e.g. `/v1/payment_intents`. */
  url: string;
  now: () => number;
  emit: (type: string, object: StripeObject, previousAttributes?: Record<string, unknown>) => StripeEvent;
}

/** Returns the JSON body for a 200 response, or throws a StripeApiError. */
export type ApiHandler = (ctx: ApiContext) => object;
