import type Stripe from 'stripe';
import type { EntityManager } from 'typeorm';
import { canMoveOrder, HANDOVER_LABELS, type OrderMove } from '../../../shared/orders/states';
import type { AppContext } from '../../app-context';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { MoneyMovement } from './money-movement.entity';
import { recordMovement } from './money-records';
import { lockOrder, moveOrder } from './order-lifecycle';
import { formatMoney, orderParties } from './order-mail';
import { OrderPayment, PAYMENT_PURPOSES, type PaymentPurpose } from './order-payment.entity';
import type { Order } from './order.entity';

const MOVE_FOR: Record<PaymentPurpose, OrderMove> = { full: 'pay', deposit: 'payDeposit', balance: 'payBalance' };

/** The order, purpose and attempt an intent was made for (its metadata), or null for an intent not ours. */
function paymentRef(intent: Stripe.PaymentIntent) {
  const orderId = Number(intent.metadata?.order_id);
  const purpose = intent.metadata?.purpose as PaymentPurpose;
  const attempt = Number(intent.metadata?.attempt);
  if (!Number.isSafeInteger(orderId) || orderId <= 0 || !PAYMENT_PURPOSES.includes(purpose)) return null;
  return { orderId, purpose, attempt: Number.isSafeInteger(attempt) && attempt > 0 ? attempt : 1 };
}

/** The order (locked) and its payment row for an intent; the row is made if the answer never reached us. */
async function paymentOf(m: EntityManager, intent: Stripe.PaymentIntent) {
  const ref = paymentRef(intent);
  const order = ref ? await lockOrder(m, ref.orderId) : null;
  if (!ref || !order) return null;
  const payment =
    (await m.findOneBy(OrderPayment, { orderId: order.id, purpose: ref.purpose, attempt: ref.attempt })) ??
    m.create(OrderPayment, {
      orderId: order.id,
      purpose: ref.purpose,
      attempt: ref.attempt,
      amountMinor: intent.amount,
      currency: order.currency,
      status: 'started',
      failureCode: null,
    });
  payment.intentId = intent.id;
  return { order, payment };
}

const chargeIdOf = (intent: Stripe.PaymentIntent) =>
  typeof intent.latest_charge === 'string' ? intent.latest_charge : (intent.latest_charge?.id ?? null);

/** The buyer paid and the order moved: each side hears what happens next (the seller's mail has the address). */
async function mailPaid(ctx: AppContext, m: EntityManager, order: Order): Promise<void> {
  const parties = await orderParties(m, order, ctx.config.appOrigin);
  const handover = HANDOVER_LABELS[order.handover];
  await enqueueEmail(
    m,
    parties.buyer.email,
    mailTemplates.orderPaidBuyer(
      parties.buyer.displayName,
      parties.title,
      formatMoney(order.totalMinor, order.currency),
      handover,
      parties.url,
    ),
  );
  await enqueueEmail(
    m,
    parties.seller.email,
    mailTemplates.orderPaidSeller(
      parties.seller.displayName,
      parties.title,
      handover,
      order.deliveryAddress,
      formatMoney(order.payoutMinor, order.currency),
      parties.url,
    ),
  );
}

/** A build's deposit arrived: the buyer has their receipt, the builder may start. Links go to the build page. */
async function mailDepositPaid(ctx: AppContext, m: EntityManager, order: Order): Promise<void> {
  const parties = await orderParties(m, order, ctx.config.appOrigin);
  const url = `${ctx.config.appOrigin}/builds/${order.id}`;
  const deposit = formatMoney(order.depositMinor, order.currency);
  await enqueueEmail(
    m,
    parties.buyer.email,
    mailTemplates.depositPaidBuyer(parties.buyer.displayName, parties.title, deposit, url),
  );
  await enqueueEmail(
    m,
    parties.seller.email,
    mailTemplates.depositPaidBuilder(parties.seller.displayName, parties.title, deposit, url),
  );
}

/**
 * Money arrived for an order that no longer expects it (it lapsed, or was paid by another attempt): give it
 * straight back. The refund's idempotency key is made from the intent, so a retry cannot refund twice.
 */
async function refundUnexpected(ctx: AppContext, m: EntityManager, order: Order, intent: Stripe.PaymentIntent) {
  const refund = await ctx.payments.refunds.create(
    { payment_intent: intent.id, metadata: { order_id: String(order.id), reason: 'late_payment' } },
    { idempotencyKey: `order-${order.id}-unexpected-${intent.id}` },
  );
  await recordMovement(m, order, {
    kind: 'refund',
    providerId: refund.id,
    amountMinor: refund.amount,
    currency: refund.currency,
  });
  const parties = await orderParties(m, order, ctx.config.appOrigin);
  await enqueueEmail(
    m,
    parties.buyer.email,
    mailTemplates.latePaymentRefunded(
      parties.buyer.displayName,
      parties.title,
      formatMoney(refund.amount, order.currency),
      parties.url,
    ),
  );
}

/** payment_intent.succeeded: record the payment and the charge, and move the order on (or refund a late one). */
export async function onIntentSucceeded(ctx: AppContext, m: EntityManager, event: Stripe.Event): Promise<void> {
  const intent = event.data.object as Stripe.PaymentIntent;
  const found = await paymentOf(m, intent);
  if (!found) return;
  const { order, payment } = found;
  const already = payment.status === 'succeeded';
  payment.status = 'succeeded';
  payment.failureCode = null;
  await m.save(payment);
  const chargeId = chargeIdOf(intent);
  if (chargeId)
    await m
      .createQueryBuilder()
      .insert()
      .into(MoneyMovement)
      .values({
        orderId: order.id,
        kind: 'charge',
        providerId: chargeId,
        amountMinor: intent.amount_received || intent.amount,
        currency: intent.currency.toUpperCase(),
      })
      .orIgnore()
      .execute();
  if (already) return;
  const move = MOVE_FOR[payment.purpose];
  if (canMoveOrder(order.state, move)) {
    await moveOrder(m, order, move, { as: 'payments', id: null }, null);
    if (move === 'payDeposit') await mailDepositPaid(ctx, m, order);
    else await mailPaid(ctx, m, order);
    return;
  }
  await refundUnexpected(ctx, m, order, intent);
}

/** payment_intent.payment_failed: the attempt failed; the order still waits for payment and nothing moved. */
export async function onIntentFailed(_ctx: AppContext, m: EntityManager, event: Stripe.Event): Promise<void> {
  const intent = event.data.object as Stripe.PaymentIntent;
  const found = await paymentOf(m, intent);
  if (!found || found.payment.status === 'succeeded') return;
  found.payment.status = 'failed';
  found.payment.failureCode =
    intent.last_payment_error?.decline_code ?? intent.last_payment_error?.code ?? 'card_declined';
  await m.save(found.payment);
}
