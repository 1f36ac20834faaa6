import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { SavedSearch } from '../../server/features/saved-searches/saved-search.entity';
import { MAX_SAVED_SEARCHES } from '../../shared/schemas/saved-searches';
import { buildUser } from '../support/factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

/** A made-up word no other listing or search uses, so searches in these tests match only what they mean to. */
const word = () => `qx${randomBytes(5).toString('hex')}`;

describe('saved searches', () => {
  it('saves a search with its filters and lists it back', async () => {
    const member = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const q = word();

    const res = await member
      .post('/api/saved-searches')
      .send({ name: 'OO fiddle yards', query: { q, scale: 'oo,h0', priceMax: '20000', page: '3', sort: 'newest' } })
      .expect(201);

    expect(res.body.search).toMatchObject({
      name: 'OO fiddle yards',
      query: { q, scale: ['oo', 'h0'], priceMax: 20000 },
    });
    expect(res.body.search.query).not.toHaveProperty('page');
    expect(res.body.search.query).not.toHaveProperty('sort');
    expect(res.body.search.lastNotifiedAt).toBeNull();
    const list = await member.get('/api/saved-searches').expect(200);
    expect(list.body.items.map((s: { id: number }) => s.id)).toEqual([res.body.search.id]);
  });

  it('answers 422 naming the field when the query is not one the search accepts', async () => {
    const member = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await member
      .post('/api/saved-searches')
      .send({ name: 'Odd', query: { scale: 'not-a-scale' } })
      .expect(422);

    expect(Object.keys(res.body.error.fields).join()).toContain('query');
    await member.post('/api/saved-searches').send({ name: ' ', query: {} }).expect(422);
  });

  it(`refuses a search past the ${MAX_SAVED_SEARCHES}th with 409`, async () => {
    const user = await buildUser(app.ctx.dataSource);
    await app.ctx.dataSource.getRepository(SavedSearch).insert(
      Array.from({ length: MAX_SAVED_SEARCHES }, (_, i) => ({
        ownerId: user.id,
        name: `Search ${i}`,
        query: { q: word() },
      })),
    );
    const member = await signedInAs(app, user);

    const res = await member
      .post('/api/saved-searches')
      .send({ name: 'One more', query: { q: word() } })
      .expect(409);

    expect(res.body.error.code).toBe('saved_search_limit');
    expect(res.body.error.message).toContain('Delete one first');
  });

  it("deletes the member's own search and answers 404 for another member's", async () => {
    const owner = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const other = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const { body } = await owner
      .post('/api/saved-searches')
      .send({ name: 'Mine', query: { q: word() } })
      .expect(201);

    await other.delete(`/api/saved-searches/${body.search.id}`).expect(404);
    await owner.delete(`/api/saved-searches/${body.search.id}`).expect(204);

    expect((await owner.get('/api/saved-searches').expect(200)).body.items).toEqual([]);
    await owner.delete(`/api/saved-searches/${body.search.id}`).expect(404);
  });
});
