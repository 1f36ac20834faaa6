import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { OrderEvent } from '../../server/features/orders/order-event.entity';
import { OrderJobRunner } from '../../server/features/orders/order-jobs';
import { lapseDueOrders } from '../../server/features/orders/order-lapse.job';
import { OrderPayment } from '../../server/features/orders/order-payment.entity';
import { Order } from '../../server/features/orders/order.entity';
import type { OrderView } from '../../shared/types/orders';
import { saleFixture, startOrder, type Sale } from '../support/checkout-fixtures';
import { waitForMail } from '../support/inbox';
import { startPayingApp, type PayingApp } from '../support/paying-app';

vi.setConfig({ testTimeout: 30_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

const orders = () => paying.app.ctx.dataSource.getRepository(Order);
const listingState = async (sale: Sale) =>
  (await paying.app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state;

/** Make the reservation run out, as if RESERVATION_MINUTES had passed. */
const expire = (order: OrderView) => orders().update(order.id, { payableUntil: new Date(Date.now() - 1000) });

describe('the order-lapse job', () => {
  it('lapses an unpaid order past its time, releases the listing and tells the buyer', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await sale.buyerAgent.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_chargeDeclined' });
    await expire(order);
    const lapsed = await new OrderJobRunner(paying.app.ctx).runNow('order-lapse');
    expect(lapsed).toBeGreaterThanOrEqual(1);
    expect((await orders().findOneByOrFail({ id: order.id })).state).toBe('lapsed');
    expect(await listingState(sale)).toBe('listed');
    const history = await paying.app.ctx.dataSource.getRepository(OrderEvent).findBy({ orderId: order.id });
    expect(history.map((h) => [h.move, h.actorKind])).toEqual([
      ['create', 'buyer'],
      ['lapse', 'system'],
    ]);
    expect(await paying.chargesFor(order.id)).toHaveLength(0);
    await waitForMail(sale.buyer.email, 'Not paid in time');
  });

  it('cancels a payment still waiting for approval at the provider before lapsing, so it can never be taken', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await sale.buyerAgent
      .post(`/api/orders/${order.id}/payments`)
      .send({ paymentMethod: 'pm_card_authenticationRequired' })
      .expect(200);
    await expire(order);
    await lapseDueOrders(paying.app.ctx);
    expect((await orders().findOneByOrFail({ id: order.id })).state).toBe('lapsed');
    const payment = await paying.app.ctx.dataSource.getRepository(OrderPayment).findOneByOrFail({ orderId: order.id });
    expect(payment.status).toBe('cancelled');
    expect((await paying.provider.paymentIntents.retrieve(payment.intentId!)).status).toBe('canceled');
  });

  it('leaves an order alone while its reservation lasts', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await lapseDueOrders(paying.app.ctx);
    expect((await orders().findOneByOrFail({ id: order.id })).state).toBe('awaiting_payment');
    expect(await listingState(sale)).toBe('reserved');
  });

  it('lapses an order once when two app processes run the job at the same moment', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await expire(order);
    const other = await startPayingApp();
    try {
      await Promise.all([lapseDueOrders(paying.app.ctx), lapseDueOrders(other.app.ctx)]);
    } finally {
      await other.close();
    }
    const lapses = await paying.app.ctx.dataSource
      .getRepository(OrderEvent)
      .countBy({ orderId: order.id, move: 'lapse' });
    expect(lapses).toBe(1);
    expect(await listingState(sale)).toBe('listed');
  });
});
