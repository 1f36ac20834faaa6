import { z } from 'zod';
import { PHOTO_LIMITS } from '../listings/photo-limits';

const rowId = (what: string) =>
  z.coerce
    .number({ error: `Unknown ${what}.` })
    .int({ error: `Unknown ${what}.` })
    .positive({ error: `Unknown ${what}.` })
    .max(4_294_967_295, { error: `Unknown ${what}.` });

/** Route parameters `:id/photos/:photoId`. */
export const listingPhotoParamSchema = z.strictObject({ id: rowId('listing'), photoId: rowId('photo') });
export type ListingPhotoParam = z.infer<typeof listingPhotoParamSchema>;

/** PUT /api/listings/:id/photos/order: every photo of the listing, once each, in the new order. */
export const photoOrderSchema = z.strictObject({
  photoIds: z
    .array(rowId('photo'), { error: 'Send photoIds: the listing’s photo ids in the order to show them.' })
    .min(1, { error: 'Send photoIds: the listing’s photo ids in the order to show them.' })
    .max(PHOTO_LIMITS.perListing, { error: `A listing has at most ${PHOTO_LIMITS.perListing} photos.` })
    .refine((ids) => new Set(ids).size === ids.length, { error: 'Name each photo once.' }),
});
export type PhotoOrderInput = z.infer<typeof photoOrderSchema>;

/** A photo's storage key as it appears in its address: 32 random bytes, base64url. */
export const PHOTO_KEY_PATTERN = /^[A-Za-z0-9_-]{43}$/;
