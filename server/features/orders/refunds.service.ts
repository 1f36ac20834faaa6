import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { countMovements, recordMovement } from './money-records';
import { MoneyMovement } from './money-movement.entity';
import { lockOrder } from './order-lifecycle';
import { OrderPayment } from './order-payment.entity';
import { Order } from './order.entity';

/*
 * Refunds and transfer reversals follow the order's state: a move (cancel, settle…) commits first and says what the
 * buyer is owed; the provider calls below then bring the money in line, outside the database transaction, and each
 * result is recorded in a short transaction of its own.
 *
 * A crash between a provider call and its record is safe. The idempotency key is numbered from what is recorded
 * (`order-<id>-refund-<n>`, n = refunds recorded + 1) and the amount is computed from recorded figures only, so the
 * retry (the next move, the sweep job, or the same request again) sends the very same request, the provider
 * replays the refund it already made instead of making a second one, and the unique provider id records it once.
 * The charge.refunded / transfer.reversed webhooks record the same objects through the same function.
 */

/** Card payments that went through for an order, newest first. */
export const succeededPayments = (m: EntityManager, orderId: number) =>
  m.find(OrderPayment, { where: { orderId, status: 'succeeded' }, order: { id: 'DESC' } });

/**
 * What the buyer should have had back by now: everything paid once an order is cancelled or refunded; after a
 * part refund, the part of item + delivery the seller no longer keeps (payout + commission were lowered to it).
 */
export function refundDue(order: Order, paidMinor: number): number {
  if (order.state === 'cancelled' || order.state === 'refunded') return paidMinor;
  return Math.max(0, order.itemMinor + order.deliveryMinor - order.commissionMinor - order.payoutMinor);
}

interface RefundStep {
  intentId: string;
  amountMinor: number;
}

/**
 * Split what is owed over the payments, newest first. Refunds are always taken newest first, so how much of each
 * payment is already refunded follows from the recorded total alone.
 */
export function refundSteps(payments: readonly OrderPayment[], refundedMinor: number, owedMinor: number): RefundStep[] {
  const steps: RefundStep[] = [];
  let alreadyRefunded = refundedMinor;
  let owed = owedMinor;
  for (const payment of payments) {
    const taken = Math.min(payment.amountMinor, alreadyRefunded);
    alreadyRefunded -= taken;
    const amountMinor = Math.min(owed, payment.amountMinor - taken);
    if (amountMinor > 0 && payment.intentId) {
      steps.push({ intentId: payment.intentId, amountMinor });
      owed -= amountMinor;
    }
  }
  return steps;
}

/** Refund to the card whatever the order's state says the buyer is still owed. */
export async function refundWhatIsOwed(ctx: AppContext, orderId: number): Promise<void> {
  const plan = await ctx.dataSource.transaction(async (m) => {
    const order = await m.findOneByOrFail(Order, { id: orderId });
    const payments = await succeededPayments(m, orderId);
    const paid = payments.reduce((sum, p) => sum + p.amountMinor, 0);
    const owed = refundDue(order, paid) - order.refundedMinor;
    return {
      steps: owed > 0 ? refundSteps(payments, order.refundedMinor, owed) : [],
      recorded: await countMovements(m, orderId, 'refund'),
    };
  });
  let n = plan.recorded;
  for (const step of plan.steps) {
    n += 1;
    const refund = await ctx.payments.refunds.create(
      { payment_intent: step.intentId, amount: step.amountMinor, metadata: { order_id: String(orderId) } },
      { idempotencyKey: `order-${orderId}-refund-${n}` },
    );
    await ctx.dataSource.transaction(async (m) => {
      const order = (await lockOrder(m, orderId))!;
      await recordMovement(m, order, {
        kind: 'refund',
        providerId: refund.id,
        amountMinor: refund.amount,
        currency: refund.currency,
      });
    });
  }
}

/** Take back from the seller anything transferred for an order that ended in a refund. */
export async function reverseTransfers(ctx: AppContext, orderId: number): Promise<void> {
  const plan = await ctx.dataSource.transaction(async (m) => {
    const order = await m.findOneByOrFail(Order, { id: orderId });
    if ((order.state !== 'cancelled' && order.state !== 'refunded') || order.transferredMinor === 0) return null;
    const transfer = await m.findOne(MoneyMovement, { where: { orderId, kind: 'transfer' }, order: { id: 'DESC' } });
    if (!transfer) return null;
    return {
      transferId: transfer.providerId,
      amountMinor: order.transferredMinor,
      n: (await countMovements(m, orderId, 'transfer_reversal')) + 1,
    };
  });
  if (!plan) return;
  const reversal = await ctx.payments.transfers.createReversal(
    plan.transferId,
    { amount: plan.amountMinor, metadata: { order_id: String(orderId) } },
    { idempotencyKey: `order-${orderId}-reversal-${plan.n}` },
  );
  await ctx.dataSource.transaction(async (m) => {
    const order = (await lockOrder(m, orderId))!;
    await recordMovement(m, order, {
      kind: 'transfer_reversal',
      providerId: reversal.id,
      amountMinor: reversal.amount,
      currency: reversal.currency,
    });
  });
}
