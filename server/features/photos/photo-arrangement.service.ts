import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { PhotoOrderInput } from '../../../shared/schemas/listing-photos';
import type { PhotoView } from '../../../shared/types/listings';
import { validationFailed } from '../../http/errors';
import type { ListingActor } from '../listings/listing-actor';
import { lockListing } from '../listings/listing.repository';
import type { ListingPhoto } from './listing-photo.entity';
import { arrangePhotos, photosOfListing } from './listing-photos.repository';
import { deletePhotoObjects } from './photo-objects';
import { photoErrors } from './photo-errors';
import { assertCanChangePhotos } from './photo-rules';
import { presentPhotos } from './photo.presenter';

/** Lock the listing, check the seller may change its photos, and hand its photos (in order) to `work`. */
async function withPhotos<T>(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  work: (m: EntityManager, photos: ListingPhoto[]) => Promise<T>,
): Promise<T> {
  return ctx.transaction(async (m) => {
    const listing = await lockListing(m, id);
    assertCanChangePhotos(actor, listing);
    return work(m, await photosOfListing(m, id));
  });
}

const photoIn = (photos: ListingPhoto[], photoId: number): ListingPhoto => {
  const photo = photos.find((p) => p.id === photoId);
  if (!photo) throw photoErrors.notFound();
  return photo;
};

/** Put the photos in the order given; the list must name each of the listing's photos exactly once. */
export async function reorderPhotos(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  input: PhotoOrderInput,
): Promise<PhotoView[]> {
  const photos = await withPhotos(ctx, actor, id, async (m, current) => {
    const byId = new Map(current.map((p) => [p.id, p]));
    if (input.photoIds.length !== current.length || !input.photoIds.every((pid) => byId.has(pid)))
      throw validationFailed({
        photoIds: 'Name every photo of this listing exactly once; reload the page if photos were added or deleted.',
      });
    return arrangePhotos(
      m,
      input.photoIds.map((pid) => byId.get(pid)!),
    );
  });
  return presentPhotos(photos);
}

/** Make one photo the cover (shown first and in search results); the order stays as it is. */
export async function chooseCover(ctx: AppContext, actor: ListingActor, id: number, photoId: number) {
  const photos = await withPhotos(ctx, actor, id, async (m, current) => {
    const cover = photoIn(current, photoId);
    for (const p of current) p.isCover = p === cover;
    return arrangePhotos(m, current);
  });
  return presentPhotos(photos);
}

/**
 * Delete a photo: the row goes first, in the transaction that renumbers the rest (and makes the first the cover
 * if the cover went); only after it commits are the stored sizes removed, so a failure never leaves a row
 * pointing at deleted objects.
 */
export async function deletePhoto(ctx: AppContext, actor: ListingActor, id: number, photoId: number) {
  const { photos, storageKey } = await withPhotos(ctx, actor, id, async (m, current) => {
    const gone = photoIn(current, photoId);
    await m.remove(gone);
    return {
      photos: await arrangePhotos(
        m,
        current.filter((p) => p !== gone),
      ),
      storageKey: gone.storageKey,
    };
  });
  await deletePhotoObjects(ctx, storageKey);
  return presentPhotos(photos);
}
