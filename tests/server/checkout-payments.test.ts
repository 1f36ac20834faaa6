import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { MoneyMovement } from '../../server/features/orders/money-movement.entity';
import { OrderPayment } from '../../server/features/orders/order-payment.entity';
import type { OrderView, PaymentAttemptResult } from '../../shared/types/orders';
import { ADDRESS, saleFixture, startOrder, type Sale } from '../support/checkout-fixtures';
import { waitForMail } from '../support/inbox';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';

vi.setConfig({ testTimeout: 30_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

async function pay(sale: Sale, orderId: number, paymentMethod: string, status = 200) {
  const res = await sale.buyerAgent.post(`/api/orders/${orderId}/payments`).send({ paymentMethod }).expect(status);
  return res.body as PaymentAttemptResult;
}

const orderAs = async (sale: Sale, id: number, as: 'buyer' | 'seller' = 'buyer') =>
  (await (as === 'buyer' ? sale.buyerAgent : sale.sellerAgent).get(`/api/orders/${id}`).expect(200)).body as OrderView;

const listingState = async (sale: Sale) =>
  (await paying.app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state;

describe('POST /api/orders/:id/payments', () => {
  it('takes a good card, then the verified event marks the order paid, records the charge and mails both sides', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const result = await pay(sale, order.id, 'pm_card_visa');
    expect(result.outcome).toBe('processing');
    const paid = await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    expect(paid.payments).toMatchObject([{ attempt: 1, status: 'succeeded', amountMinor: order.amounts.totalMinor }]);
    expect(paid.history.map((h) => [h.move, h.by])).toEqual([
      ['create', 'buyer'],
      ['pay', 'payments'],
    ]);
    const charges = await paying.chargesFor(order.id);
    expect(charges).toHaveLength(1);
    expect(charges[0]!.amount).toBe(order.amounts.totalMinor);
    const movements = await paying.app.ctx.dataSource.getRepository(MoneyMovement).findBy({ orderId: order.id });
    expect(movements).toMatchObject([{ kind: 'charge', providerId: charges[0]!.id, amountMinor: charges[0]!.amount }]);
    expect((await orderAs(sale, order.id, 'seller')).deliveryAddress).toBe(ADDRESS);
    const buyerMail = await waitForMail(sale.buyer.email, 'Paid:');
    expect(buyerMail.text).toContain('Parcel courier');
    const sellerMail = await waitForMail(sale.seller.email, 'Sold, and paid for:');
    expect(sellerMail.text).toContain('12 Sleeper Lane');
    expect(sellerMail.text).toContain('mark it as sent');
  });

  it('says a declined card was declined, takes nothing, and lets the buyer try another card', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const declined = await pay(sale, order.id, 'pm_card_chargeDeclined');
    expect(declined.outcome).toBe('declined');
    expect(declined.message).toBe('Your card was declined. Nothing was taken. Try another card.');
    expect(declined.order.state).toBe('awaiting_payment');
    expect(declined.payment).toMatchObject({ attempt: 1, status: 'failed' });
    expect(await paying.chargesFor(order.id)).toHaveLength(0);
    const second = await pay(sale, order.id, 'pm_card_visa');
    expect(second.payment.attempt).toBe(2);
    await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
  });

  it('says when the card lacks funds; nothing is taken and the module is offered again once the buyer gives up', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const result = await pay(sale, order.id, 'pm_card_chargeDeclinedInsufficientFunds');
    expect(result.outcome).toBe('insufficient_funds');
    expect(result.message).toMatch(/not have enough money.*Nothing was taken/);
    expect(result.order.state).toBe('awaiting_payment');
    expect(await listingState(sale)).toBe('reserved');
    await sale.buyerAgent.post(`/api/orders/${order.id}/give-up`).expect(200);
    expect(await listingState(sale)).toBe('listed');
    expect(await paying.chargesFor(order.id)).toHaveLength(0);
  });

  it('asks for the bank’s approval and pays once the buyer approves', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const asked = await pay(sale, order.id, 'pm_card_authenticationRequired');
    expect(asked.outcome).toBe('needs_authentication');
    expect(await paying.chargesFor(order.id)).toHaveLength(0);
    const res = await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments/authenticate`)
      .send({ outcome: 'success' })
      .expect(200);
    expect(['processing', 'succeeded']).toContain((res.body as PaymentAttemptResult).outcome);
    await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
  });

  it('takes nothing when the buyer refuses the approval, and the order still waits for payment', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await pay(sale, order.id, 'pm_card_authenticationRequired');
    const res = await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments/authenticate`)
      .send({ outcome: 'failure' })
      .expect(200);
    const result = res.body as PaymentAttemptResult;
    expect(result.outcome).toBe('authentication_failed');
    expect(result.message).toMatch(/not approved, so nothing was taken/);
    expect(result.order.state).toBe('awaiting_payment');
    expect(await paying.chargesFor(order.id)).toHaveLength(0);
    await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments/authenticate`)
      .send({ outcome: 'success' })
      .expect(409);
  });

  it('charges once when the answer is lost and the buyer presses Pay again (same idempotency key replays)', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    paying.holdWebhooks();
    // The fake takes the payment, but its answer (and the SDK's own retry's) never reaches the app.
    paying.loseIntentAnswers(2);
    const lost = await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments`)
      .send({ paymentMethod: 'pm_card_visa' })
      .expect(503);
    expect(lost.body.error.message).toMatch(/will not be charged twice/);
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
    const retried = await pay(sale, order.id, 'pm_card_visa');
    expect(retried.outcome).toBe('processing');
    expect(retried.payment.attempt).toBe(1);
    paying.releaseWebhooks();
    await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
    expect(await paying.app.ctx.dataSource.getRepository(OrderPayment).countBy({ orderId: order.id })).toBe(1);
  });

  it('charges once for a double click on Pay', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const clicks = await Promise.all(
      [1, 2].map(() =>
        sale.buyerAgent.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_visa' }),
      ),
    );
    expect(clicks.map((c) => c.status)).toEqual([200, 200]);
    await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
  });

  it('refuses a card that is not one of the test cards while payments are local (422 next to the field)', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const res = await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments`)
      .send({ paymentMethod: 'pm_card_amex' })
      .expect(422);
    expect(res.body.error.fields.paymentMethod).toBe('Choose one of the test cards.');
  });

  it('answers 403 to the seller and 409 once nothing is due', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await sale.sellerAgent.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(403);
    await pay(sale, order.id, 'pm_card_visa');
    await eventually(
      () => orderAs(sale, order.id),
      (o) => o.state === 'paid_held',
    );
    const res = await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments`)
      .send({ paymentMethod: 'pm_card_visa' })
      .expect(409);
    expect(res.body.error.code).toBe('order_state');
  });
});
