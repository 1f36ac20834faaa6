import { randomBytes } from 'node:crypto';
import type { Readable } from 'node:stream';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { PHOTO_VARIANTS, type PhotoVariant } from '../../../shared/listings/photo-limits';
import type { AppContext } from '../../app-context';
import { photoErrors } from './photo-errors';
import type { PhotoVariants } from './photo-variants';

/** A new storage key: 32 random bytes, base64url (43 characters), so no photo's address can be guessed. */
export const newStorageKey = (): string => randomBytes(32).toString('base64url');

/** Where one size of a photo lives in the bucket. */
export const objectKey = (storageKey: string, variant: PhotoVariant): string => `listings/${storageKey}/${variant}.jpg`;

type Storage = Pick<AppContext, 'storage' | 'config' | 'logger'>;

/**
 * Remove both sizes of a photo, best effort: a failure is logged with the keys (for removal by hand) and never
 * thrown, since the caller is already answering for something else.
 */
export async function deletePhotoObjects(ctx: Storage, storageKey: string): Promise<void> {
  const results = await Promise.allSettled(
    PHOTO_VARIANTS.map((v) =>
      ctx.storage.send(new DeleteObjectCommand({ Bucket: ctx.config.s3.bucket, Key: objectKey(storageKey, v) })),
    ),
  );
  const failed = PHOTO_VARIANTS.filter((_, i) => results[i]!.status === 'rejected');
  if (failed.length)
    ctx.logger.warn(
      { keys: failed.map((v) => objectKey(storageKey, v)) },
      'photo objects could not be deleted; remove them by hand',
    );
}

/**
 * Store both sizes. If either put fails (storage down), whatever was stored is removed and 503 is thrown, so an
 * outage never leaves one size without the other.
 */
export async function putPhotoObjects(ctx: Storage, storageKey: string, variants: PhotoVariants): Promise<void> {
  const results = await Promise.allSettled(
    PHOTO_VARIANTS.map((v) =>
      ctx.storage.send(
        new PutObjectCommand({
          Bucket: ctx.config.s3.bucket,
          Key: objectKey(storageKey, v),
          Body: variants[v].bytes,
          ContentType: variants[v].contentType,
        }),
      ),
    ),
  );
  const failure = results.find((r) => r.status === 'rejected');
  if (!failure) return;
  ctx.logger.error({ err: failure.reason }, 'photo storage refused an upload');
  await deletePhotoObjects(ctx, storageKey);
  throw photoErrors.storageDown();
}

export interface StoredPhoto {
  body: Readable;
  contentType: string;
  contentLength?: number;
}

/** One stored size, as a stream: 404 when it is missing, 503 when storage cannot be reached. */
export async function getPhotoObject(ctx: Storage, storageKey: string, variant: PhotoVariant): Promise<StoredPhoto> {
  try {
    const out = await ctx.storage.send(
      new GetObjectCommand({ Bucket: ctx.config.s3.bucket, Key: objectKey(storageKey, variant) }),
    );
    return {
      body: out.Body as Readable,
      contentType: out.ContentType ?? 'image/jpeg',
      contentLength: out.ContentLength,
    };
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (error as Error).name === 'NoSuchKey') throw photoErrors.notFound();
    ctx.logger.error({ err: error }, 'photo storage could not be read');
    throw photoErrors.storageUnreadable();
  }
}
