import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import { depositSplit, orderAmounts } from '../../shared/orders/money';
import type { QuoteRequestView } from '../../shared/types/quotes';
import { buildUser } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';
import { currentFeeRates } from '../../server/features/orders/fee-rates';
import { askBoth, quoteAsDrafted, quoteWorld, type QuoteWorld } from './quotes-fixture';

let app: AppInstance;
let world: QuoteWorld;

beforeAll(async () => {
  app = await startTestApp();
  world = await quoteWorld(app);
}, 60_000);
afterAll(() => app.close());

const ADDRESS = 'Ada Sidebottom\n3 Harbour Road\nThurso\nKW14 7AA';

/** A request answered by both builders; the ids of its two quotes. */
async function twoQuotes(): Promise<{ requestId: number; first: number; second: number }> {
  const requestId = await askBoth(world);
  const first = await quoteAsDrafted(world.near, requestId);
  const second = await quoteAsDrafted(world.second, requestId);
  return { requestId, first, second };
}

describe('POST /api/quotes/:id/accept', () => {
  it('makes a build order waiting for the deposit, and e-mails the builder', async () => {
    const { requestId, first } = await twoQuotes();
    const res = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'seller_delivery', deliveryAddress: ADDRESS })
      .expect(201);
    const order = await app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id: res.body.orderId });
    const request = (await world.buyer.agent.get(`/api/quotes/requests/${requestId}`).expect(200)).body
      .request as QuoteRequestView;
    const quote = request.quotes.find((q) => q.id === first)!;
    // orderAmounts(quoted price, quoted delivery, current rates); deposit = depositSplit(total, 30 %)
    const amounts = orderAmounts(
      quote.itemMinor,
      quote.deliveryMinor,
      await currentFeeRates(app.ctx.dataSource.manager),
    );
    expect(order).toMatchObject({
      kind: 'build',
      state: 'awaiting_deposit',
      listingId: world.near.listing.id,
      quoteId: first,
      buyerId: world.buyer.user.id,
      sellerId: world.near.user.id,
      handover: 'seller_delivery',
      deliveryAddress: ADDRESS,
      itemMinor: quote.itemMinor,
      deliveryMinor: quote.deliveryMinor,
      totalMinor: amounts.totalMinor,
      depositMinor: depositSplit(amounts.totalMinor, 3000).depositMinor,
    });
    expect(request).toMatchObject({ state: 'accepted', orderId: order.id });
    expect(request.quotes.map((q) => q.state)).toEqual(['accepted', 'not_chosen']);
    const mail = await waitForMail(world.near.user.email, 'Quote accepted by Ada Sidebottom');
    expect(mail.text).toContain(`/builds/${order.id}`);
  });

  it('leaves delivery out when the buyer collects', async () => {
    const { first } = await twoQuotes();
    const res = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'collection' })
      .expect(201);
    const order = await app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id: res.body.orderId });
    expect(order).toMatchObject({ deliveryMinor: 0, deliveryAddress: null, itemMinor: 46_059 });
  });

  it('answers 409 when the same quote is accepted twice, or a second quote of the request', async () => {
    const { first, second } = await twoQuotes();
    await world.buyer.agent.post(`/api/quotes/${first}/accept`).send({ handover: 'collection' }).expect(201);
    const again = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'collection' })
      .expect(409);
    expect(again.body.error.code).toBe('quote_state');
    await world.buyer.agent.post(`/api/quotes/${second}/accept`).send({ handover: 'collection' }).expect(409);
  });

  it('opens the request again when the build order lapses unpaid, so another quote can be accepted', async () => {
    const { first, second } = await twoQuotes();
    const accepted = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'collection' })
      .expect(201);
    const orderId = (accepted.body as { orderId: number }).orderId;
    await world.buyer.agent.post(`/api/orders/${orderId}/give-up`).expect(200);
    expect((await app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id: orderId })).state).toBe('lapsed');

    await world.buyer.agent.post(`/api/quotes/${second}/accept`).send({ handover: 'collection' }).expect(201);
  });

  it('lets only one of two simultaneous acceptances through', async () => {
    const { first, second } = await twoQuotes();
    const answers = await Promise.all([
      world.buyer.agent.post(`/api/quotes/${first}/accept`).send({ handover: 'collection' }),
      world.buyer.agent.post(`/api/quotes/${second}/accept`).send({ handover: 'collection' }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
  });

  it('answers 404 when someone other than the buyer accepts, including the builder', async () => {
    const { first } = await twoQuotes();
    const stranger = await signedInAs(app, await buildUser(app.ctx.dataSource));
    await stranger.post(`/api/quotes/${first}/accept`).send({ handover: 'collection' }).expect(404);
    await world.near.agent.post(`/api/quotes/${first}/accept`).send({ handover: 'collection' }).expect(404);
  });

  it('answers 422 for delivery without an address', async () => {
    const { first } = await twoQuotes();
    const res = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'seller_delivery' })
      .expect(422);
    expect(res.body.error.fields.deliveryAddress).toMatch(/address/);
  });

  it('answers 409 for a quote that has run out', async () => {
    const { first } = await twoQuotes();
    await app.ctx.dataSource.query('UPDATE quotes SET valid_until = ? WHERE id = ?', ['2020-01-01', first]);
    const res = await world.buyer.agent
      .post(`/api/quotes/${first}/accept`)
      .send({ handover: 'collection' })
      .expect(409);
    expect(res.body.error.code).toBe('quote_expired');
  });

  it('answers 409 when a builder quotes after the buyer accepted another quote', async () => {
    const requestId = await askBoth(world);
    const first = await quoteAsDrafted(world.near, requestId);
    await world.buyer.agent.post(`/api/quotes/${first}/accept`).send({ handover: 'collection' }).expect(201);
    const late = await world.second.agent
      .post(`/api/quotes/inbox/${requestId}/quote`)
      .send({
        lines: [{ key: 'builder', label: 'Frames', amountMinor: 100 }],
        deliveryMinor: 0,
        leadTimeWeeks: 2,
        validDays: 30,
        note: 'Late',
      })
      .expect(409);
    expect(late.body.error.code).toBe('request_closed');
  });
});
