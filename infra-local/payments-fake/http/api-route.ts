import type { Request, RequestHandler } from 'express';
import { deliverEvent, recordEvent } from '../domain/events';
import { StripeApiError } from '../errors';
import type { Runtime } from '../runtime';
import type { StripeEvent } from '../types';
import type { ApiContext, ApiHandler } from './context';
import { applyExpand, checkExpandable, readExpand } from './expand';
import { checkIdempotencyKey, fingerprint, rememberIdempotentResult } from './idempotency';
import { newRequestId, sendJson } from './respond';

export interface RouteOptions {
  /** Dotted paths `expand[]` may name, e.g. `latest_charge` or `data.latest_charge`. */
  expandable?: readonly string[];
}

export function baseUrlOf(req: Request): string {
  return `${req.protocol}://${req.get('host') ?? '127.0.0.1'}`;
}

function pathParams(req: Request): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(req.params)) {
    if (typeof value === 'string') out[key] = value;
  }
  return out;
}

interface ContextSeed {
  requestId: string;
  key: string | null;
  raw: unknown;
  /** Receives every event the handler records, for delivery once the response is built. */
  events: StripeEvent[];
}

function buildContext(runtime: Runtime, req: Request, seed: ContextSeed): ApiContext {
  return {
    runtime,
    store: runtime.store,
    raw: seed.raw,
    path: pathParams(req),
    requestId: seed.requestId,
    idempotencyKey: seed.key,
    baseUrl: baseUrlOf(req),
    url: req.originalUrl.split('?')[0] ?? req.path,
    now: runtime.now,
    emit: (type, object, previous) => {
      const event = recordEvent(runtime, type, object, { id: seed.requestId, idempotency_key: seed.key }, previous);
      seed.events.push(event);
      return event;
    },
  };
}

/**
 * Runs a state change outside the JSON API (the HTML onboarding page): same context,
 * then the state is saved and the events are delivered, whether or not `change` throws.
 */
export function runMutation<T>(runtime: Runtime, req: Request, change: (ctx: ApiContext) => T): T {
  const events: StripeEvent[] = [];
  const ctx = buildContext(runtime, req, { requestId: newRequestId(), key: null, raw: {}, events });
  try {
    return change(ctx);
  } finally {
    runtime.store.save();
    for (const event of events) deliverEvent(runtime, event);
  }
}

/**
 * Turns a handler into an Express route with Stripe's request semantics:
 * Idempotency-Key replay and conflict detection on POST, `expand[]`, error rendering,
 * persisting state after every write, and webhook delivery after the response is built.
 */
export function apiRoute(runtime: Runtime, handler: ApiHandler, options: RouteOptions = {}): RequestHandler {
  return (req, res) => {
    const requestId = newRequestId();
    const method = req.method.toUpperCase();
    const isWrite = method !== 'GET' && method !== 'HEAD';
    const raw: unknown = method === 'POST' ? (req.body ?? {}) : req.query;
    const url = req.originalUrl.split('?')[0] ?? req.path;
    const key = method === 'POST' ? (req.get('Idempotency-Key') ?? null) : null;
    const headers: Record<string, string> = {
      'Request-Id': requestId,
      'Stripe-Version': req.get('Stripe-Version') ?? runtime.apiVersion,
      ...(key ? { 'Idempotency-Key': key } : {}),
    };

    const print = key ? fingerprint(raw) : '';
    if (key) {
      const outcome = checkIdempotencyKey(runtime.store, key, method, url, print, runtime.now());
      if (outcome.kind === 'replay') {
        sendJson(res, outcome.record.status, outcome.record.body, {
          ...headers,
          'Idempotent-Replayed': 'true',
          'Original-Request': outcome.record.requestId,
        });
        return;
      }
      if (outcome.kind === 'conflict') {
        sendJson(res, outcome.error.status, { error: outcome.error.body }, headers);
        return;
      }
    }

    const events: StripeEvent[] = [];
    const ctx = buildContext(runtime, req, { requestId, key, raw, events });

    let status = 200;
    let body: object;
    try {
      const expand = readExpand(raw);
      checkExpandable(expand, options.expandable ?? []);
      body = handler(ctx);
      if (expand.length > 0) body = applyExpand(body, expand, runtime.store);
    } catch (error) {
      if (error instanceof StripeApiError) {
        status = error.status;
        body = { error: error.body };
      } else {
        runtime.log(
          `internal error on ${method} ${url}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`,
        );
        status = 500;
        body = { error: { type: 'api_error', message: 'An unexpected error occurred in the payments fake.' } };
      }
    }
    const text = JSON.stringify(body, null, 2);

    // Like Stripe, keep the result for the key once the request did something: successes,
    // card declines, and any error that changed state. A refused request that changed nothing
    // (bad parameters) may be retried with the same key.
    if (key && status !== 500 && (status < 400 || status === 402 || events.length > 0)) {
      rememberIdempotentResult(
        runtime.store,
        key,
        { method, path: url, fingerprint: print, status, body: text, requestId, createdAt: runtime.now() },
        runtime.now(),
      );
    }
    if (isWrite) runtime.store.save();
    sendJson(res, status, text, headers);
    for (const event of events) deliverEvent(runtime, event);
  };
}
