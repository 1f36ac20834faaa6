import type { AppContext } from '../../app-context';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { recordMovement } from './money-records';
import { formatMoney, orderParties } from './order-mail';
import { lockOrder, moveOrder } from './order-lifecycle';
import { Order } from './order.entity';
import { PayoutAccount } from './payout-account.entity';
import { succeededPayments } from './refunds.service';

/*
 * Paying the seller. An order that reaches `received` is due its payout; it is transferred once the seller's payout
 * account is ready, else the order waits ("Received: payout due") until account.updated or the sweep job finds
 * the account ready. The transfer is made outside any database transaction with the key `order-<id>-payout` and
 * parameters that never change for an order, so if the process dies after the provider made the transfer but
 * before it was recorded, the next attempt gets the same transfer replayed and records it once (unique tr_ id).
 */

/** The charge behind a module order's payment, so the transfer is funded from it (`source_transaction`). */
async function sourceCharge(ctx: AppContext, order: Order): Promise<string | undefined> {
  // A build order is paid in two charges (deposit, balance); its payout may exceed either, so it is funded from
  // the platform's balance instead.
  if (order.kind !== 'module') return undefined;
  const [payment] = await succeededPayments(ctx.dataSource.manager, order.id);
  if (!payment?.intentId) return undefined;
  const intent = await ctx.payments.paymentIntents.retrieve(payment.intentId);
  const charge = intent.latest_charge;
  return typeof charge === 'string' ? charge : charge?.id;
}

/** Record the transfer, move the order to paid out and tell the seller, in one transaction. */
async function recordPayout(
  ctx: AppContext,
  orderId: number,
  transfer: { id: string; amount: number; currency: string } | null,
) {
  await ctx.transaction(async (m) => {
    const order = (await lockOrder(m, orderId))!;
    if (transfer)
      await recordMovement(m, order, {
        kind: 'transfer',
        providerId: transfer.id,
        amountMinor: transfer.amount,
        currency: transfer.currency,
      });
    if (order.state !== 'received') return;
    const note = transfer ? `Transferred ${formatMoney(transfer.amount, order.currency)}` : 'Nothing left to transfer';
    await moveOrder(m, order, 'payOut', { as: 'system', id: null }, note);
    if (!transfer) return;
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    await enqueueEmail(
      m,
      parties.seller.email,
      mailTemplates.payoutMade(
        parties.seller.displayName,
        parties.title,
        formatMoney(transfer.amount, order.currency),
        `${ctx.config.appOrigin}/my/balances`,
      ),
    );
  });
}

/**
 * Pay out one order if it is due and the seller's account is ready; otherwise leave it waiting. A provider refusal
 * (account not enabled, platform balance short) leaves it waiting too, for the next sweep.
 */
export async function payOutIfDue(
  ctx: AppContext,
  orderId: number,
  knownAccount?: PayoutAccount,
): Promise<'paid' | 'waiting' | 'not_due'> {
  const order = await ctx.dataSource.manager.findOneBy(Order, { id: orderId });
  if (!order || order.state !== 'received') return 'not_due';
  if (order.payoutMinor === 0) {
    await recordPayout(ctx, orderId, null);
    return 'paid';
  }
  const account = knownAccount ?? (await ctx.dataSource.manager.findOneBy(PayoutAccount, { userId: order.sellerId }));
  if (!account?.ready) return 'waiting';
  try {
    const transfer = await ctx.payments.transfers.create(
      {
        amount: order.payoutMinor,
        currency: order.currency.toLowerCase(),
        destination: account.accountId,
        transfer_group: `order-${order.id}`,
        source_transaction: await sourceCharge(ctx, order),
        metadata: { order_id: String(order.id) },
      },
      { idempotencyKey: `order-${order.id}-payout` },
    );
    await recordPayout(ctx, orderId, transfer);
    return 'paid';
  } catch (error) {
    ctx.logger.warn({ err: error, orderId }, 'payout not made; the order waits for the next sweep');
    return 'waiting';
  }
}

/**
 * Pay out every order of a seller that was waiting for their account, now `account` is ready. The account is passed
 * in because the caller may have marked it ready in a transaction that has not committed yet.
 */
export async function payOutSeller(ctx: AppContext, account: PayoutAccount): Promise<number> {
  const waiting = await ctx.dataSource.manager.find(Order, {
    where: { sellerId: account.userId, state: 'received' },
    select: { id: true },
    order: { id: 'ASC' },
  });
  let paid = 0;
  for (const { id } of waiting) if ((await payOutIfDue(ctx, id, account)) === 'paid') paid += 1;
  return paid;
}
