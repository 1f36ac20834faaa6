import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { Order } from '../../server/features/orders/order.entity';
import { saleFixture } from '../support/checkout-fixtures';
import { startPayingApp, type PayingApp } from '../support/paying-app';

/*
 * Field-level access (OWASP ASVS 5.0, V8 authorization: a user cannot set fields they are not allowed to, e.g.
 * mass assignment): the money, state and parties of an order are the server's to set. A body that tries to set
 * them is refused as a whole, and nothing is made.
 */
let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
}, 60_000);
afterAll(() => paying?.close());

describe('order fields a buyer may not set', () => {
  for (const [field, value] of [
    ['totalMinor', 1],
    ['itemMinor', 0],
    ['commissionBps', 0],
    ['state', 'paid_held'],
    ['sellerId', 1],
    ['buyerId', 1],
  ] as const) {
    it(`refuses an order body carrying ${field} with 422 and makes no order`, async () => {
      const sale = await saleFixture(paying.app);
      const res = await sale.buyerAgent
        .post('/api/orders')
        .send({ listingId: sale.listing.id, handover: 'collection', [field]: value });

      expect(res.status).toBe(422);
      const ds = paying.app.ctx.dataSource;
      expect(await ds.getRepository(Order).countBy({ listingId: sale.listing.id })).toBe(0);
      expect((await ds.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state).toBe('listed');
    }, 30_000);
  }

  it('refuses a seller offering collection with a changed payout in the body, changing nothing', async () => {
    const sale = await saleFixture(paying.app);
    const created = await sale.buyerAgent
      .post('/api/orders')
      .send({ listingId: sale.listing.id, handover: 'collection' })
      .expect(201);
    const id = (created.body as { id: number }).id;

    const res = await sale.sellerAgent.post(`/api/orders/${id}/offer-collection`).send({ payoutMinor: 999_999 });

    expect([409, 422]).toContain(res.status);
    const order = await paying.app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id });
    expect(order.state).toBe('awaiting_payment');
    expect(order.payoutMinor).toBeLessThan(999_999);
  }, 30_000);
});
