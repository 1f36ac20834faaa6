import { hasAnyRole } from '../../../shared/roles';
import { PUBLIC_LISTING_STATES } from '../../../shared/listings/states';
import { forbidden, notFound } from '../../http/errors';
import type { User } from '../users/user.entity';
import type { ListingActor } from './listing-actor';
import type { Listing } from './listing.entity';

/** Moderators (and administrators) see and decide on every listing. */
export const isModerator = (viewer: Pick<ListingActor, 'role'> | null): boolean =>
  viewer !== null && hasAnyRole(viewer.role, ['moderator']);

export const isSeller = (viewer: Pick<ListingActor, 'id'> | null, listing: Listing): boolean =>
  viewer !== null && viewer.id === listing.ownerId;

/** Only builders offer build services. */
export const canOfferServices = (viewer: Pick<ListingActor, 'role'>): boolean => hasAnyRole(viewer.role, ['builder']);

/**
 * Everyone sees listed, reserved and sold listings of sellers in good standing; the seller and moderators see the
 * rest too. Nobody else learns that a hidden listing exists: they get 404, not 403.
 */
export function canSee(viewer: ListingActor | null, listing: Listing, owner: Pick<User, 'suspendedAt'>): boolean {
  if (isSeller(viewer, listing) || isModerator(viewer)) return true;
  return PUBLIC_LISTING_STATES.includes(listing.state) && owner.suspendedAt === null;
}

export function assertCanSee(viewer: ListingActor | null, listing: Listing, owner: Pick<User, 'suspendedAt'>): void {
  if (!canSee(viewer, listing, owner)) throw notFound('That listing');
}

/** Only the seller changes a listing: 403 when the caller may see it, 404 when they may not. */
export function assertSeller(viewer: ListingActor, listing: Listing, owner: Pick<User, 'suspendedAt'>): void {
  assertCanSee(viewer, listing, owner);
  if (!isSeller(viewer, listing)) throw forbidden('Only the seller can change this listing.');
}

export function assertCanOfferServices(viewer: ListingActor): void {
  if (!canOfferServices(viewer))
    throw forbidden('Only builders can list build services. Apply for a builder profile first.');
}
