import Stripe from 'stripe';
import { In, LessThanOrEqual, type EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { moveListing } from '../listings/listing-lifecycle';
import { Listing } from '../listings/listing.entity';
import { reopenQuoteAfterLapse } from '../quotes/quote-reopen';
import { moveOrder, type OrderActor } from './order-lifecycle';
import type { OrderJob } from './order-jobs';
import { orderParties } from './order-mail';
import { OrderPayment } from './order-payment.entity';
import { Order } from './order.entity';

const UNPAID = ['awaiting_payment', 'awaiting_deposit'] as const;
const BATCH = 20;
/** When a payment turned out to have gone through, look again after this long if its event has not come. */
const PAID_MEANWHILE_RETRY_MS = 5 * 60_000;

/** Cancel an intent at the provider; answers 'succeeded' when it was paid in the meantime and cannot be. */
async function cancelIntent(ctx: AppContext, intentId: string): Promise<'cancelled' | 'succeeded'> {
  try {
    await ctx.payments.paymentIntents.cancel(intentId, { cancellation_reason: 'abandoned' });
    return 'cancelled';
  } catch (error) {
    if (!(error instanceof Stripe.errors.StripeInvalidRequestError)) throw error;
    if (error.code === 'resource_missing') return 'cancelled';
    const intent = await ctx.payments.paymentIntents.retrieve(intentId);
    if (intent.status === 'succeeded' || intent.status === 'processing') return 'succeeded';
    if (intent.status === 'canceled') return 'cancelled';
    throw error;
  }
}

/**
 * Close an unpaid order held with a row lock: cancel its open payment intents at the provider first, so no
 * payment can succeed afterwards, then lapse it and release the listing to other buyers. If one of its payments
 * went through meanwhile, the order is left for that payment's event and 'paid_meanwhile' is answered. A payment
 * whose intent id was never recorded (its answer was lost) cannot be cancelled; if it succeeds later, the payment
 * event refunds it at once.
 */
export async function lapseUnpaidOrder(
  ctx: AppContext,
  m: EntityManager,
  order: Order,
  actor: OrderActor,
): Promise<'lapsed' | 'paid_meanwhile'> {
  const open = await m.find(OrderPayment, {
    where: { orderId: order.id, status: In(['started', 'needs_authentication']) },
  });
  for (const payment of open) {
    if (payment.intentId && (await cancelIntent(ctx, payment.intentId)) === 'succeeded') return 'paid_meanwhile';
    payment.status = 'cancelled';
  }
  await m.save(open);
  const note = actor.as === 'buyer' ? 'The buyer gave up before paying.' : 'Not paid before the reservation ran out.';
  await moveOrder(m, order, 'lapse', actor, note);
  if (order.kind === 'module') {
    const listing = await m.findOne(Listing, { where: { id: order.listingId }, lock: { mode: 'pessimistic_write' } });
    if (listing?.state === 'reserved')
      await moveListing(
        m,
        listing,
        'release',
        { id: actor.id, ip: actor.ip ?? null, as: 'orders' },
        { orderId: order.id },
      );
  }
  if (order.kind === 'build' && order.quoteId !== null) await reopenQuoteAfterLapse(m, order.quoteId);
  if (actor.as === 'system') {
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    await enqueueEmail(
      m,
      parties.buyer.email,
      mailTemplates.orderLapsed(parties.buyer.displayName, parties.title, parties.url),
    );
  }
  return 'lapsed';
}

/** Lapse one order if it is still unpaid and past its time; skipped when another process holds it. */
async function lapseIfDue(ctx: AppContext, orderId: number): Promise<boolean> {
  return ctx.transaction(async (m) => {
    const [order] = await m.find(Order, {
      where: { id: orderId, state: In([...UNPAID]), payableUntil: LessThanOrEqual(new Date()) },
      lock: { mode: 'pessimistic_write', onLocked: 'skip_locked' },
    });
    if (!order) return false;
    const outcome = await lapseUnpaidOrder(ctx, m, order, { as: 'system', id: null });
    if (outcome === 'paid_meanwhile') {
      await m.update(Order, order.id, { payableUntil: new Date(Date.now() + PAID_MEANWHILE_RETRY_MS) });
      return false;
    }
    return true;
  });
}

/** Lapse unpaid orders whose reservation has run out; answers how many were lapsed. */
export async function lapseDueOrders(ctx: AppContext): Promise<number> {
  const due = await ctx.dataSource.getRepository(Order).find({
    select: { id: true },
    where: { state: In([...UNPAID]), payableUntil: LessThanOrEqual(new Date()) },
    order: { payableUntil: 'ASC' },
    take: BATCH,
  });
  let lapsed = 0;
  for (const { id } of due) {
    try {
      if (await lapseIfDue(ctx, id)) lapsed += 1;
    } catch (error) {
      ctx.logger.warn({ err: error, orderId: id }, 'unpaid order not lapsed yet');
    }
  }
  return lapsed;
}

export const orderLapseJob: OrderJob = { name: 'order-lapse', everyMs: 30_000, run: lapseDueOrders };
