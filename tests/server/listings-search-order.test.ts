import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

describe('GET /api/listings sorting and pages', () => {
  it('puts the listing matching more of the words first when sorting by relevance', async () => {
    const res = await visitor.get('/api/listings').query({ q: `${fixture.mark} terminus loop` });
    expect(res.body.sort).toBe('relevance');
    expect(res.body.items[0].id).toBe(fixture.listings.terminus.id);
  });

  it('sorts by price both ways, newest first by default', async () => {
    expect(await ids({ sort: 'price-asc', priceMin: 0 })).toEqual(idsOf('halt', 'station', 'terminus', 'frame'));
    expect(await ids({ sort: 'price-desc', priceMin: 0 })).toEqual(idsOf('frame', 'terminus', 'station', 'halt'));
    expect(await ids({ sort: 'newest' })).toEqual(idsOf('euro', 'service', 'frame', 'halt', 'station', 'terminus'));
  });

  it('pages through results without overlap', async () => {
    const pages = [];
    for (const page of [1, 2, 3]) {
      const res = await visitor.get('/api/listings').query({ q: fixture.mark, sort: 'newest', pageSize: 2, page });
      expect(res.body.total).toBe(6);
      pages.push(...(res.body.items as { id: number }[]).map((l) => l.id));
    }
    expect(pages).toEqual(idsOf('euro', 'service', 'frame', 'halt', 'station', 'terminus'));
  });

  it('reports the same total on every page when sorting by relevance or distance, even past the last page', async () => {
    for (const sort of ['relevance', 'distance'])
      for (const page of [1, 2, 5]) {
        const query = { q: fixture.mark, sort, pageSize: 4, page, town: fixture.listings.terminus.townId };
        const res = await visitor.get('/api/listings').query(query);
        expect(res.status, JSON.stringify(res.body)).toBe(200);
        expect(res.body.items).toHaveLength([4, 2, 0][[1, 2, 5].indexOf(page)]!);
        expect(res.body.total).toBe(6);
      }
  });
});

describe('search words', () => {
  it('matches words shorter than the full-text minimum as whole words: "OO" but not inside "wood"', async () => {
    // "Softwood" in the station's description contains "oo"; only whole-word OO counts
    sameSet(await ids({ q: `${fixture.mark} oo` }), idsOf('terminus', 'frame', 'euro'));
    sameSet(await ids({ q: `${fixture.mark} H0` }), idsOf('station'));
  });

  it('treats SQL and full-text metacharacters as plain text', async () => {
    sameSet(
      await ids({ q: `${fixture.mark}' OR 1=1 -- ` }),
      idsOf('terminus', 'station', 'halt', 'frame', 'service', 'euro'),
    );
    // in boolean mode "-word" would exclude every row; here it is just the word again
    sameSet(
      await ids({ q: `+${fixture.mark} -${fixture.mark}*` }),
      idsOf('terminus', 'station', 'halt', 'frame', 'service', 'euro'),
    );
    for (const q of ['%', '_', '\\', `"); DROP TABLE listings; --`, "' UNION SELECT password_hash FROM users #"]) {
      const res = await visitor.get('/api/listings').query({ q });
      expect(res.status, q).toBe(200);
    }
    sameSet(await ids({}), idsOf('terminus', 'station', 'halt', 'frame', 'service', 'euro'));
  });

  it('answers 422 to a sort or filter value it does not know', async () => {
    for (const query of [
      { sort: 'newest; DROP TABLE listings' },
      { sort: 'l.price_minor' },
      { scale: "oo' OR '1'='1" },
      { kind: 'module OR 1=1' },
      { priceMin: '1 OR 1=1' },
    ]) {
      const res = await visitor.get('/api/listings').query(query);
      expect(res.status, JSON.stringify(query)).toBe(422);
    }
  });
});
