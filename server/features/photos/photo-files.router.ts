import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { PHOTO_VARIANTS, type PhotoVariant } from '../../../shared/listings/photo-limits';
import { PHOTO_KEY_PATTERN } from '../../../shared/schemas/listing-photos';
import { viewerOf, type ListingActor } from '../listings/listing-actor';
import { canSee } from '../listings/listing.policy';
import { findPhotoByKey } from './listing-photos.repository';
import { getPhotoObject } from './photo-objects';
import { photoErrors } from './photo-errors';

/**
 * Photos of public listings may sit in shared caches; a week bounds how long one lingers after its listing is
 * withdrawn. Photos of hidden listings (drafts, awaiting review) stay in the viewer's own browser only.
 */
const PUBLIC_CACHE = 'public, max-age=604800, immutable';
const PRIVATE_CACHE = 'private, max-age=600';

/** The photo under `key` and whether it is public, or 404 when it does not exist or is hidden from `viewer`. */
async function visiblePhoto(ctx: AppContext, viewer: ListingActor | null, key: string) {
  if (!PHOTO_KEY_PATTERN.test(key)) throw photoErrors.notFound();
  const photo = await findPhotoByKey(ctx.dataSource.manager, key);
  const listing = photo?.listing;
  if (!listing?.owner || !canSee(viewer, listing, listing.owner)) throw photoErrors.notFound();
  return { isPublic: canSee(null, listing, listing.owner) };
}

/**
 * Serves the re-encoded sizes of listing photos, at /api/photos/<key>/thumb.jpg and …/display.jpg, to whoever
 * may see the listing (OWASP File Upload Cheat Sheet: serve files with a fixed type, nosniff and inline
 * disposition, through the application's access checks). The uploaded original is never stored, so never served.
 */
export function photoFilesRouter(ctx: AppContext): Router {
  const router = Router();
  const serve = (variant: PhotoVariant) =>
    router.get(`/:key/${variant}.jpg`, async (req, res) => {
      const key = String(req.params.key);
      const { isPublic } = await visiblePhoto(ctx, viewerOf(req), key);
      const stored = await getPhotoObject(ctx, key, variant);
      res.set({
        'Content-Type': stored.contentType,
        'Cache-Control': isPublic ? PUBLIC_CACHE : PRIVATE_CACHE,
        'X-Content-Type-Options': 'nosniff',
        'Content-Disposition': 'inline',
        ...(stored.contentLength === undefined ? {} : { 'Content-Length': String(stored.contentLength) }),
      });
      try {
        await pipeline(stored.body, res);
      } catch (error) {
        // The viewer went away or storage broke off mid-stream: the status is already sent, so just stop.
        req.log?.warn({ err: error }, 'photo stream ended early');
        res.destroy();
      }
    });
  for (const variant of PHOTO_VARIANTS) serve(variant);
  return router;
}
