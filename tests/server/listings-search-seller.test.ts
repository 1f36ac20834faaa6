import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Listing } from '../../server/features/listings/listing.entity';
import { buildSearchSql } from '../../server/features/listings/search-sql';
import { User } from '../../server/features/users/user.entity';
import type { ListingState } from '../../shared/listings/states';
import { listingSearchSchema } from '../../shared/schemas/listing-search';
import { buildUser } from '../support/factories';
import { buildListedListing, buildListing } from '../support/listing-factories';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let visitor: TestAgent;
let seller: User;
let listed: Listing[];
let hidden: Listing[];
let otherSellersListing: Listing;

/** Ids a seller search answers with, newest first. */
async function sellerIds(query: Record<string, string | number>): Promise<number[]> {
  const res = await visitor.get('/api/listings').query({ sort: 'newest', pageSize: 48, ...query });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return (res.body.items as { id: number; seller: { id: number } }[]).map((l) => l.id);
}

beforeAll(async () => {
  app = await startTestApp();
  visitor = await browserLikeAgent(app);
  const ds = app.ctx.dataSource;
  seller = await buildUser(ds, { displayName: 'Maud Crossmember' });
  const neighbour = await buildUser(ds);
  const moderator = await buildUser(ds, { role: 'moderator' });
  const list = (owner: User, title: string, scaleId: 'oo' | 'n' | 'h0') =>
    buildListedListing(app.ctx, owner, moderator, { title, scaleId });
  listed = [
    await list(seller, 'OO goods yard module, one board', 'oo'),
    await list(seller, 'N gauge fiddle yard, two boards', 'n'),
  ];
  otherSellersListing = await list(neighbour, 'H0 branch halt on a light frame', 'h0');
  // The seller's listings in every state a stranger may not see, and one sold (seen on its page, never searched).
  const states: ListingState[] = ['draft', 'awaiting_review', 'sent_back', 'withdrawn', 'sold'];
  hidden = [];
  for (const state of states) {
    const listing = await buildListing(ds, seller, { title: `OO module left ${state.replace('_', ' ')}` });
    await ds.getRepository(Listing).update(listing.id, { state });
    hidden.push(listing);
  }
});
afterAll(() => app.close());

describe('GET /api/listings?seller=', () => {
  it('answers with only that seller’s listed listings, newest first', async () => {
    expect(await sellerIds({ seller: seller.id })).toEqual([listed[1]!.id, listed[0]!.id]);
    expect(await sellerIds({ seller: otherSellersListing.ownerId })).toEqual([otherSellersListing.id]);
  });

  it('never shows the seller’s drafts, listings awaiting review, sent back, withdrawn or sold', async () => {
    const ids = await sellerIds({ seller: seller.id });
    for (const listing of hidden) expect(ids).not.toContain(listing.id);
    const res = await visitor.get('/api/listings').query({ seller: seller.id });
    expect(res.body.total).toBe(2);
  });

  it('combines with the other filters', async () => {
    expect(await sellerIds({ seller: seller.id, scale: 'oo' })).toEqual([listed[0]!.id]);
  });

  it('shows nothing of a suspended seller', async () => {
    const suspended = await buildUser(app.ctx.dataSource);
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    await buildListedListing(app.ctx, suspended, moderator, { title: 'OO engine shed module, one board' });
    await app.ctx.dataSource.getRepository(User).update(suspended.id, { suspendedAt: new Date() });

    expect(await sellerIds({ seller: suspended.id })).toEqual([]);
  });

  it('answers 422 naming the field for a seller that is not a user id', async () => {
    const res = await visitor.get('/api/listings').query({ seller: 'maud' });

    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', fields: { seller: 'Seller must be a number.' } });
  });

  it('reads one seller’s listings through the owner index, not the whole table', async () => {
    const query = listingSearchSchema.parse({ seller: String(seller.id), sort: 'newest' });
    const plan = buildSearchSql(query, null, null, 'newest');
    const rows = (await app.ctx.dataSource.query(`EXPLAIN ${plan.sql}`, plan.params)) as {
      table: string;
      type: string;
      key: string | null;
    }[];
    const listings = rows.find((r) => r.table === 'l')!;

    expect(listings.key).toBe('ix_listings_owner_state');
    expect(listings.type).toBe('ref');
  });
});
