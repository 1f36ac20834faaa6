import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { TOWNS, buildListedListing, moduleBody, serviceBody } from '../support/listing-factories';
import { wholeQueue } from '../support/moderation-queue';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

describe('POST /api/listings field checks', () => {
  it('answers 422 naming state and ownerId when a seller tries to set them', async () => {
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send({ ...moduleBody(), state: 'listed', ownerId: 1 });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toEqual({
      state: 'This field is not accepted here.',
      ownerId: 'This field is not accepted here.',
    });
  });

  it('answers 422 naming priceMinor when the price is zero or negative', async () => {
    const agent = await signedInAs(app, seller);
    for (const priceMinor of [0, -1]) {
      const res = await agent.post('/api/listings').send(moduleBody({ priceMinor }));
      expect(res.status).toBe(422);
      expect(Object.keys(res.body.error.fields)).toEqual(['priceMinor']);
      expect(res.body.error.fields.priceMinor).toMatch(/more than zero/);
    }
  });

  it('answers 422 naming the nested field that is wrong', async () => {
    const body = moduleBody();
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send({ ...body, construction: { ...body.construction, crossMemberSpacingMm: 5000 } });
    expect(res.status).toBe(422);
    expect(res.body.error.fields).toEqual({
      'construction.crossMemberSpacingMm': 'The cross-member spacing must be at most 1000 mm.',
    });
  });

  it('answers 422 naming townId for a town not in the gazetteer', async () => {
    const res = await (await signedInAs(app, seller)).post('/api/listings').send(moduleBody({ townId: 999_999_999 }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields.townId).toMatch(/nearest town/);
  });

  it('answers 422 when the approximate position is far from the chosen town', async () => {
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send(moduleBody({ townId: TOWNS.crewe, position: { lat: 51.5, lon: -0.12 } }));
    expect(res.status).toBe(422);
    expect(res.body.error.fields.position).toMatch(/km from Crewe/);
  });

  it('stores an approximate position rounded to about a kilometre', async () => {
    const res = await (
      await signedInAs(app, seller)
    )
      .post('/api/listings')
      .send(moduleBody({ townId: TOWNS.crewe, position: { lat: 53.112345, lon: -2.456789 } }));
    expect(res.status).toBe(201);
    expect(res.body.listing.position).toEqual({ lat: 53.11, lon: -2.46 });
  });

  it('keeps the description as the plain text it was given', async () => {
    const description = 'Scenic module <script>alert(1)</script> with a **hidden** fiddle yard below the deck.';
    const res = await (await signedInAs(app, seller)).post('/api/listings').send(moduleBody({ description }));
    expect(res.status).toBe(201);
    expect(res.body.listing.description).toBe(description);
  });
});

describe('PUT /api/listings/:id on a listed module', () => {
  const edits: [string, Partial<ReturnType<typeof moduleBody>>][] = [
    ['price', { priceMinor: 15_000 }],
    ['description', { description: 'Price reduced for a quick sale; otherwise as before, frame square and true.' }],
  ];
  for (const [what, change] of edits) {
    it(`sends it back to review when the ${what} changes`, async () => {
      const listing = await buildListedListing(app.ctx, seller, moderator);
      const res = await (await signedInAs(app, seller)).put(`/api/listings/${listing.id}`).send(moduleBody(change));
      expect(res.status).toBe(200);
      expect(res.body.listing.state).toBe('awaiting_review');
      const queue = await wholeQueue(await signedInAs(app, moderator));
      expect(queue.some((i) => i.listing.id === listing.id)).toBe(true);
    });
  }

  it('keeps it listed when only the weight or handling changes', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const res = await (await signedInAs(app, seller)).put(`/api/listings/${listing.id}`).send(
      moduleBody({
        weightKg: 11,
        handling: { collection: true, delivery: null, courier: 'pallet', courierPriceMinor: 6_800 },
      }),
    );
    expect(res.status).toBe(200);
    expect(res.body.listing).toMatchObject({ state: 'listed', module: { weightKg: 11 } });
    const stored = await app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: listing.id });
    expect(stored).toMatchObject({ weightG: 11_000, courier: 'pallet' });
  });

  it('refuses to turn a module into a service', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const res = await (await signedInAs(app, seller)).put(`/api/listings/${listing.id}`).send(serviceBody());
    expect(res.status).toBe(422);
    expect(res.body.error.fields.kind).toMatch(/kind cannot change/);
  });
});
