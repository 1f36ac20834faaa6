import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { buildListedListing, buildListing, moduleBody, serviceBody } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
let other: User;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Bryony Heathcote' });
  other = await buildUser(app.ctx.dataSource);
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

describe('who sees a listing', () => {
  it('answers 404, not 403, to visitors and other members for a draft, awaiting-review or sent-back listing', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    const waiting = await buildListing(app.ctx.dataSource, seller);
    const sentBack = await buildListing(app.ctx.dataSource, seller);
    const sellerAgent = await signedInAs(app, seller);
    await sellerAgent.post(`/api/listings/${waiting.id}/submit`).send({}).expect(200);
    await sellerAgent.post(`/api/listings/${sentBack.id}/submit`).send({}).expect(200);
    await (
      await signedInAs(app, moderator)
    )
      .post(`/api/moderation/listings/${sentBack.id}/send-back`)
      .send({ reasons: ['details-missing'] })
      .expect(200);

    const visitor = await browserLikeAgent(app);
    const member = await signedInAs(app, other);
    for (const listing of [draft, waiting, sentBack]) {
      const asVisitor = await visitor.get(`/api/listings/${listing.id}`);
      expect(asVisitor.status).toBe(404);
      expect(asVisitor.body.error.message).toBe('That listing was not found.');
      expect((await member.get(`/api/listings/${listing.id}`)).status).toBe(404);
      await member.post(`/api/listings/${listing.id}/reports`).send({ reason: 'duplicate' }).expect(404);
    }
  });

  it('shows a draft to its seller and to moderators, with its dates', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    for (const user of [seller, moderator]) {
      const res = await (await signedInAs(app, user)).get(`/api/listings/${draft.id}`);
      expect(res.status).toBe(200);
      expect(res.body.listing).toMatchObject({ id: draft.id, state: 'draft', createdAt: expect.any(String) });
    }
  });

  it('shows a listed module to a visitor without the seller’s private details', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const res = await (await browserLikeAgent(app)).get(`/api/listings/${listing.id}`);
    expect(res.status).toBe(200);
    expect(res.body.listing).toMatchObject({
      state: 'listed',
      seller: { id: seller.id, displayName: 'Bryony Heathcote' },
      town: { name: 'Crewe', adminArea: 'England', country: 'GB' },
      position: { lat: 53.1, lon: -2.44 },
      module: { scale: { id: 'oo', ratio: 76.2, gaugeMm: 16.5 }, weightKg: 9.5, priceMinor: 18_000 },
      photos: [{ position: 1, isCover: true, thumbUrl: expect.stringMatching(/^\/api\/photos\//) }],
    });
    expect(JSON.stringify(res.body)).not.toContain(seller.email);
    expect(res.body.listing).not.toHaveProperty('lastDecision');
  });

  it('hides the listings of a suspended seller from everyone but moderators', async () => {
    const suspendedSeller = await buildUser(app.ctx.dataSource);
    const listing = await buildListedListing(app.ctx, suspendedSeller, moderator);
    await app.ctx.dataSource.query('UPDATE users SET suspended_at = NOW(3) WHERE id = ?', [suspendedSeller.id]);

    await (await browserLikeAgent(app)).get(`/api/listings/${listing.id}`).expect(404);
    await (await signedInAs(app, moderator)).get(`/api/listings/${listing.id}`).expect(200);
  });
});

describe('who changes a listing', () => {
  it('answers 403 when a member edits another seller’s listed module', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const res = await (await signedInAs(app, other)).put(`/api/listings/${listing.id}`).send(moduleBody());
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe('Only the seller can change this listing.');
  });

  it('answers 404 when a member edits, submits or withdraws another seller’s draft', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    const agent = await signedInAs(app, other);
    await agent.put(`/api/listings/${draft.id}`).send(moduleBody()).expect(404);
    await agent.post(`/api/listings/${draft.id}/submit`).send({}).expect(404);
    await agent.post(`/api/listings/${draft.id}/withdraw`).send({}).expect(404);
  });

  it('does not let a moderator edit or submit a seller’s listing', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    const agent = await signedInAs(app, moderator);
    await agent.put(`/api/listings/${draft.id}`).send(moduleBody()).expect(403);
    await agent.post(`/api/listings/${draft.id}/submit`).send({}).expect(403);
  });

  it('answers 401 to a visitor creating a listing', async () => {
    await (await browserLikeAgent(app)).post('/api/listings').send(moduleBody()).expect(401);
  });
});

describe('who decides', () => {
  it('answers 403 when a member tries to approve, send back or take down a listing', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const agent = await signedInAs(app, seller);
    await agent.post(`/api/listings/${listing.id}/submit`).send({}).expect(200);
    for (const action of ['approve', 'send-back', 'take-down', 'dismiss-reports'])
      await agent.post(`/api/moderation/listings/${listing.id}/${action}`).send({}).expect(403);
    await agent.get('/api/moderation/queue').expect(403);
  });

  it('refuses to let a moderator decide on their own listing', async () => {
    const own = await buildListing(app.ctx.dataSource, moderator);
    const agent = await signedInAs(app, moderator);
    await agent.post(`/api/listings/${own.id}/submit`).send({}).expect(200);
    const res = await agent
      .post(`/api/moderation/listings/${own.id}/send-back`)
      .send({ reasons: ['other'], note: 'Self check' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('own_listing');
  });
});

describe('build-service listings', () => {
  it('answers 403 to a member who is not a builder, saying how to become one', async () => {
    const res = await (await signedInAs(app, other)).post('/api/listings').send(serviceBody());
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/Apply for a builder profile/);
  });

  it('lets a builder create and submit one', async () => {
    const builder = await buildUser(app.ctx.dataSource, { role: 'builder' });
    const agent = await signedInAs(app, builder);
    const created = await agent.post('/api/listings').send(serviceBody());
    expect(created.status).toBe(201);
    expect(created.body.listing).toMatchObject({
      kind: 'service',
      module: null,
      service: {
        serviceAreaKm: 80,
        leadTimeWeeks: 6,
        rateCard: { perMetreFrameMinor: 4_500, materialsMarkupBp: 1_500 },
      },
    });
    await agent.post(`/api/listings/${created.body.listing.id}/submit`).send({}).expect(200);
  });
});

describe('GET /api/listings/mine', () => {
  it('lists the seller’s own listings in every state, and only theirs', async () => {
    const mine = await buildUser(app.ctx.dataSource);
    const draft = await buildListing(app.ctx.dataSource, mine);
    const listed = await buildListedListing(app.ctx, mine, moderator);
    await buildListing(app.ctx.dataSource, other);

    const res = await (await signedInAs(app, mine)).get('/api/listings/mine');

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(2);
    expect(res.body.items.map((l: { id: number }) => l.id).sort()).toEqual([draft.id, listed.id].sort());
    const filtered = await (await signedInAs(app, mine)).get('/api/listings/mine').query({ state: 'draft' });
    expect(filtered.body.items.map((l: { id: number }) => l.id)).toEqual([draft.id]);
  });
});
