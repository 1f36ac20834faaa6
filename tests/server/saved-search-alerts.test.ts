import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { approveListing } from '../../server/features/listings/moderation.service';
import { SavedSearchHit } from '../../server/features/saved-searches/saved-search-hit.entity';
import { SavedSearch } from '../../server/features/saved-searches/saved-search.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { linkIn, messagesTo, waitForMail } from '../support/inbox';
import { buildListedListing, moduleBody } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

const TICKED = { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true };

let app: AppInstance;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

const word = () => `qx${randomBytes(5).toString('hex')}`;

async function saveSearch(member: User, name: string, query: Record<string, unknown>) {
  const agent = await signedInAs(app, member);
  const res = await agent.post('/api/saved-searches').send({ name, query }).expect(201);
  return res.body.search.id as number;
}

/** The seller's own "listing is live" e-mail comes from the same transaction, so once it is here, any alert is too. */
const sellerHeard = (seller: User, title: string) => waitForMail(seller.email, `Your listing is live: ${title}`);

describe('e-mail for saved searches when a listing is approved', () => {
  it('e-mails a member whose saved search matches, with a link to the listing', async () => {
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Hetty Plank' });
    const seller = await buildUser(app.ctx.dataSource);
    const token = word();
    const id = await saveSearch(buyer, 'Crewe OO boards', { q: token, scale: 'oo', control: 'dcc' });

    const title = `OO goods yard ${token}`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { title });

    const mail = await waitForMail(buyer.email, 'Crewe OO boards');
    expect(mail.subject).toContain(title);
    expect(mail.text).toContain('Hello Hetty Plank');
    expect(linkIn(mail, `/listings/${listing.id}`).pathname).toBe(`/listings/${listing.id}`);
    expect(mail.text).not.toContain(moduleBody().description);
    const saved = await app.ctx.dataSource.getRepository(SavedSearch).findOneByOrFail({ id });
    expect(saved.lastNotifiedAt).not.toBeNull();
  });

  it('sends nothing for a saved search the listing does not match', async () => {
    const buyer = await buildUser(app.ctx.dataSource);
    const seller = await buildUser(app.ctx.dataSource);
    const token = word();
    await saveSearch(buyer, 'N gauge only', { q: token, scale: 'n' });
    await saveSearch(buyer, 'Other words', { q: word() });

    const title = `OO engine shed ${token}`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { title });
    await sellerHeard(seller, title);

    expect(await messagesTo(buyer.email)).toHaveLength(0);
    expect(await app.ctx.dataSource.getRepository(SavedSearchHit).countBy({ listingId: listing.id })).toBe(0);
  });

  it('does not e-mail the seller about their own listing', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const token = word();
    await saveSearch(seller, 'My own kind of board', { q: token });

    const title = `OO sector plate ${token}`;
    await buildListedListing(app.ctx, seller, moderator, { title });
    await sellerHeard(seller, title);

    const subjects = (await messagesTo(seller.email)).map((m) => m.subject);
    expect(subjects.some((s) => s.includes('My own kind of board'))).toBe(false);
  });

  it('e-mails once for a listing however often it is approved', async () => {
    const buyer = await buildUser(app.ctx.dataSource);
    const seller = await buildUser(app.ctx.dataSource);
    const token = word();
    await saveSearch(buyer, 'Once only', { q: token });
    const title = `OO canal wharf ${token}`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { title });
    await waitForMail(buyer.email, 'Once only');

    const sellerAgent = await signedInAs(app, seller);
    const revised = await sellerAgent
      .put(`/api/listings/${listing.id}`)
      .send(moduleBody({ title, priceMinor: 15_000 }))
      .expect(200);
    expect(revised.body.listing.state).toBe('awaiting_review');
    await approveListing(app.ctx, { id: moderator.id, role: moderator.role, ip: '127.0.0.1' }, listing.id, {
      checklist: TICKED,
    });
    await expect
      .poll(async () => (await messagesTo(seller.email)).filter((m) => m.subject.includes('is live')).length, {
        timeout: 10_000,
      })
      .toBe(2);

    const alerts = (await messagesTo(buyer.email)).filter((m) => m.subject.includes('Once only'));
    expect(alerts).toHaveLength(1);
    expect(await app.ctx.dataSource.getRepository(SavedSearchHit).countBy({ listingId: listing.id })).toBe(1);
  });
});
