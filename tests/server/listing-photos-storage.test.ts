import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { PHOTO_MESSAGES } from '../../shared/listings/photo-limits';
import { buildUser } from '../support/factories';
import { addPhoto, buildListing } from '../support/listing-factories';
import { jpegPhoto } from '../support/photo-fixtures';
import { photoObjects, photoRows, photoState } from '../support/photo-storage';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { startStorageProxy, type ProxyDecision } from '../support/storage-proxy';
import { closedPort } from '../support/tcp-proxy';
import { startTestApp } from '../support/test-app';
import { testConfig } from '../support/test-env';

/**
 * Failures part-way through an upload leave nothing half-made: no row without both stored sizes, no stored size
 * without a row. Storage failures are staged with a closed port or a proxy in front of the test S3 server; the
 * shared services are never stopped.
 */
let app: AppInstance;
let seller: User;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
});
afterAll(() => app.close());

const s3 = () => testConfig().s3;

/** An app whose storage goes through a proxy that `decide` controls. */
async function appBehindProxy(decide: Parameters<typeof startStorageProxy>[1]) {
  const proxy = await startStorageProxy(s3().endpoint!, decide);
  const proxied = await startTestApp({ s3: { ...s3(), endpoint: proxy.endpoint } });
  return {
    app: proxied,
    close: async () => {
      await proxied.close();
      await proxy.close();
    },
  };
}

describe('a storage outage', () => {
  it('answers 503 with a clear message and stores no row and no object', async () => {
    const down = await startTestApp({ s3: { ...s3(), endpoint: `http://127.0.0.1:${await closedPort()}` } });
    try {
      const listing = await buildListing(app.ctx.dataSource, seller);
      const before = await photoState(app);

      const res = await uploadPhoto(await signedInAs(down, seller), listing.id, await jpegPhoto());

      expect(res.status).toBe(503);
      expect(res.body.error).toEqual({
        code: 'storage_unavailable',
        message: PHOTO_MESSAGES.storageDown,
        retryAfterSeconds: 30,
      });
      expect(res.headers['retry-after']).toBe('30');
      expect(await photoState(app)).toEqual(before);
    } finally {
      await down.close();
    }
  });

  it('removes the size already stored when storing the other one fails', async () => {
    const seen: string[] = [];
    const staged = await appBehindProxy((req): ProxyDecision => {
      const path = new URL(req.url!, 'http://storage').pathname;
      seen.push(`${req.method} ${path}`);
      return req.method === 'PUT' && path.endsWith('/display.jpg') ? 'fail' : 'pass';
    });
    try {
      const listing = await buildListing(app.ctx.dataSource, seller);
      const before = await photoState(app);

      const res = await uploadPhoto(await signedInAs(staged.app, seller), listing.id, await jpegPhoto());

      expect(res.status).toBe(503);
      const thumb = seen.find((r) => r.startsWith('PUT') && r.endsWith('/thumb.jpg'))!.slice(4);
      expect(seen).toContain(`DELETE ${thumb}`);
      expect(await photoState(app)).toEqual(before);
    } finally {
      await staged.close();
    }
  });
});

describe('a database refusal after both sizes are stored', () => {
  it('deletes both stored sizes when the listing is reserved while its photo is being stored', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    let reserved = false;
    // A buyer's payment reserves the listing between the checks before the upload and the row's transaction.
    const staged = await appBehindProxy(async (req): Promise<ProxyDecision> => {
      if (req.method === 'PUT' && !reserved) {
        reserved = true;
        await app.ctx.dataSource.query("UPDATE listings SET state = 'reserved' WHERE id = ?", [listing.id]);
      }
      return 'pass';
    });
    try {
      const before = await photoState(app);

      const res = await uploadPhoto(await signedInAs(staged.app, seller), listing.id, await jpegPhoto());

      expect(reserved).toBe(true);
      expect(res.status).toBe(409);
      expect(res.body.error.message).toBe('This listing is reserved, so it can no longer be changed.');
      expect(await photoState(app)).toEqual(before);
    } finally {
      await staged.close();
    }
  });

  it('keeps the limit of 12 when two uploads race for the last place, leaving no orphan objects', async () => {
    const listing = await buildListing(app.ctx.dataSource, seller);
    for (let i = 0; i < 11; i += 1) await addPhoto(app.ctx, listing, seller);
    const objectsBefore = (await photoObjects(app)).length;
    const rowsBefore = await photoRows(app);
    const [a, b] = [await signedInAs(app, seller), await signedInAs(app, seller)];
    const photo = await jpegPhoto();

    const answers = await Promise.all([uploadPhoto(a, listing.id, photo), uploadPhoto(b, listing.id, photo)]);

    expect(answers.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await photoRows(app)).toBe(rowsBefore + 1);
    expect((await photoObjects(app)).length).toBe(objectsBefore + 2);
    const [{ n }] = await app.ctx.dataSource.query('SELECT COUNT(*) AS n FROM listing_photos WHERE listing_id = ?', [
      listing.id,
    ]);
    expect(Number(n)).toBe(12);
  });
});
