import type TestAgent from 'supertest/lib/agent';
import { expect } from 'vitest';
import type { SearchFixture } from './search-fixture';

/** Helpers for asking the search API about the fixture's listings, by name. */
export function searchQueries(visitor: TestAgent, fixture: SearchFixture) {
  /** Ids of the listings a search finds, among those carrying the fixture's mark word. */
  async function ids(query: Record<string, string | number | string[]>): Promise<number[]> {
    const res = await visitor.get('/api/listings').query({ q: fixture.mark, pageSize: 48, ...query });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    return (res.body.items as { id: number }[]).map((l) => l.id);
  }
  const idsOf = (...names: (keyof SearchFixture['listings'])[]) => names.map((n) => fixture.listings[n].id);
  const sameSet = (actual: number[], expected: number[]) => expect([...actual].sort()).toEqual([...expected].sort());
  return { ids, idsOf, sameSet };
}
