import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { Listing } from '../../server/features/listings/listing.entity';
import { currentFeeRates } from '../../server/features/orders/fee-rates';
import { Order } from '../../server/features/orders/order.entity';
import { orderAmounts } from '../../shared/orders/money';
import { RESERVATION_MINUTES } from '../../shared/orders/timing';
import type { CheckoutPreview, OrderView } from '../../shared/types/orders';
import { ADDRESS, saleFixture, startOrder } from '../support/checkout-fixtures';
import { buildUser } from '../support/factories';
import { buildListedListing, serviceBody } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent } from '../support/test-app';
import { startPayingApp, type PayingApp } from '../support/paying-app';

// Real sign-ins, listings with photos and a gazetteer load: slow on a shared machine.
vi.setConfig({ testTimeout: 30_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

describe('GET /api/orders/checkout', () => {
  it('prices every way the seller offers, with item, delivery, buyer fee and total, before any field', async () => {
    const sale = await saleFixture(paying.app);
    const rates = await currentFeeRates(paying.app.ctx.dataSource.manager);
    const res = await sale.buyerAgent.get(`/api/orders/checkout?listing=${sale.listing.id}`).expect(200);
    const preview = res.body as CheckoutPreview;
    expect(preview.available).toBe(true);
    expect(preview.testCards).toBe(true);
    expect(preview.options.map((o) => o.handover)).toEqual(['collection', 'seller_delivery', 'parcel']);
    // Amounts from shared/orders/money.ts orderAmounts (our fee rules), with the listing's own prices.
    for (const [handover, delivery] of [
      ['collection', 0],
      ['seller_delivery', 2_500],
      ['parcel', 1_800],
    ] as const) {
      const option = preview.options.find((o) => o.handover === handover)!;
      const expected = orderAmounts(18_000, delivery, rates);
      expect(option).toMatchObject({
        itemMinor: 18_000,
        deliveryMinor: delivery,
        buyerFeeMinor: expected.buyerFeeMinor,
        totalMinor: expected.totalMinor,
        needsAddress: handover !== 'collection',
      });
    }
    expect(preview.options[1]!.explanation).toContain('within 40 km of Crewe');
  });

  it('answers 404 for a build-service listing, which is bought through a quote instead', async () => {
    const ds = paying.app.ctx.dataSource;
    const builder = await buildUser(ds, { role: 'builder' });
    const service = await buildListedListing(paying.app.ctx, builder, await buildUser(ds, { role: 'moderator' }), {
      ...serviceBody(),
    });
    const agent = await signedInAs(paying.app, await buildUser(ds));
    await agent.get(`/api/orders/checkout?listing=${service.id}`).expect(404);
  });
});

describe('POST /api/orders', () => {
  it('creates the order and reserves the listing in one go, holding it for the reservation time', async () => {
    const sale = await saleFixture(paying.app);
    const before = Date.now();
    const order = await startOrder(sale, 'seller_delivery');
    expect(order).toMatchObject({ state: 'awaiting_payment', viewerRole: 'buyer', handover: 'seller_delivery' });
    expect(order.amounts.deliveryMinor).toBe(2_500);
    expect(order.deliveryAddress).toBe(ADDRESS);
    expect(order.sellerMoney).toBeNull();
    expect(order.due).toEqual({ purpose: 'full', amountMinor: order.amounts.totalMinor });
    expect(order.history.map((h) => h.move)).toEqual(['create']);
    const held = new Date(order.payableUntil!).getTime() - before;
    expect(held).toBeGreaterThanOrEqual(RESERVATION_MINUTES * 60_000 - 1000);
    expect(held).toBeLessThanOrEqual(RESERVATION_MINUTES * 60_000 + 5000);
    const listing = await paying.app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: sale.listing.id });
    expect(listing.state).toBe('reserved');
  });

  it('returns the same open order on a second click instead of refusing the buyer', async () => {
    const sale = await saleFixture(paying.app);
    const first = await startOrder(sale);
    const again = await sale.buyerAgent
      .post('/api/orders')
      .send({ listingId: sale.listing.id, handover: 'parcel', deliveryAddress: ADDRESS })
      .expect(200);
    expect((again.body as OrderView).id).toBe(first.id);
    expect(await paying.app.ctx.dataSource.getRepository(Order).countBy({ listingId: sale.listing.id })).toBe(1);
  });

  it('tells a second buyer in plain words that someone has just reserved it (409 listing_reserved)', async () => {
    const sale = await saleFixture(paying.app);
    await startOrder(sale);
    const other = await signedInAs(paying.app, await buildUser(paying.app.ctx.dataSource));
    const res = await other
      .post('/api/orders')
      .send({ listingId: sale.listing.id, handover: 'collection' })
      .expect(409);
    expect(res.body.error.code).toBe('listing_reserved');
    expect(res.body.error.message).toMatch(/^Someone has just reserved this module/);
  });

  it('asks for the address when the module is brought to the buyer, next to the field (422)', async () => {
    const sale = await saleFixture(paying.app);
    const res = await sale.buyerAgent
      .post('/api/orders')
      .send({ listingId: sale.listing.id, handover: 'parcel' })
      .expect(422);
    expect(res.body.error.fields.deliveryAddress).toMatch(/address/);
  });

  it('refuses a way the seller does not offer, naming it (422 on handover)', async () => {
    const sale = await saleFixture(paying.app);
    const res = await sale.buyerAgent
      .post('/api/orders')
      .send({ listingId: sale.listing.id, handover: 'pallet', deliveryAddress: ADDRESS })
      .expect(422);
    expect(res.body.error.fields.handover).toContain('Pallet courier');
  });

  it('answers 403 when a seller tries to buy their own module, and 401 to a visitor', async () => {
    const sale = await saleFixture(paying.app);
    await sale.sellerAgent.post('/api/orders').send({ listingId: sale.listing.id, handover: 'collection' }).expect(403);
    const visitor = await browserLikeAgent(paying.app);
    await visitor.post('/api/orders').send({ listingId: sale.listing.id, handover: 'collection' }).expect(401);
  });
});

