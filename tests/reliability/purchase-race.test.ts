import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { Order } from '../../server/features/orders/order.entity';
import type { OrderView } from '../../shared/types/orders';
import { saleFixture, type Sale } from '../support/checkout-fixtures';
import { buildUser } from '../support/factories';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';
import { signedInAs } from '../support/sessions';

const BUYERS = 50;

let paying: PayingApp;
let sale: Sale;
const buyers: TestAgent[] = [];

beforeAll(async () => {
  paying = await startPayingApp();
  sale = await saleFixture(paying.app);
  for (let batch = 0; batch < BUYERS; batch += 10) {
    const agents = await Promise.all(
      Array.from({ length: 10 }, async () => signedInAs(paying.app, await buildUser(paying.app.ctx.dataSource))),
    );
    buyers.push(...agents);
  }
}, 120_000);
afterAll(() => paying.close());

describe('50 buyers reaching for the same module at once', () => {
  it('reserves it for exactly one, tells the other 49 it has just been reserved, and takes one payment', async () => {
    const attempts = await Promise.all(
      buyers.map((agent) => agent.post('/api/orders').send({ listingId: sale.listing.id, handover: 'collection' })),
    );
    const won = attempts.filter((res) => res.status === 201);
    const refused = attempts.filter((res) => res.status === 409);
    expect(won).toHaveLength(1);
    expect(refused).toHaveLength(BUYERS - 1);
    for (const res of refused) {
      expect(res.body.error.code).toBe('listing_reserved');
      expect(res.body.error.message).toMatch(/^Someone has just reserved this module/);
    }
    const ds = paying.app.ctx.dataSource;
    expect(await ds.getRepository(Order).countBy({ listingId: sale.listing.id })).toBe(1);
    expect((await ds.getRepository(Listing).findOneByOrFail({ id: sale.listing.id })).state).toBe('reserved');

    const order = won[0]!.body as OrderView;
    const winner = buyers[attempts.indexOf(won[0]!)]!;
    await winner.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
    await eventually(
      async () => (await ds.getRepository(Order).findOneByOrFail({ id: order.id })).state,
      (state) => state === 'paid_held',
    );
    expect(await paying.chargesFor(order.id)).toHaveLength(1);
    const intents = await paying.provider.paymentIntents.list({ limit: 100 });
    expect(intents.data.filter((i) => i.metadata.order_id === String(order.id))).toHaveLength(1);
  }, 120_000);
});
