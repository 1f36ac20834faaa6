import { GetObjectCommand, ListObjectsV2Command } from '@aws-sdk/client-s3';
import type { AppInstance } from '../../server/app';

/** Every object under `listings/` in the photo bucket, sorted. */
export async function photoObjects(app: AppInstance): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await app.ctx.storage.send(
      new ListObjectsV2Command({ Bucket: app.ctx.config.s3.bucket, Prefix: 'listings/', ContinuationToken: token }),
    );
    keys.push(...(page.Contents ?? []).map((o) => o.Key!));
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys.sort();
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
