import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { haversineKm } from '../../shared/geo';
import type { BuilderChoice, InboxItem, QuoteRequestView } from '../../shared/types/quotes';
import { buildUser } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';
import { gazetteer } from '../../server/features/towns/gazetteer';
import { SavedPlan } from '../../server/features/plans/saved-plan.entity';
import { askBoth, ONE_BOARD, quoteWorld, type QuoteWorld } from './quotes-fixture';

let app: AppInstance;
let world: QuoteWorld;

beforeAll(async () => {
  app = await startTestApp();
  world = await quoteWorld(app);
}, 60_000);
afterAll(() => app.close());

describe('GET /api/quotes/builders', () => {
  it('offers the builders whose service area reaches the town, nearest first, with the distance rounded up', async () => {
    const res = await world.buyer.agent.get(`/api/quotes/builders?town=${world.townId}`).expect(200);
    const items = (res.body as { items: BuilderChoice[] }).items;
    const ids = items.map((i) => i.listingId);
    expect(ids.indexOf(world.near.listing.id)).toBeGreaterThanOrEqual(0);
    expect(ids.indexOf(world.near.listing.id)).toBeLessThan(ids.indexOf(world.second.listing.id));
    expect(ids).not.toContain(world.far.listing.id);
    const near = items.find((i) => i.listingId === world.near.listing.id)!;
    const l = world.near.listing;
    const thurso = (await gazetteer()).find(world.townId)!;
    expect(near.distanceKm).toBe(Math.ceil(haversineKm(thurso, { lat: l.latitude, lon: l.longitude })));
    expect(near.depositBps).toBe(3000);
  });

  it('answers 422 for a town that is not in the gazetteer', async () => {
    const res = await world.buyer.agent.get('/api/quotes/builders?town=1').expect(422);
    expect(res.body.error.fields).toHaveProperty('town');
  });
});

describe('POST /api/quotes/requests', () => {
  it('sends the plan to each chosen builder, by e-mail and into their inbox only', async () => {
    const id = await askBoth(world);
    const mail = await waitForMail(world.near.user.email, 'Quote request from Ada Sidebottom');
    expect(mail.text).toContain(`/quotes/inbox/${id}`);
    await waitForMail(world.second.user.email, 'Quote request from Ada Sidebottom');

    const inbox = (await world.near.agent.get('/api/quotes/inbox').expect(200)).body.items as InboxItem[];
    expect(inbox.find((i) => i.requestId === id)).toMatchObject({
      planName: 'Club exhibition module',
      state: 'waiting',
    });
    const farInbox = (await world.far.agent.get('/api/quotes/inbox').expect(200)).body.items as InboxItem[];
    expect(farInbox.map((i) => i.requestId)).not.toContain(id);
  });

  it('answers 404 when a builder opens a request not sent to them', async () => {
    const id = await askBoth(world);
    await world.far.agent.get(`/api/quotes/inbox/${id}`).expect(404);
    await world.far.agent
      .post(`/api/quotes/inbox/${id}/quote`)
      .send({
        lines: [{ key: 'builder', label: 'Frames', amountMinor: 100 }],
        deliveryMinor: 0,
        leadTimeWeeks: 2,
        validDays: 30,
      })
      .expect(404);
  });

  it('answers 404 when someone else opens the buyer’s request', async () => {
    const id = await askBoth(world);
    await world.near.agent.get(`/api/quotes/requests/${id}`).expect(404);
    const view = (await world.buyer.agent.get(`/api/quotes/requests/${id}`).expect(200)).body
      .request as QuoteRequestView;
    expect(view.recipients.map((r) => r.listingId)).toEqual([world.near.listing.id, world.second.listing.id]);
    expect(view.quotes).toEqual([]);
  });

  it('answers 422 for a builder whose area does not reach the town', async () => {
    const res = await world.buyer.agent
      .post('/api/quotes/requests')
      .send({ planId: world.planId, townId: world.townId, listingIds: [world.far.listing.id] })
      .expect(422);
    expect(res.body.error.fields.listingIds).toMatch(/does not work as far as Thurso/);
  });

  it('answers 422 for a plan that is not the buyer’s, and for a date already past', async () => {
    const other = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const body = { planId: world.planId, townId: world.townId, listingIds: [world.near.listing.id] };
    const notMine = await other.post('/api/quotes/requests').send(body).expect(422);
    expect(notMine.body.error.fields.planId).toMatch(/saved plans/);
    const past = await world.buyer.agent
      .post('/api/quotes/requests')
      .send({ ...body, neededBy: '2020-01-01' })
      .expect(422);
    expect(past.body.error.fields.neededBy).toMatch(/after today/);
  });

  it('answers 422 when a builder asks themselves', async () => {
    const own = await app.ctx.dataSource
      .getRepository(SavedPlan)
      .save({ ownerId: world.near.user.id, name: 'My own yard', input: ONE_BOARD, shareToken: null });
    const res = await world.near.agent
      .post('/api/quotes/requests')
      .send({ planId: own.id, townId: world.townId, listingIds: [world.near.listing.id] })
      .expect(422);
    expect(res.body.error.fields.listingIds).toMatch(/Choose builders from the list/);
  });
});
