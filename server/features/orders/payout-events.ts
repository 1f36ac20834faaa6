import type Stripe from 'stripe';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { recordMovement, type ProviderMovement } from './money-records';
import { lockOrder } from './order-lifecycle';
import { OrderPayment } from './order-payment.entity';
import { noteAccount } from './payout-accounts.service';
import type { PaymentEventHandler } from './payment-events';

/*
 * Provider events about money after payment, run by the payment event dispatcher inside the transaction that marks
 * the event handled. They only record what the provider did, idempotently (unique provider ids), so an event that
 * arrives before, after or instead of the direct answer to our own request changes the totals once.
 * account.updated may make an account ready, which pays out the orders that were waiting for it.
 */

const orderIdOf = (metadata: Stripe.Metadata | null | undefined): number | null => {
  const id = Number(metadata?.order_id);
  return Number.isSafeInteger(id) && id > 0 ? id : null;
};

async function record(m: EntityManager, orderId: number | null, movements: ProviderMovement[]): Promise<void> {
  if (!orderId || movements.length === 0) return;
  const order = await lockOrder(m, orderId);
  if (!order) return;
  for (const movement of movements) await recordMovement(m, order, movement);
}

export const onAccountUpdated: PaymentEventHandler = async (ctx, m, event) => {
  await noteAccount(ctx, event.data.object as Stripe.Account, m);
};

export const onTransferCreated: PaymentEventHandler = async (_ctx, m, event) => {
  const t = event.data.object as Stripe.Transfer;
  await record(m, orderIdOf(t.metadata), [
    { kind: 'transfer', providerId: t.id, amountMinor: t.amount, currency: t.currency },
  ]);
};

export const onTransferReversed: PaymentEventHandler = async (_ctx, m, event) => {
  const t = event.data.object as Stripe.Transfer;
  const reversals = (t.reversals?.data ?? []).map((r) => ({
    kind: 'transfer_reversal' as const,
    providerId: r.id,
    amountMinor: r.amount,
    currency: r.currency,
  }));
  await record(m, orderIdOf(t.metadata), reversals);
};

/** The charge names its payment intent, which names the order; its refunds are listed from the provider. */
export const onChargeRefunded: PaymentEventHandler = async (ctx: AppContext, m, event) => {
  const charge = event.data.object as Stripe.Charge;
  const intentId = typeof charge.payment_intent === 'string' ? charge.payment_intent : charge.payment_intent?.id;
  const payment = intentId ? await m.findOneBy(OrderPayment, { intentId }) : null;
  if (!payment) return;
  const refunds = await ctx.payments.refunds.list({ charge: charge.id, limit: 100 });
  const movements = refunds.data
    .filter((r) => r.status === 'succeeded')
    .map((r) => ({ kind: 'refund' as const, providerId: r.id, amountMinor: r.amount, currency: r.currency }));
  await record(m, payment.orderId, movements);
};
