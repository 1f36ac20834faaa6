import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import { moveListing } from '../../server/features/listings/listing-lifecycle';
import { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { buildListedListing, buildListing, moduleBody } from '../support/listing-factories';
import { jpegPhoto } from '../support/photo-fixtures';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

const TICKED = { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true };

let app: AppInstance;
let seller: User;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Owain Fenwick' });
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

/** Force a listing into `state` through the orders feature's moves, as a paid order would. */
async function ordersMove(listing: Listing, move: 'reserve' | 'release' | 'sell') {
  await app.ctx.transaction(async (m) => {
    const locked = await m.getRepository(Listing).findOneByOrFail({ id: listing.id });
    await moveListing(m, locked, move, { id: null, ip: null, as: 'orders' });
  });
}

describe('listing lifecycle', () => {
  it('takes a module from draft to awaiting review to listed, recording who moved it and when', async () => {
    const sellerAgent = await signedInAs(app, seller);
    const created = await sellerAgent.post('/api/listings').send(moduleBody());
    expect(created.status).toBe(201);
    expect(created.body.listing).toMatchObject({ state: 'draft', seller: { id: seller.id } });
    const id = created.body.listing.id as number;
    await uploadPhoto(sellerAgent, id, await jpegPhoto()).expect(201);

    const submitted = await sellerAgent.post(`/api/listings/${id}/submit`).send({});
    expect(submitted.status).toBe(200);
    expect(submitted.body.listing.state).toBe('awaiting_review');

    const modAgent = await signedInAs(app, moderator);
    const approved = await modAgent.post(`/api/moderation/listings/${id}/approve`).send({ checklist: TICKED });
    expect(approved.status).toBe(200);
    expect(approved.body.listing).toMatchObject({ state: 'listed', publishedAt: expect.any(String) });

    const events = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .find({ where: { targetType: 'listing', targetId: String(id) }, order: { id: 'ASC' } });
    expect(events.map((e) => [e.action, e.actorId])).toEqual([
      ['listing.created', seller.id],
      ['listing.submit', seller.id],
      ['listing.approve', moderator.id],
    ]);
    expect(events[2]!.detail).toEqual({ from: 'awaiting_review', to: 'listed' });
    expect(events[2]!.createdAt).toBeInstanceOf(Date);
  });

  it('answers 409 with a clear message when a listing awaiting review is submitted again', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const agent = await signedInAs(app, seller);
    await agent.post(`/api/listings/${listing.id}/submit`).send({}).expect(200);

    const res = await agent.post(`/api/listings/${listing.id}/submit`).send({});

    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'listing_state',
      message:
        'This listing is awaiting review, so it cannot be submitted for review. ' +
        'That is possible only when it is a draft or sent back for changes.',
    });
  });

  it('answers 409 when a moderator approves a draft that was never submitted', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const res = await (
      await signedInAs(app, moderator)
    )
      .post(`/api/moderation/listings/${listing.id}/approve`)
      .send({ checklist: TICKED });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/a draft, so it cannot be approved/);
  });

  it('lets the seller withdraw a listed module, and then refuses every further move', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const agent = await signedInAs(app, seller);

    const res = await agent.post(`/api/listings/${listing.id}/withdraw`).send({});
    expect(res.status).toBe(200);
    expect(res.body.listing.state).toBe('withdrawn');

    await agent.post(`/api/listings/${listing.id}/submit`).send({}).expect(409);
    await agent.post(`/api/listings/${listing.id}/withdraw`).send({}).expect(409);
    const edit = await agent.put(`/api/listings/${listing.id}`).send(moduleBody());
    expect(edit.status).toBe(409);
    expect(edit.body.error.message).toBe('This listing is withdrawn, so it can no longer be changed.');
  });

  it('holds a reserved listing for its buyer: the seller cannot withdraw or edit it, and a sale closes it', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    await ordersMove(listing, 'reserve');
    const agent = await signedInAs(app, seller);

    await agent.post(`/api/listings/${listing.id}/withdraw`).send({}).expect(409);
    await agent.put(`/api/listings/${listing.id}`).send(moduleBody()).expect(409);
    await ordersMove(listing, 'sell');

    const sold = await (await signedInAs(app, await buildUser(app.ctx.dataSource))).get(`/api/listings/${listing.id}`);
    expect(sold.status).toBe(200);
    expect(sold.body.listing.state).toBe('sold');
    await expect(ordersMove(listing, 'release')).rejects.toMatchObject({ status: 409 });
  });

  it('puts a released reservation back on the list', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    await ordersMove(listing, 'reserve');
    await ordersMove(listing, 'release');
    const after = await app.ctx.dataSource.getRepository(Listing).findOneByOrFail({ id: listing.id });
    expect(after.state).toBe('listed');
  });
});
