import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { notFound } from '../../http/errors';
import { PUBLIC_LISTING_STATES } from '../../../shared/listings/states';
import type { SubjectThread } from '../../../shared/types/conversations';
import type { ListingActor } from '../listings/listing-actor';
import type { Listing } from '../listings/listing.entity';
import { canSee, isModerator } from '../listings/listing.policy';
import { findListingWithOwner } from '../listings/listing.repository';
import { photosOfListing } from '../photos/listing-photos.repository';
import { presentGallery } from '../photos/photo.presenter';
import { Order } from '../orders/order.entity';
import type { User } from '../users/user.entity';
import { findUserById } from '../users/user.repository';
import { assertNotOwnListing, problemRaised } from './conversation.policy';
import { findConversation, listingThreadKey, orderThreadKey } from './conversation.repository';
import { presentThread } from './conversation-reading.service';

/** The member's own question thread about a listing; 404 for a listing hidden from them, 409 for their own. */
export async function threadAboutListing(
  ctx: AppContext,
  actor: ListingActor,
  listingId: number,
): Promise<SubjectThread> {
  const m = ctx.dataSource.manager;
  const listing = await findListingWithOwner(m, listingId);
  assertNotOwnListing(actor, listing.ownerId);
  const thread = await findConversation(m, { threadKey: listingThreadKey(listing.id, actor.id) });
  const shown = PUBLIC_LISTING_STATES.includes(listing.state) && listing.owner.suspendedAt === null;
  if (!thread && !shown) throw notFound('That listing');
  const cover = await coverFor(m, actor, listing);
  return {
    thread: thread ? await presentThread(m, actor, thread) : null,
    about: {
      title: listing.title,
      listingId: listing.id,
      orderId: null,
      coverThumbUrl: cover,
      other: { id: listing.owner.id, displayName: listing.owner.displayName },
      you: 'buyer',
    },
  };
}

/**
 * The thread about an order, for its buyer and seller, and for moderators once a problem has been raised on it
 * (they read, and `thread` stays null if nobody has written). Anyone else gets 404.
 */
export async function threadAboutOrder(ctx: AppContext, actor: ListingActor, orderId: number): Promise<SubjectThread> {
  const m = ctx.dataSource.manager;
  const order = await m.findOneBy(Order, { id: orderId });
  const party = order && (order.buyerId === actor.id || order.sellerId === actor.id);
  if (!order || !(party || (isModerator(actor) && problemRaised(order)))) throw notFound('That order');
  const [listing, thread] = await Promise.all([
    findListingWithOwner(m, order.listingId),
    findConversation(m, { threadKey: orderThreadKey(order.id) }),
  ]);
  const you = order.buyerId === actor.id ? 'buyer' : order.sellerId === actor.id ? 'seller' : 'moderator';
  const otherId = you === 'buyer' ? order.sellerId : order.buyerId;
  const other = await findUserById(m, otherId);
  return {
    thread: thread ? await presentThread(m, actor, thread) : null,
    about: {
      title: listing.title,
      listingId: listing.id,
      orderId: order.id,
      coverThumbUrl: await coverFor(m, actor, listing),
      other: { id: otherId, displayName: other?.displayName ?? '' },
      you,
    },
  };
}

/** The listing's cover thumbnail while the viewer may see the listing (the photo route would refuse it otherwise). */
async function coverFor(m: EntityManager, viewer: ListingActor, listing: Listing & { owner: User }) {
  if (!canSee(viewer, listing, listing.owner)) return null;
  return presentGallery(await photosOfListing(m, listing.id))[0]?.thumbUrl ?? null;
}
