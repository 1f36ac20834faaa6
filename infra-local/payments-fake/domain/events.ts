import { newId } from '../ids';
import { webhookTargetsFor, type Runtime } from '../runtime';
import type { StripeEvent, StripeObject } from '../types';

/** Events kept (oldest dropped first), so a long-running dev fake keeps a small state file. */
export const MAX_EVENTS = 5000;

export interface EventRequest {
  id: string | null;
  idempotency_key: string | null;
}

/** Records an event with a snapshot of the object; delivery happens after the response is built. */
export function recordEvent(
  runtime: Runtime,
  type: string,
  object: StripeObject,
  request: EventRequest,
  previousAttributes?: Record<string, unknown>,
): StripeEvent {
  const event: StripeEvent = {
    id: newId('evt'),
    object: 'event',
    api_version: runtime.apiVersion,
    created: runtime.now(),
    data: {
      object: structuredClone(object),
      ...(previousAttributes ? { previous_attributes: previousAttributes } : {}),
    },
    livemode: false,
    pending_webhooks: webhookTargetsFor(runtime, type).length,
    request,
    type,
  };
  const events = runtime.store.state.events;
  events[event.id] = event;
  const ids = Object.keys(events);
  for (const oldId of ids.slice(0, Math.max(0, ids.length - MAX_EVENTS))) delete events[oldId];
  return event;
}

export function deliverEvent(runtime: Runtime, event: StripeEvent): void {
  runtime.dispatcher.dispatch(event, webhookTargetsFor(runtime, event.type));
}

/** Stripe's `type` filter on GET /v1/events accepts a `*` wildcard, e.g. `payment_intent.*`. */
export function eventTypeMatches(pattern: string, type: string): boolean {
  if (!pattern.includes('*')) return pattern === type;
  const regex = new RegExp(
    `^${pattern
      .split('*')
      .map((part) => part.replace(/[.+?^${}()|[\]\\]/g, '\\$&'))
      .join('.*')}$`,
  );
  return regex.test(type);
}
