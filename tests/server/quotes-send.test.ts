import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { draftQuote } from '../../shared/quotes/quote-pricing';
import type { RateCard } from '../../shared/schemas/listing-service';
import type { InboxRequestView, QuoteRequestView } from '../../shared/types/quotes';
import { waitForMail } from '../support/inbox';
import { serviceBody } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';
import { askBoth, ONE_BOARD, quoteAsDrafted, quoteWorld, type QuoteWorld } from './quotes-fixture';

let app: AppInstance;
let world: QuoteWorld;

beforeAll(async () => {
  app = await startTestApp();
  world = await quoteWorld(app);
}, 60_000);
afterAll(() => app.close());

const CARD = serviceBody().rateCard as RateCard;

describe('GET /api/quotes/inbox/:id', () => {
  it('prefills the quote from the plan’s bill of materials priced by the builder’s rate card', async () => {
    const id = await askBoth(world);
    const view = (await world.near.agent.get(`/api/quotes/inbox/${id}`).expect(200)).body.request as InboxRequestView;
    expect(view.draft).toEqual(draftQuote(ONE_BOARD, CARD, view.distanceKm));
    // 8.422 m × £45 + 0.72 m² × £30 + one leg set £60 (tests/shared/quotes/quote-pricing.test.ts)
    expect(view.draft!.itemMinor).toBe(46_059);
    expect(view.draft!.deliveryMinor).toBe(view.distanceKm * 60);
    expect(view.depositBps).toBe(3000);
    expect(view.quote).toBeNull();
  });
});

describe('POST /api/quotes/inbox/:id/quote', () => {
  it('sends the rate card’s pricing unchanged without a note, and e-mails the buyer', async () => {
    const id = await askBoth(world);
    await quoteAsDrafted(world.near, id);
    const mail = await waitForMail(world.buyer.user.email, 'Quote received from Caithness Frames');
    expect(mail.text).toContain(`/quotes/requests/${id}`);
    const request = (await world.buyer.agent.get(`/api/quotes/requests/${id}`).expect(200)).body
      .request as QuoteRequestView;
    expect(request.quotes).toHaveLength(1);
    const [quote] = request.quotes;
    expect(quote).toMatchObject({ adjusted: false, itemMinor: 46_059, depositBps: 3000, state: 'sent' });
    // The buyer pays item + delivery + the buyer's fee (orderAmounts); the deposit is 30 % of that, rounded half up.
    expect(quote!.totalMinor).toBe(46_059 + quote!.deliveryMinor + quote!.buyerFeeMinor);
    expect(quote!.depositMinor).toBe(Math.floor((quote!.totalMinor * 3000 + 5000) / 10_000));
    expect(request.recipients.find((r) => r.listingId === world.near.listing.id)?.state).toBe('quoted');
  });

  it('answers 422 on the note when a price is changed without one, and keeps the note when given', async () => {
    const id = await askBoth(world);
    const view = (await world.second.agent.get(`/api/quotes/inbox/${id}`).expect(200)).body.request as InboxRequestView;
    const lines = view.draft!.lines.map((l) => ({ key: l.key, label: l.label, amountMinor: l.amountMinor }));
    lines[lines.length - 1] = { ...lines[lines.length - 1]!, amountMinor: 9_500 };
    const body = { lines, deliveryMinor: view.draft!.deliveryMinor, leadTimeWeeks: 8, validDays: 14 };
    const bare = await world.second.agent.post(`/api/quotes/inbox/${id}/quote`).send(body).expect(422);
    expect(bare.body.error.fields.note).toMatch(/what you changed/);
    const note = 'Materials priced at my merchant: birch ply and planed 2x1.';
    await world.second.agent
      .post(`/api/quotes/inbox/${id}/quote`)
      .send({ ...body, note })
      .expect(201);
    const request = (await world.buyer.agent.get(`/api/quotes/requests/${id}`).expect(200)).body
      .request as QuoteRequestView;
    expect(request.quotes[0]).toMatchObject({ adjusted: true, note, itemMinor: 46_059 + 9_500, leadTimeWeeks: 8 });
    // The changed line became a lump sum; the rate card's lines keep their quantity and rate.
    expect(request.quotes[0]!.lines[0]).toMatchObject({ quantity: 8.42, rateMinor: 4_500 });
  });

  it('answers 409 when the builder sends a second quote for the same request', async () => {
    const id = await askBoth(world);
    await quoteAsDrafted(world.near, id);
    const view = (await world.near.agent.get(`/api/quotes/inbox/${id}`).expect(200)).body.request as InboxRequestView;
    const res = await world.near.agent
      .post(`/api/quotes/inbox/${id}/quote`)
      .send({
        lines: [{ key: 'builder', label: 'Frames', amountMinor: 100 }],
        deliveryMinor: 0,
        leadTimeWeeks: 2,
        validDays: 30,
        note: 'Again',
      })
      .expect(409);
    expect(res.body.error.code).toBe('already_quoted');
    expect(view.quote?.state).toBe('sent');
  });

  it('answers 422 for a quote whose lines add up to nothing', async () => {
    const id = await askBoth(world);
    const res = await world.near.agent
      .post(`/api/quotes/inbox/${id}/quote`)
      .send({
        lines: [{ key: 'builder', label: 'Nothing', amountMinor: 0 }],
        deliveryMinor: 0,
        leadTimeWeeks: 2,
        validDays: 30,
        note: 'Free',
      })
      .expect(422);
    expect(res.body.error.fields.lines).toMatch(/add up to nothing/);
  });
});

describe('PUT /api/quotes/settings', () => {
  it('lets a builder set their deposit, which later quotes carry', async () => {
    const res = await world.second.agent.put('/api/quotes/settings').send({ depositPercent: 40 }).expect(200);
    expect(res.body.settings).toEqual({ depositBps: 4000, builder: true });
    const id = await askBoth(world);
    await quoteAsDrafted(world.second, id);
    const request = (await world.buyer.agent.get(`/api/quotes/requests/${id}`).expect(200)).body
      .request as QuoteRequestView;
    expect(request.quotes[0]!.depositBps).toBe(4000);
    await world.second.agent.put('/api/quotes/settings').send({ depositPercent: 30 }).expect(200);
  });

  it('answers 422 outside 10–50 % and 409 for a member who is not a builder', async () => {
    const res = await world.second.agent.put('/api/quotes/settings').send({ depositPercent: 60 }).expect(422);
    expect(res.body.error.fields.depositPercent).toMatch(/at most 50/);
    const member = await world.buyer.agent.put('/api/quotes/settings').send({ depositPercent: 20 }).expect(409);
    expect(member.body.error.code).toBe('not_a_builder');
  });
});
