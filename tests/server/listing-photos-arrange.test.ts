import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import type { PhotoView } from '../../shared/types/listings';
import { buildUser } from '../support/factories';
import { addPhoto, buildListing } from '../support/listing-factories';
import { keyOfUrl, photoObjects } from '../support/photo-storage';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
let agent: TestAgent;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  agent = await signedInAs(app, seller);
});
afterAll(() => app.close());

/** A draft with `n` photos, and those photos in order. */
async function listingWithPhotos(n: number): Promise<{ listing: Listing; photos: PhotoView[] }> {
  const listing = await buildListing(app.ctx.dataSource, seller);
  let photos: PhotoView[] = [];
  for (let i = 0; i < n; i += 1) photos = (await addPhoto(app.ctx, listing, seller)).photos;
  return { listing, photos };
}

const summary = (photos: PhotoView[]) => photos.map((p) => [p.id, p.position, p.isCover]);

describe('PUT /api/listings/:id/photos/order', () => {
  it('puts the photos in the order given, keeping the cover', async () => {
    const { listing, photos } = await listingWithPhotos(3);
    const [a, b, c] = photos.map((p) => p.id) as [number, number, number];

    const res = await agent.put(`/api/listings/${listing.id}/photos/order`).send({ photoIds: [c, a, b] });

    expect(res.status).toBe(200);
    expect(summary(res.body.photos)).toEqual([
      [c, 1, false],
      [a, 2, true],
      [b, 3, false],
    ]);
    const listed = await agent.get(`/api/listings/${listing.id}/photos`);
    expect(summary(listed.body.photos)).toEqual(summary(res.body.photos));
  });

  it('answers 422 unless the list names each of the listing’s photos exactly once', async () => {
    const { listing, photos } = await listingWithPhotos(2);
    const other = await listingWithPhotos(1);
    const [a, b] = photos.map((p) => p.id) as [number, number];
    const url = `/api/listings/${listing.id}/photos/order`;

    for (const photoIds of [[a], [a, b, other.photos[0]!.id], [a, other.photos[0]!.id], [a, a]]) {
      const res = await agent.put(url).send({ photoIds });
      expect(res.status, JSON.stringify(photoIds)).toBe(422);
      expect(Object.keys(res.body.error.fields)).toEqual(['photoIds']);
    }
    expect(summary((await agent.get(`/api/listings/${listing.id}/photos`)).body.photos)).toEqual(summary(photos));
  });
});

describe('POST /api/listings/:id/photos/:photoId/cover', () => {
  it('makes the chosen photo the only cover without changing the order', async () => {
    const { listing, photos } = await listingWithPhotos(3);

    const res = await agent.post(`/api/listings/${listing.id}/photos/${photos[2]!.id}/cover`).send({});

    expect(res.status).toBe(200);
    expect(res.body.photos.map((p: PhotoView) => p.isCover)).toEqual([false, false, true]);
  });

  it('answers 404 for a photo of another listing', async () => {
    const { listing } = await listingWithPhotos(1);
    const other = await listingWithPhotos(1);
    const res = await agent.post(`/api/listings/${listing.id}/photos/${other.photos[0]!.id}/cover`).send({});
    expect([res.status, res.body.error.message]).toEqual([404, 'That photo was not found.']);
  });
});

describe('DELETE /api/listings/:id/photos/:photoId', () => {
  it('deletes the row and both stored sizes, renumbers the rest and moves the cover to the first', async () => {
    const { listing, photos } = await listingWithPhotos(3);
    const [cover, second, third] = photos as [PhotoView, PhotoView, PhotoView];
    const key = keyOfUrl(cover.displayUrl);

    const res = await agent.delete(`/api/listings/${listing.id}/photos/${cover.id}`);

    expect(res.status).toBe(200);
    expect(summary(res.body.photos)).toEqual([
      [second.id, 1, true],
      [third.id, 2, false],
    ]);
    expect((await photoObjects(app)).filter((k) => k.includes(key))).toEqual([]);
    await agent.get(cover.displayUrl).expect(404);
    await agent.get(second.displayUrl).expect(200);
  });

  it('answers 409 once the listing is reserved: the buyer keeps the photos they saw', async () => {
    const { listing, photos } = await listingWithPhotos(1);
    await app.ctx.dataSource.query("UPDATE listings SET state = 'reserved' WHERE id = ?", [listing.id]);

    const res = await agent.delete(`/api/listings/${listing.id}/photos/${photos[0]!.id}`);

    expect(res.status).toBe(409);
    expect((await agent.get(`/api/listings/${listing.id}/photos`)).body.photos).toHaveLength(1);
  });
});
