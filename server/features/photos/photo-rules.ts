import type { EntityManager } from 'typeorm';
import { EDITABLE_LISTING_STATES } from '../../../shared/listings/states';
import { PHOTO_LIMITS } from '../../../shared/listings/photo-limits';
import { conflict } from '../../http/errors';
import type { User } from '../users/user.entity';
import type { ListingActor } from '../listings/listing-actor';
import { refusedEdit } from '../listings/listing-lifecycle';
import type { Listing } from '../listings/listing.entity';
import { assertSeller } from '../listings/listing.policy';
import { ListingPhoto } from './listing-photo.entity';
import { photoErrors } from './photo-errors';

/**
 * Only the seller changes a listing's photos (others: 404 when the listing is hidden from them, else 403), and
 * only while its fields may change: a reserved, sold or withdrawn listing keeps the photos its buyer saw.
 */
export function assertCanChangePhotos(actor: ListingActor, listing: Listing & { owner: User }): void {
  assertSeller(actor, listing, listing.owner);
  if (!EDITABLE_LISTING_STATES.includes(listing.state)) throw refusedEdit(listing.state);
}

export const countPhotos = (m: EntityManager, listingId: number): Promise<number> =>
  m.getRepository(ListingPhoto).countBy({ listingId });

/** How many photos the listing has; 409 when that is already the most allowed. */
export async function assertRoomForPhoto(m: EntityManager, listingId: number): Promise<number> {
  const count = await countPhotos(m, listingId);
  if (count >= PHOTO_LIMITS.perListing) throw photoErrors.limit();
  return count;
}

/** A listing is approved only with a photo: the checklist asks whether the photos show the item. */
export async function assertHasPhotos(m: EntityManager, listingId: number): Promise<void> {
  if ((await countPhotos(m, listingId)) === 0)
    throw conflict(
      'photos_required',
      'This listing has no photos, so it cannot be approved. Send it back asking for photos of the item.',
    );
}
