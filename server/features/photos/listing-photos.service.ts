import type { AppContext } from '../../app-context';
import type { PhotoUploadResult, PhotoView } from '../../../shared/types/listings';
import type { ListingActor } from '../listings/listing-actor';
import { moveListing } from '../listings/listing-lifecycle';
import { assertCanSee } from '../listings/listing.policy';
import { findListingWithOwner, lockListing } from '../listings/listing.repository';
import { ListingPhoto } from './listing-photo.entity';
import { photosOfListing } from './listing-photos.repository';
import { deletePhotoObjects, newStorageKey, putPhotoObjects } from './photo-objects';
import { assertCanChangePhotos, assertRoomForPhoto } from './photo-rules';
import { presentPhoto, presentPhotos } from './photo.presenter';
import { makePhotoVariants } from './photo-variants';

/** A listing's photos in the seller's order, for anyone who may see the listing. */
export async function listPhotos(ctx: AppContext, viewer: ListingActor | null, id: number): Promise<PhotoView[]> {
  const m = ctx.dataSource.manager;
  const listing = await findListingWithOwner(m, id);
  assertCanSee(viewer, listing, listing.owner);
  return presentPhotos(await photosOfListing(m, id));
}

/**
 * Refuse an upload that cannot succeed before its body is read: only the seller, only while the listing may
 * change, and only below the photo limit (OWASP File Upload Cheat Sheet: only authorised users upload). The
 * transaction in `addListingPhoto` checks all of it again under the listing's lock.
 */
export async function checkPhotoUpload(ctx: AppContext, actor: ListingActor, id: number): Promise<void> {
  const m = ctx.dataSource.manager;
  const listing = await findListingWithOwner(m, id);
  assertCanChangePhotos(actor, listing);
  await assertRoomForPhoto(m, id);
}

/**
 * Add one photo. In order: check and re-encode in memory; store both sizes (an outage answers 503 and stores
 * nothing); then, in one transaction under the listing's lock, check again and insert the row, and send a listed
 * listing back to review. If the transaction fails, both stored sizes are deleted, so no object outlives a
 * failed upload and no row points at a missing object.
 */
export async function addListingPhoto(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  upload: Buffer,
): Promise<PhotoUploadResult> {
  const variants = await makePhotoVariants(upload);
  const storageKey = newStorageKey();
  await putPhotoObjects(ctx, storageKey, variants);
  let photoId: number;
  try {
    photoId = await ctx.transaction(async (m) => {
      const listing = await lockListing(m, id);
      assertCanChangePhotos(actor, listing);
      const count = await assertRoomForPhoto(m, id);
      const photo = await m.save(
        m.create(ListingPhoto, {
          listingId: id,
          position: count + 1,
          isCover: count === 0,
          storageKey,
          width: variants.display.width,
          height: variants.display.height,
          thumbBytes: variants.thumb.bytes.length,
          displayBytes: variants.display.bytes.length,
        }),
      );
      if (listing.state === 'listed')
        await moveListing(m, listing, 'revise', { id: actor.id, ip: actor.ip, as: 'seller' }, { photoAdded: photo.id });
      return photo.id;
    });
  } catch (error) {
    await deletePhotoObjects(ctx, storageKey);
    throw error;
  }
  const photos = await photosOfListing(ctx.dataSource.manager, id);
  return { photo: presentPhoto(photos.find((p) => p.id === photoId)!), photos: presentPhotos(photos) };
}
