import { randomBytes } from 'node:crypto';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { gazetteer } from '../../server/features/towns/gazetteer';
import type { Listing } from '../../server/features/listings/listing.entity';
import { haversineKm } from '../../shared/geo';
import { buildUser } from '../support/factories';
import { TOWNS, buildListedListing } from '../support/listing-factories';
import { browserLikeAgent, startTestApp } from '../support/test-app';

const MARK = `bwd${randomBytes(4).toString('hex')}`;
const MODULE_TOWNS = ['crewe', 'nantwich', 'stoke', 'chester', 'manchester', 'derby', 'york'] as const;

let app: AppInstance;
let visitor: TestAgent;
const modules = new Map<Listing, (typeof MODULE_TOWNS)[number]>();
let wideService: Listing;
let narrowService: Listing;

beforeAll(async () => {
  app = await startTestApp();
  visitor = await browserLikeAgent(app);
  const seller = await buildUser(app.ctx.dataSource);
  const builder = await buildUser(app.ctx.dataSource, { role: 'builder' });
  const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  const description = `A module for the distance checks, reference ${MARK}.`;
  for (const town of MODULE_TOWNS)
    modules.set(await buildListedListing(app.ctx, seller, moderator, { townId: TOWNS[town], description }), town);
  // Derby is about 67 km from Crewe: inside an 80 km service area, outside a 50 km one.
  wideService = await buildListedListing(app.ctx, builder, moderator, {
    kind: 'service',
    townId: TOWNS.derby,
    serviceAreaKm: 80,
    description,
  });
  narrowService = await buildListedListing(app.ctx, builder, moderator, {
    kind: 'service',
    townId: TOWNS.derby,
    serviceAreaKm: 50,
    description,
  });
});
afterAll(() => app.close());

async function search(query: Record<string, string | number>) {
  const res = await visitor.get('/api/listings').query({ q: MARK, town: TOWNS.crewe, pageSize: 48, ...query });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body.items as { id: number; kind: string; distanceKm: number }[];
}

/** Distance from Crewe to the listing's stored (rounded) position, by the shared haversine. */
async function expectedKm(listing: Listing) {
  const crewe = (await gazetteer()).find(TOWNS.crewe)!;
  return haversineKm(crewe, { lat: listing.latitude, lon: listing.longitude });
}

describe('GET /api/listings near a town', () => {
  for (const withinKm of [30, 50, 100]) {
    it(`finds the modules within ${withinKm} km of Crewe that the shared haversine puts there`, async () => {
      const expected: number[] = [];
      for (const [listing] of modules) if ((await expectedKm(listing)) <= withinKm) expected.push(listing.id);

      const found = (await search({ withinKm, kind: 'module' })).map((l) => l.id);

      expect(found.sort()).toEqual(expected.sort());
    });
  }

  it('leaves out Chester (about 32 km) at 30 km and takes in Manchester (about 45 km) at 50 km', async () => {
    const near = (await search({ withinKm: 30, kind: 'module' })).map((l) =>
      modules.get([...modules.keys()].find((k) => k.id === l.id)!),
    );
    expect(near.sort()).toEqual(['crewe', 'nantwich', 'stoke']);
    const wider = (await search({ withinKm: 50, kind: 'module' })).map((l) => l.id);
    expect(wider).toHaveLength(5);
  });

  it('reports each distance as the shared haversine does, and sorts by it', async () => {
    const items = await search({ kind: 'module', sort: 'distance' });
    expect(items.map((i) => i.distanceKm)).toEqual([...items.map((i) => i.distanceKm)].sort((a, b) => a - b));
    for (const item of items) {
      const listing = [...modules.keys()].find((l) => l.id === item.id)!;
      expect(item.distanceKm).toBeCloseTo(await expectedKm(listing), 1);
    }
    expect(items).toHaveLength(MODULE_TOWNS.length);
  });

  it('finds a build service when the town lies inside its service area', async () => {
    const services = (await search({ withinKm: 10, kind: 'service' })).map((l) => l.id);
    expect(services).toEqual([wideService.id]);
    expect(services).not.toContain(narrowService.id);
  });

  it('answers 422 for a town that is not in the gazetteer', async () => {
    const res = await visitor.get('/api/listings').query({ town: 1, withinKm: 10 });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.town).toMatch(/Choose a town/);
  });
});
