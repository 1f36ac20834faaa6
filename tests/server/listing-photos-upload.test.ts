import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import type { User } from '../../server/features/users/user.entity';
import type { PhotoView } from '../../shared/types/listings';
import { buildUser } from '../support/factories';
import { buildListedListing, buildListing } from '../support/listing-factories';
import { hasGpsTag, jpegPhoto, pngPhoto, webpPhoto } from '../support/photo-fixtures';
import { keyOfUrl, photoObjects, storedObject } from '../support/photo-storage';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

const objectsOf = (photo: PhotoView) => {
  const key = keyOfUrl(photo.displayUrl);
  return [`listings/${key}/display.jpg`, `listings/${key}/thumb.jpg`];
};

describe('POST /api/listings/:id/photos', () => {
  it('stores a JPEG as two re-encoded sizes, without its EXIF or GPS position', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const original = await jpegPhoto({ width: 2400, height: 1800 });
    expect(hasGpsTag((await sharp(original).metadata()).exif)).toBe(true);

    const res = await uploadPhoto(await signedInAs(app, seller), listing.id, original);

    expect(res.status).toBe(201);
    const photo = res.body.photo as PhotoView;
    expect(photo).toMatchObject({ position: 1, isCover: true, width: 1600, height: 1200 });
    expect(photo.thumbUrl).toMatch(/^\/api\/photos\/[A-Za-z0-9_-]{43}\/thumb\.jpg$/);
    expect(res.body.photos).toEqual([photo]);
    const objects = objectsOf(photo);
    expect(await photoObjects(app)).toEqual(expect.arrayContaining(objects));
    // OWASP File Upload Cheat Sheet, "Image rewriting": stored files are fresh JPEGs with no metadata carried over.
    for (const key of objects) {
      const stored = await storedObject(app, key);
      const meta = await sharp(stored.bytes).metadata();
      expect(stored.contentType).toBe('image/jpeg');
      expect(meta.format).toBe('jpeg');
      expect(meta.exif).toBeUndefined();
      expect(stored.bytes.includes(Buffer.from('Exif\0\0', 'latin1'))).toBe(false);
      expect(stored.bytes.includes(Buffer.from('Benchwright test camera'))).toBe(false);
      expect(stored.bytes.equals(original)).toBe(false);
    }
    const thumb = await sharp((await storedObject(app, objects[1]!)).bytes).metadata();
    expect([thumb.width, thumb.height]).toEqual([320, 240]);
  });

  it('re-encodes a PNG with transparency and a WebP as JPEGs', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const agent = await signedInAs(app, seller);

    const png = await uploadPhoto(agent, listing.id, await pngPhoto(), 'plan.png', 'image/png');
    const webp = await uploadPhoto(agent, listing.id, await webpPhoto(), 'plan.webp', 'image/webp');

    expect([png.status, webp.status]).toEqual([201, 201]);
    expect(webp.body.photos.map((p: PhotoView) => [p.position, p.isCover])).toEqual([
      [1, true],
      [2, false],
    ]);
    for (const photo of webp.body.photos as PhotoView[])
      for (const key of objectsOf(photo)) {
        const meta = await sharp((await storedObject(app, key)).bytes).metadata();
        expect([meta.format, meta.hasAlpha]).toEqual(['jpeg', false]);
      }
  });

  it('judges by content alone: a real JPEG sent as "notes.txt", text/plain, is accepted', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const res = await uploadPhoto(
      await signedInAs(app, seller),
      listing.id,
      await jpegPhoto(),
      'notes.txt',
      'text/plain',
    );
    expect(res.status).toBe(201);
  });

  it('turns a photo upright by its EXIF orientation before the tag is dropped', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    const sideways = await jpegPhoto({ width: 800, height: 600, orientation: 6 });

    const res = await uploadPhoto(await signedInAs(app, seller), listing.id, sideways);

    expect(res.status).toBe(201);
    expect(res.body.photo).toMatchObject({ width: 600, height: 800 });
  });

  it('sends a listed listing back to review when a photo is added, recording why', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);

    const res = await uploadPhoto(await signedInAs(app, seller), listing.id, await jpegPhoto());

    expect(res.status).toBe(201);
    const own = await (await signedInAs(app, seller)).get(`/api/listings/${listing.id}`);
    expect(own.body.listing.state).toBe('awaiting_review');
    const revise = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findOneByOrFail({ action: 'listing.revise', targetId: String(listing.id) });
    expect(revise.detail).toEqual({ from: 'listed', to: 'awaiting_review', photoAdded: res.body.photo.id });
  });
});

describe('GET /api/photos/:key/(thumb|display).jpg', () => {
  it('serves exactly the stored bytes with a fixed type, nosniff and inline disposition', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const photo = (await (await browserLikeAgent(app)).get(`/api/listings/${listing.id}`)).body.listing
      .photos[0] as PhotoView;
    const stored = await storedObject(app, objectsOf(photo)[0]!);

    const res = await (
      await browserLikeAgent(app)
    )
      .get(photo.displayUrl)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });

    expect(res.status).toBe(200);
    expect((res.body as Buffer).equals(stored.bytes)).toBe(true);
    // OWASP File Upload Cheat Sheet: served with a set Content-Type, nosniff, and never as an attachment to run.
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-disposition']).toBe('inline');
    expect(res.headers['cache-control']).toBe('public, max-age=604800, immutable');
  });

  it('puts the cover first in the listing view and its thumbnail on the search result', async () => {
    const listing = await buildListedListing(app.ctx, seller, moderator, {
      title: 'EM gauge fiddle yard cassette board',
    });
    const agent = await signedInAs(app, seller);
    await uploadPhoto(agent, listing.id, await jpegPhoto());
    const photos = (await agent.get(`/api/listings/${listing.id}/photos`)).body.photos as PhotoView[];
    await agent.post(`/api/listings/${listing.id}/photos/${photos[1]!.id}/cover`).send({}).expect(200);
    await (await signedInAs(app, moderator)).post(`/api/moderation/listings/${listing.id}/approve`).send({
      checklist: { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true },
    });

    const view = (await (await browserLikeAgent(app)).get(`/api/listings/${listing.id}`)).body.listing;
    const search = await (await browserLikeAgent(app)).get('/api/listings').query({ q: 'cassette' });

    expect(view.photos.map((p: PhotoView) => p.id)).toEqual([photos[1]!.id, photos[0]!.id]);
    const item = search.body.items.find((i: { id: number }) => i.id === listing.id);
    expect(item.coverThumbUrl).toBe(photos[1]!.thumbUrl);
  });
});
