import { GetObjectCommand, ListObjectsCommand } from '@aws-sdk/client-s3';
import type { AppInstance } from '../../server/app';

/**
 * Every object under `listings/` in the photo bucket, sorted. Pages by the last key seen (ListObjects, version 1):
 * the local S3 server signs version 2 continuation tokens with DES, which Node's OpenSSL 3 refuses, so a bucket of
 * more than 1,000 objects could not be listed to the end that way.
 */
export async function photoObjects(app: AppInstance): Promise<string[]> {
  const keys: string[] = [];
  let marker: string | undefined;
  for (;;) {
    const page = await app.ctx.storage.send(
      new ListObjectsCommand({ Bucket: app.ctx.config.s3.bucket, Prefix: 'listings/', Marker: marker }),
    );
    const batch = (page.Contents ?? []).map((o) => o.Key!);
    keys.push(...batch);
    if (!page.IsTruncated || batch.length === 0) return keys.sort();
    marker = batch[batch.length - 1];
  }
}

/** One stored object's bytes and type. */
export async function storedObject(app: AppInstance, key: string): Promise<{ bytes: Buffer; contentType?: string }> {
  const out = await app.ctx.storage.send(new GetObjectCommand({ Bucket: app.ctx.config.s3.bucket, Key: key }));
  return { bytes: Buffer.from(await out.Body!.transformToByteArray()), contentType: out.ContentType };
}

/** Rows in listing_photos, all listings. */
export async function photoRows(app: AppInstance): Promise<number> {
  const [{ n }] = (await app.ctx.dataSource.query('SELECT COUNT(*) AS n FROM listing_photos')) as [{ n: string }];
  return Number(n);
}

/** Everything stored about photos: rows and objects, to compare before and after a refused upload. */
export async function photoState(app: AppInstance) {
  return { rows: await photoRows(app), objects: await photoObjects(app) };
}

/** The storage key in a photo address `/api/photos/<key>/<size>.jpg`. */
export const keyOfUrl = (url: string): string => url.split('/')[3]!;
