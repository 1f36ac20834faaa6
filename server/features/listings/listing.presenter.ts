import type { DecisionView, ListingSearchItem, ListingView, OwnListingView } from '../../../shared/types/listings';
import type { TownView } from '../../../shared/types/towns';
import type { ListingPhoto } from '../photos/listing-photo.entity';
import { presentGallery } from '../photos/photo.presenter';
import { ratingOf } from '../reviews/review.presenter';
import { presentTown, type Gazetteer } from '../towns/gazetteer';
import type { User } from '../users/user.entity';
import type { ListingDecision } from './listing-decision.entity';
import type { Listing } from './listing.entity';
import { moduleDetailsOf, serviceDetailsOf } from './listing-mapping';

type WithOwner = Listing & { owner?: User };

function townOf(l: Listing, towns: Gazetteer): TownView {
  const town = towns.find(l.townId);
  if (town) return presentTown(town);
  return { id: l.townId, name: 'Unknown town', adminArea: '', country: 'GB', lat: l.latitude, lon: l.longitude };
}

/** A listing as anyone allowed to see it sees it, with its photos. Never the seller's e-mail or moderation notes. */
export function presentListing(
  l: WithOwner,
  towns: Gazetteer,
  photos: readonly ListingPhoto[],
  distanceKm?: number,
): ListingView {
  return {
    id: l.id,
    kind: l.kind,
    state: l.state,
    title: l.title,
    description: l.description,
    currency: l.currency,
    seller: { id: l.ownerId, displayName: l.owner?.displayName ?? '' },
    sellerRating: ratingOf(l.owner),
    town: townOf(l, towns),
    position: { lat: l.latitude, lon: l.longitude },
    module: moduleDetailsOf(l),
    service: serviceDetailsOf(l),
    photos: presentGallery(photos),
    publishedAt: l.publishedAt?.toISOString() ?? null,
    updatedAt: l.updatedAt.toISOString(),
    ...(distanceKm === undefined ? {} : { distanceKm: Math.round(distanceKm * 10) / 10 }),
  };
}

/** A search result: the listing and its cover's thumbnail. */
export function presentSearchItem(
  l: WithOwner,
  towns: Gazetteer,
  photos: readonly ListingPhoto[],
  distanceKm?: number,
): ListingSearchItem {
  const view = presentListing(l, towns, photos, distanceKm);
  return { ...view, coverThumbUrl: view.photos[0]?.thumbUrl ?? null };
}

/** A decision; the moderator is named, and the checklist shown, only to moderators. */
export function presentDecision(d: ListingDecision, forModerator: boolean): DecisionView {
  return {
    decision: d.decision,
    reasons: d.reasons,
    note: d.note,
    at: d.createdAt.toISOString(),
    ...(forModerator
      ? {
          moderator: d.moderator ? { id: d.moderator.id, displayName: d.moderator.displayName } : undefined,
          checklist: d.checklist,
          sellerAction: d.sellerAction,
        }
      : {}),
  };
}

/** A listing as its seller or a moderator sees it: with its dates and the last decision. */
export function presentOwnListing(
  l: WithOwner,
  towns: Gazetteer,
  photos: readonly ListingPhoto[],
  lastDecision: ListingDecision | undefined,
  forModerator = false,
): OwnListingView {
  return {
    ...presentListing(l, towns, photos),
    createdAt: l.createdAt.toISOString(),
    submittedAt: l.submittedAt?.toISOString() ?? null,
    stateChangedAt: l.stateChangedAt.toISOString(),
    lastDecision: lastDecision ? presentDecision(lastDecision, forModerator) : null,
  };
}
