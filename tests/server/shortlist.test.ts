import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import type { ShortlistItemView } from '../../shared/types/saved-searches';
import { buildUser } from '../support/factories';
import { buildListedListing, buildListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let seller: User;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  seller = await buildUser(app.ctx.dataSource);
});
afterAll(() => app.close());

const idsOf = (items: ShortlistItemView[]) => items.map((i) => i.listing.id);

describe('the shortlist', () => {
  it('keeps listed listings and lists them most recently kept first', async () => {
    const first = await buildListedListing(app.ctx, seller, moderator, { title: 'Fiddle yard, five roads' });
    const second = await buildListedListing(app.ctx, seller, moderator, { title: 'Station throat module' });
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));

    await buyer.put(`/api/shortlist/${first.id}`).expect(204);
    await buyer.put(`/api/shortlist/${second.id}`).expect(204);

    const res = await buyer.get('/api/shortlist').expect(200);
    expect(idsOf(res.body.items)).toEqual([second.id, first.id]);
    expect(res.body.items[0].listing.title).toBe('Station throat module');
    expect(typeof res.body.items[0].addedAt).toBe('string');
  });

  it('keeps a listing once however often it is added', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));

    await buyer.put(`/api/shortlist/${listing.id}`).expect(204);
    await buyer.put(`/api/shortlist/${listing.id}`).expect(204);

    expect(idsOf((await buyer.get('/api/shortlist').expect(200)).body.items)).toEqual([listing.id]);
  });

  it('answers 404 when a member keeps a draft that is not theirs, or a listing that does not exist', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await buyer.put(`/api/shortlist/${draft.id}`).expect(404);
    expect(res.body.error.code).toBe('not_found');
    await buyer.put('/api/shortlist/4000000000').expect(404);
    expect((await buyer.get('/api/shortlist').expect(200)).body.items).toEqual([]);
  });

  it('leaves out a kept listing once it is hidden from the member', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    await buyer.put(`/api/shortlist/${listing.id}`).expect(204);

    await (await signedInAs(app, seller)).post(`/api/listings/${listing.id}/withdraw`).send({}).expect(200);

    expect((await buyer.get('/api/shortlist').expect(200)).body.items).toEqual([]);
  });

  it('takes a listing off, and taking it off again changes nothing', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    await buyer.put(`/api/shortlist/${listing.id}`).expect(204);

    await buyer.delete(`/api/shortlist/${listing.id}`).expect(204);
    await buyer.delete(`/api/shortlist/${listing.id}`).expect(204);

    expect((await buyer.get('/api/shortlist').expect(200)).body.items).toEqual([]);
  });

  it('shows each member only their own shortlist', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const one = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const other = await signedInAs(app, await buildUser(app.ctx.dataSource));
    await one.put(`/api/shortlist/${listing.id}`).expect(204);

    expect((await other.get('/api/shortlist').expect(200)).body.items).toEqual([]);
  });

  it('answers 401 to a visitor', async () => {
    const visitor = await browserLikeAgent(app);
    await visitor.get('/api/shortlist').expect(401);
  });
});