describe('GET /api/orders/:id', () => {
  it('shows the seller their commission and payout but not the address before payment', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const res = await sale.sellerAgent.get(`/api/orders/${order.id}`).expect(200);
    const view = res.body as OrderView;
    expect(view.viewerRole).toBe('seller');
    expect(view.deliveryAddress).toBeNull();
    expect(view.sellerMoney).toMatchObject({ payoutMinor: expect.any(Number), commissionMinor: expect.any(Number) });
    expect(view.sellerMoney!.payoutMinor + view.sellerMoney!.commissionMinor).toBe(18_000 + 1_800);
  });

  it('answers 404 to another member and to a moderator while no problem is raised', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    const ds = paying.app.ctx.dataSource;
    const stranger = await signedInAs(paying.app, await buildUser(ds));
    await stranger.get(`/api/orders/${order.id}`).expect(404);
    await stranger.post(`/api/orders/${order.id}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(404);
    await stranger.post(`/api/orders/${order.id}/give-up`).expect(404);
    const moderator = await signedInAs(paying.app, await buildUser(ds, { role: 'moderator' }));
    await moderator.get(`/api/orders/${order.id}`).expect(404);
    await ds.getRepository(Order).update(order.id, { problemRaisedAt: new Date() });
    const res = await moderator.get(`/api/orders/${order.id}`).expect(200);
    expect(res.body.viewerRole).toBe('moderator');
  });
});

describe('POST /api/orders/:id/give-up', () => {
  it('lapses the unpaid order and offers the module to others at once', async () => {
    const sale = await saleFixture(paying.app);
    const order = await startOrder(sale);
    await sale.sellerAgent.post(`/api/orders/${order.id}/give-up`).expect(403);
    const res = await sale.buyerAgent.post(`/api/orders/${order.id}/give-up`).expect(200);
    expect((res.body as OrderView).state).toBe('lapsed');
    const listing = await paying.app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: sale.listing.id });
    expect(listing.state).toBe('listed');
    const other = await signedInAs(paying.app, await buildUser(paying.app.ctx.dataSource));
    await other.post('/api/orders').send({ listingId: sale.listing.id, handover: 'collection' }).expect(201);
  });
});
