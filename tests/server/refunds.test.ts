import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { MoneyMovement } from '../../server/features/orders/money-movement.entity';
import { lockOrder, moveOrder } from '../../server/features/orders/order-lifecycle';
import { Order } from '../../server/features/orders/order.entity';
import { refundWhatIsOwed } from '../../server/features/orders/refunds.service';
import { connectPayouts, move, orderAs, paidSale, type PaidSale } from '../support/aftercare-fixtures';
import { buildUser } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';
import { signedInAs } from '../support/sessions';

vi.setConfig({ testTimeout: 40_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

const refundsAtProvider = async (sale: PaidSale) => {
  const [payment] = sale.order.payments;
  expect(payment).toBeDefined();
  const [charge] = await paying.chargesFor(sale.order.id);
  return {
    charge: await paying.provider.charges.retrieve(charge!.id),
    refunds: (await paying.provider.refunds.list({ charge: charge!.id })).data,
  };
};
const listingState = async (sale: PaidSale) =>
  (await paying.app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state;
const recorded = (orderId: number, kind: MoneyMovement['kind']) =>
  paying.app.ctx.dataSource.getRepository(MoneyMovement).findBy({ orderId, kind });

async function raiseProblemAfterSending(sale: PaidSale) {
  await move(sale.sellerAgent, sale.order.id, 'send').expect(200);
  await move(sale.buyerAgent, sale.order.id, 'problem', { reason: 'One end plate is split along its length.' }).expect(
    200,
  );
  return signedInAs(paying.app, await buildUser(paying.app.ctx.dataSource, { role: 'moderator' }));
}

describe('refunds', () => {
  it('cancelling before hand-over refunds everything the buyer paid and offers the module again', async () => {
    const sale = await paidSale(paying);
    const res = await move(sale.buyerAgent, sale.order.id, 'cancel', { reason: 'Our club hall fell through.' });
    expect(res.status).toBe(200);
    expect(res.body.order).toMatchObject({ state: 'cancelled', amounts: { refundedMinor: 27_500 } });
    const { charge, refunds } = await refundsAtProvider(sale);
    expect(refunds.map((r) => r.amount)).toEqual([27_500]);
    expect(charge.amount_refunded).toBe(27_500);
    expect(await listingState(sale)).toBe('listed');
    for (const person of [sale.buyer, sale.seller]) {
      const mail = await waitForMail(person.email, 'Order cancelled:');
      expect(mail.text).toContain('cancelled by the buyer');
      expect(mail.text).toContain('£275.00');
    }
  });

  it('a full refund after hand-over withdraws the listing and takes back money already transferred', async () => {
    const sale = await paidSale(paying);
    const destination = await connectPayouts(paying, sale);
    const moderator = await raiseProblemAfterSending(sale);
    // Money that reached the seller before the problem was settled (here made directly at the provider): the
    // transfer.created event records it against the order.
    const [charge] = await paying.chargesFor(sale.order.id);
    await eventually(
      async () => (await paying.provider.accounts.retrieve(destination)).payouts_enabled,
      (ready) => ready === true,
    );
    const early = await paying.provider.transfers.create({
      amount: 25_300,
      currency: 'gbp',
      destination,
      source_transaction: charge!.id,
      metadata: { order_id: String(sale.order.id) },
    });
    await eventually(
      () => recorded(sale.order.id, 'transfer'),
      (rows) => rows.length === 1,
    );

    const res = await moderator
      .post(`/api/order-problems/${sale.order.id}/settle`)
      .send({ outcome: 'refund', note: 'The end plate cannot be repaired; everything goes back.' })
      .expect(200);
    expect(res.body.order).toMatchObject({ state: 'refunded', amounts: { refundedMinor: 27_500 } });
    expect(res.body.order.sellerMoney.transferredMinor).toBe(0);
    const reversed = await paying.provider.transfers.retrieve(early.id);
    expect(reversed).toMatchObject({ amount_reversed: 25_300, reversed: true });
    expect((await refundsAtProvider(sale)).charge.amount_refunded).toBe(27_500);
    expect(await listingState(sale)).toBe('withdrawn');
    for (const person of [sale.buyer, sale.seller])
      expect((await waitForMail(person.email, 'Problem settled:')).text).toContain(
        'everything the buyer paid (£275.00)',
      );
  });

  it('a part refund of £50 on the worked example sends £50 back and pays the seller £207', async () => {
    const sale = await paidSale(paying);
    await connectPayouts(paying, sale);
    await eventually(
      async () => (await sale.sellerAgent.get('/api/payouts/account').expect(200)).body.account.ready as boolean,
      (ready) => ready,
    );
    const moderator = await raiseProblemAfterSending(sale);
    const res = await moderator
      .post(`/api/order-problems/${sale.order.id}/settle`)
      .send({ outcome: 'part_refund', note: 'A new end plate costs about £50.', refundMinor: 5_000 })
      .expect(200);
    // Item + delivery = 27 500 p; kept = 27 500 − 5 000 = 22 500 p; commission = 22 500 × 800 / 10 000 = 1 800 p;
    // payout = 22 500 − 1 800 = 20 700 p (£207). Source: partRefund in shared/orders/money.ts (our rule).
    expect(res.body.order.state).toBe('paid_out');
    expect(res.body.order.sellerMoney).toMatchObject({
      commissionMinor: 1_800,
      payoutMinor: 20_700,
      transferredMinor: 20_700,
    });
    expect(res.body.order.amounts.refundedMinor).toBe(5_000);
    expect((await refundsAtProvider(sale)).refunds.map((r) => r.amount)).toEqual([5_000]);
    const transfers = await paying.provider.transfers.list({ transfer_group: `order-${sale.order.id}` });
    expect(transfers.data.map((t) => t.amount)).toEqual([20_700]);
    expect(await listingState(sale)).toBe('sold');
    expect((await waitForMail(sale.buyer.email, 'Problem settled:')).text).toContain('£50.00 goes back to the buyer');
    expect((await waitForMail(sale.seller.email, 'Payout sent:')).text).toContain('£207.00');
  });

  it('records a refund once when the answer was lost: the retry replays the same refund', async () => {
    const sale = await paidSale(paying);
    const ctx = paying.app.ctx;
    // Hold the provider's events back, so only the retry can record the refund.
    paying.holdWebhooks();
    // The move commits, then the process dies just after the provider made the refund and before it was recorded.
    await ctx.transaction(async (m) => {
      const order = (await lockOrder(m, sale.order.id))!;
      await moveOrder(m, order, 'cancel', { as: 'buyer', id: sale.buyer.id }, null);
    });
    const [payment] = (await orderAs(sale.buyerAgent, sale.order.id)).payments;
    const intentId = (await ctx.dataSource.query('SELECT intent_id FROM order_payments WHERE id = ?', [payment!.id]))[0]
      .intent_id as string;
    const lost = await paying.provider.refunds.create(
      { payment_intent: intentId, amount: 27_500, metadata: { order_id: String(sale.order.id) } },
      { idempotencyKey: `order-${sale.order.id}-refund-1` },
    );

    await refundWhatIsOwed(ctx, sale.order.id);
    await refundWhatIsOwed(ctx, sale.order.id);
    paying.releaseWebhooks();

    expect((await refundsAtProvider(sale)).refunds.map((r) => r.id)).toEqual([lost.id]);
    expect((await recorded(sale.order.id, 'refund')).map((r) => r.providerId)).toEqual([lost.id]);
    const order = await ctx.dataSource.getRepository(Order).findOneByOrFail({ id: sale.order.id });
    expect(order.refundedMinor).toBe(27_500);
  });
});
