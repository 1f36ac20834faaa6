import type Stripe from 'stripe';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { HandledPaymentEvent } from './handled-payment-event.entity';
import { onIntentFailed, onIntentSucceeded } from './payment-intent-events';
import { onAccountUpdated, onChargeRefunded, onTransferCreated, onTransferReversed } from './payout-events';

/**
 * Acts on one verified provider event inside the transaction that also records the event as handled, so the
 * change and the record commit together or not at all.
 */
export type PaymentEventHandler = (ctx: AppContext, m: EntityManager, event: Stripe.Event) => Promise<void>;

/** Event type → its handlers, run in order. Add a handler by appending it to its type's list (or a new line). */
export const PAYMENT_EVENT_HANDLERS: Readonly<Record<string, readonly PaymentEventHandler[]>> = {
  'payment_intent.succeeded': [onIntentSucceeded],
  'payment_intent.payment_failed': [onIntentFailed],
  'account.updated': [onAccountUpdated],
  'transfer.created': [onTransferCreated],
  'transfer.reversed': [onTransferReversed],
  'charge.refunded': [onChargeRefunded],
};

export type EventOutcome = 'handled' | 'duplicate' | 'ignored';

/**
 * Act on a verified event once. Its id is inserted first: a second delivery of the same event (a retry, or two
 * at once — the second insert waits for the first transaction and then finds the key taken) changes nothing.
 * Events nobody handles are not recorded.
 */
export async function dispatchPaymentEvent(ctx: AppContext, event: Stripe.Event): Promise<EventOutcome> {
  const handlers = PAYMENT_EVENT_HANDLERS[event.type] ?? [];
  if (handlers.length === 0) return 'ignored';
  return ctx.transaction(async (m) => {
    // Plain SQL: the affected-row count is what tells a first delivery from a repeat.
    const inserted = (await m.query(
      `INSERT IGNORE INTO ${m.getRepository(HandledPaymentEvent).metadata.tableName} (event_id, type) VALUES (?, ?)`,
      [event.id, event.type],
    )) as { affectedRows: number };
    if (inserted.affectedRows !== 1) return 'duplicate';
    for (const handler of handlers) await handler(ctx, m, event);
    return 'handled';
  });
}
