import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildSearchFixture, type SearchFixture } from '../support/search-fixture';
import { searchQueries } from '../support/search-queries';
import { browserLikeAgent, startTestApp } from '../support/test-app';

type SearchQueries = ReturnType<typeof searchQueries>;

let app: AppInstance;
let visitor: TestAgent;
let fixture: SearchFixture;
let ids: SearchQueries['ids'];
let idsOf: SearchQueries['idsOf'];
let sameSet: SearchQueries['sameSet'];

beforeAll(async () => {
  app = await startTestApp();
  visitor = await browserLikeAgent(app);
  fixture = await buildSearchFixture(app);
  ({ ids, idsOf, sameSet } = searchQueries(visitor, fixture));
});
afterAll(() => app.close());

describe('GET /api/listings filters', () => {
  it('finds only listed listings by their words', async () => {
    sameSet(await ids({}), idsOf('terminus', 'station', 'halt', 'frame', 'service', 'euro'));
  });

  it('filters by kind', async () => {
    sameSet(await ids({ kind: 'service' }), idsOf('service'));
    sameSet(await ids({ kind: 'module' }), idsOf('terminus', 'station', 'halt', 'frame', 'euro'));
  });

  it('widens within a filter (scale OO or H0) and narrows across filters (and DC)', async () => {
    sameSet(await ids({ scale: ['oo', 'h0'] }), idsOf('terminus', 'station', 'frame', 'euro'));
    sameSet(await ids({ scale: 'oo,h0', control: 'dc' }), idsOf('station'));
    sameSet(await ids({ control: 'dcc' }), idsOf('terminus', 'euro'));
  });

  it('filters by gauge across scales', async () => {
    sameSet(await ids({ gauge: '9' }), idsOf('halt'));
    sameSet(await ids({ gauge: '16.5' }), idsOf('terminus', 'station', 'frame', 'euro'));
  });

  it('filters by how finished', async () => {
    sameSet(await ids({ finish: 'bare-frame,fully-sceniced' }), idsOf('frame', 'halt'));
  });

  it('filters by length and width ranges', async () => {
    sameSet(await ids({ lengthMin: 1000, lengthMax: 2000 }), idsOf('terminus', 'euro'));
    sameSet(await ids({ widthMax: 400 }), idsOf('station', 'halt'));
  });

  it('filters by price range in one currency', async () => {
    sameSet(await ids({ priceMin: 5_000, priceMax: 20_000 }), idsOf('terminus', 'station'));
    sameSet(await ids({ priceMin: 5_000, priceMax: 20_000, currency: 'EUR' }), idsOf('euro'));
  });

  it('filters by handling option', async () => {
    sameSet(await ids({ handling: ['parcel', 'pallet'] }), idsOf('station', 'frame'));
    sameSet(await ids({ handling: 'delivery' }), idsOf('halt'));
    sameSet(await ids({ handling: 'collection', scale: 'oo', currency: 'GBP', priceMax: 20_000 }), idsOf('terminus'));
  });
});

describe('"joins my profile"', () => {
  it('matches an end with the same number of tracks at the same offsets', async () => {
    sameSet(await ids({ joinOffsets: '150,196', joinTolerance: 0 }), idsOf('terminus'));
    sameSet(await ids({ joinOffsets: '80,105' }), idsOf('halt'));
  });

  it('allows each offset to differ by the chosen tolerance and no more', async () => {
    // end A of the terminus has tracks at 150 and 196 mm; the buyer's are at 152 and 199 mm (2 and 3 mm off)
    sameSet(await ids({ joinOffsets: '152,199', joinTolerance: 3 }), idsOf('terminus'));
    sameSet(await ids({ joinOffsets: '152,199', joinTolerance: 2 }), []);
  });

  it('matches either end, and never an end with a different track count', async () => {
    // the terminus's end B and both ends of the station carry one track
    sameSet(await ids({ joinOffsets: '149', joinTolerance: 1 }), idsOf('terminus'));
    sameSet(await ids({ joinOffsets: '100' }), idsOf('station'));
  });
});
