import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import type { PhotoView } from '../../shared/types/listings';
import { buildUser } from '../support/factories';
import { addPhoto, buildListedListing, buildListing } from '../support/listing-factories';
import { jpegPhoto } from '../support/photo-fixtures';
import { photoState } from '../support/photo-storage';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

const TICKED = { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true };

let app: AppInstance;
let seller: User;
let moderator: User;
let other: TestAgent;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  other = await signedInAs(app, await buildUser(app.ctx.dataSource));
});
afterAll(() => app.close());

/** Every change another member might try on a listing's photos. */
async function changesBy(agent: TestAgent, listing: Listing, photo: PhotoView): Promise<number[]> {
  const base = `/api/listings/${listing.id}/photos`;
  return [
    (await uploadPhoto(agent, listing.id, await jpegPhoto())).status,
    (await agent.put(`${base}/order`).send({ photoIds: [photo.id] })).status,
    (await agent.post(`${base}/${photo.id}/cover`).send({})).status,
    (await agent.delete(`${base}/${photo.id}`)).status,
  ];
}

describe('only the seller changes a listing’s photos (OWASP File Upload Cheat Sheet: only authorised users upload)', () => {
  it('answers 403 to another member on a listing they can see, changing nothing', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const photo = (await other.get(`/api/listings/${listing.id}/photos`)).body.photos[0] as PhotoView;
    const before = await photoState(app);

    expect(await changesBy(other, listing, photo)).toEqual([403, 403, 403, 403]);
    expect(await photoState(app)).toEqual(before);
  });

  it('answers 404 to another member on a listing hidden from them, changing nothing', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const { photo } = await addPhoto(app.ctx, listing, seller);
    const before = await photoState(app);

    expect(await changesBy(other, listing, photo)).toEqual([404, 404, 404, 404]);
    expect(await photoState(app)).toEqual(before);
  });

  it('answers 403 to a moderator too: moderators decide on photos, they do not change them', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const { photo } = await addPhoto(app.ctx, listing, seller);
    expect(await changesBy(await signedInAs(app, moderator), listing, photo)).toEqual([403, 403, 403, 403]);
  });
});

describe('who sees a listing’s photos', () => {
  it('hides a draft’s photos from visitors and other members (404), not from its seller and moderators', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const { photo } = await addPhoto(app.ctx, listing, seller);
    const visitor = await browserLikeAgent(app);

    for (const agent of [visitor, other]) {
      await agent.get(`/api/listings/${listing.id}/photos`).expect(404);
      await agent.get(photo.thumbUrl).expect(404);
      await agent.get(photo.displayUrl).expect(404);
    }
    for (const user of [seller, moderator]) {
      const agent = await signedInAs(app, user);
      expect((await agent.get(`/api/listings/${listing.id}/photos`)).body.photos).toEqual([photo]);
      const file = await agent.get(photo.thumbUrl);
      expect([file.status, file.headers['cache-control']]).toEqual([200, 'private, max-age=600']);
    }
  });

  it('hides a withdrawn listing’s photos from everyone but its seller and moderators', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const photo = (await other.get(`/api/listings/${listing.id}/photos`)).body.photos[0] as PhotoView;
    await other.get(photo.displayUrl).expect(200);

    await (await signedInAs(app, seller)).post(`/api/listings/${listing.id}/withdraw`).send({}).expect(200);

    await other.get(photo.displayUrl).expect(404);
    await (await browserLikeAgent(app)).get(photo.displayUrl).expect(404);
  });

  it('answers 404 for an address whose key is malformed or unknown', async () => {
    const visitor = await browserLikeAgent(app);
    await visitor.get('/api/photos/not-a-key/thumb.jpg').expect(404);
    await visitor.get(`/api/photos/${'A'.repeat(43)}/display.jpg`).expect(404);
    await visitor.get(`/api/photos/${'A'.repeat(43)}/original.jpg`).expect(404);
  });
});

describe('approval needs a photo', () => {
  it('answers 409 when a moderator approves a listing without photos, and approves it once it has one', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const sellerAgent = await signedInAs(app, seller);
    await sellerAgent.post(`/api/listings/${listing.id}/submit`).send({}).expect(200);
    const mod = await signedInAs(app, moderator);

    const refused = await mod.post(`/api/moderation/listings/${listing.id}/approve`).send({ checklist: TICKED });
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('photos_required');

    await uploadPhoto(sellerAgent, listing.id, await jpegPhoto()).expect(201);
    const approved = await mod.post(`/api/moderation/listings/${listing.id}/approve`).send({ checklist: TICKED });
    expect([approved.status, approved.body.listing.state]).toEqual([200, 'listed']);
  });
});
