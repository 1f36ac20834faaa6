import Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { HandledPaymentEvent } from '../../server/features/orders/handled-payment-event.entity';
import { MoneyMovement } from '../../server/features/orders/money-movement.entity';
import { OrderEvent } from '../../server/features/orders/order-event.entity';
import { Order } from '../../server/features/orders/order.entity';
import type { OrderView } from '../../shared/types/orders';
import { saleFixture, startOrder, type Sale } from '../support/checkout-fixtures';
import { waitForMail } from '../support/inbox';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';

vi.setConfig({ testTimeout: 30_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

const signer = new Stripe('sk_test_signing_only');

/** POST an event body to the webhook route signed with `secret` (the app's own unless told otherwise). */
function deliver(payload: string, secret = paying.webhookSecret) {
  const header = signer.webhooks.generateTestHeaderString({ payload, secret });
  return request(paying.app.app)
    .post('/api/payments/webhook')
    .set('Content-Type', 'application/json')
    .set('Stripe-Signature', header)
    .send(payload);
}

/** A payment_intent.succeeded event for an order, as the provider would send it. */
function succeededEvent(order: OrderView, id = `evt_test_${Date.now()}_${Math.random().toString(36).slice(2)}`) {
  return JSON.stringify({
    id,
    object: 'event',
    type: 'payment_intent.succeeded',
    api_version: '2026-10-28.endive',
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    data: {
      object: {
        id: `pi_test_${Math.random().toString(36).slice(2)}`,
        object: 'payment_intent',
        amount: order.amounts.totalMinor,
        amount_received: order.amounts.totalMinor,
        currency: 'gbp',
        status: 'succeeded',
        latest_charge: `ch_test_${Math.random().toString(36).slice(2)}`,
        metadata: { order_id: String(order.id), purpose: 'full', attempt: '1' },
      },
    },
  });
}

const stateOf = async (id: number) =>
  (await paying.app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id })).state;

async function paidOrder(sale: Sale): Promise<OrderView> {
  const order = await startOrder(sale);
  await sale.buyerAgent.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  await eventually(
    () => stateOf(order.id),
    (s) => s === 'paid_held',
  );
  return order;
}

describe('POST /api/payments/webhook', () => {
  it('answers 400 to a forged signature and changes nothing', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const payload = succeededEvent(order, 'evt_forged_one');
    const res = await deliver(payload, 'whsec_someone_else').expect(400);
    expect(res.body.error.code).toBe('bad_signature');
    expect(await stateOf(order.id)).toBe('awaiting_payment');
    expect(
      await paying.app.ctx.dataSource.getRepository(HandledPaymentEvent).countBy({ eventId: 'evt_forged_one' }),
    ).toBe(0);
  });

  it('answers 400 to an event without a signature, and to a tampered body', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const payload = succeededEvent(order);
    await request(paying.app.app)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .send(payload)
      .expect(400);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret: paying.webhookSecret });
    await request(paying.app.app)
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', header)
      .send(payload.replace(`"amount":${order.amounts.totalMinor}`, '"amount":1'))
      .expect(400);
    expect(await stateOf(order.id)).toBe('awaiting_payment');
  });

  it('moves the order on a correctly signed event: the signature, not the browser, is what counts', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const res = await deliver(succeededEvent(order)).expect(200);
    expect(res.body.outcome).toBe('handled');
    expect(await stateOf(order.id)).toBe('paid_held');
  });

  it('changes nothing when an event it already handled arrives again', async () => {
    const sale = await saleFixture(paying.app);
    const order = await paidOrder(sale);
    const ds = paying.app.ctx.dataSource;
    const events = await paying.provider.events.list({ type: 'payment_intent.succeeded', limit: 100 });
    const original = events.data.find(
      (e) => (e.data.object as Stripe.PaymentIntent).metadata.order_id === String(order.id),
    )!;
    const res = await deliver(JSON.stringify(original)).expect(200);
    expect(res.body.outcome).toBe('duplicate');
    // A different event about the same intent is recorded but moves nothing twice.
    await deliver(JSON.stringify({ ...original, id: `${original.id}_again` })).expect(200);
    expect(await ds.getRepository(OrderEvent).countBy({ orderId: order.id, move: 'pay' })).toBe(1);
    expect(await ds.getRepository(MoneyMovement).countBy({ orderId: order.id, kind: 'charge' })).toBe(1);
    expect(await stateOf(order.id)).toBe('paid_held');
  });

  it('refunds at once, and tells the buyer, when a payment succeeds for an order that has lapsed', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    paying.holdWebhooks();
    // A payment the app never heard back about (its answer was lost), made before the buyer gave up.
    const intent = await paying.provider.paymentIntents.create({
      amount: order.amounts.totalMinor,
      currency: 'gbp',
      payment_method: 'pm_card_visa',
      confirm: true,
      automatic_payment_methods: { enabled: true, allow_redirects: 'never' },
      metadata: { order_id: String(order.id), purpose: 'full', attempt: '1' },
      transfer_group: `order-${order.id}`,
    });
    await sale.buyerAgent.post(`/api/orders/${order.id}/give-up`).expect(200);
    paying.releaseWebhooks();
    const refunds = await eventually(
      async () => (await paying.provider.refunds.list({ payment_intent: intent.id })).data,
      (list) => list.length > 0,
    );
    expect(refunds).toHaveLength(1);
    expect(refunds[0]!.amount).toBe(order.amounts.totalMinor);
    const ds = paying.app.ctx.dataSource;
    await eventually(
      () => ds.getRepository(MoneyMovement).findBy({ orderId: order.id, kind: 'refund' }),
      (rows) => rows.length === 1,
    );
    expect(await stateOf(order.id)).toBe('lapsed');
    expect((await ds.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state).toBe('listed');
    const mail = await waitForMail(sale.buyer.email, 'Payment returned');
    expect(mail.text).toContain('refunded it in full');
  });
});
