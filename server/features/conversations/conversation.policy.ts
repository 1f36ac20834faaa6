import { conflict, forbidden, notFound } from '../../http/errors';
import type { ConversationRole } from '../../../shared/types/conversations';
import type { ListingActor } from '../listings/listing-actor';
import { isModerator } from '../listings/listing.policy';
import type { Order } from '../orders/order.entity';
import type { Conversation } from './conversation.entity';

/** The side `viewer` takes in the thread, or null when they are not one of its two members. */
export function sideOf(conversation: Conversation, viewerId: number): 'buyer' | 'seller' | null {
  if (conversation.buyerId === viewerId) return 'buyer';
  if (conversation.sellerId === viewerId) return 'seller';
  return null;
}

/**
 * Whether an order has ever had a problem raised: a moderator settling it reads the order's thread as evidence.
 * `problem_raised_at` stays set after the problem is settled, so the thread stays readable for the record.
 */
export const problemRaised = (order: Pick<Order, 'state' | 'problemRaisedAt'>): boolean =>
  order.problemRaisedAt !== null || order.state === 'problem_raised';

/**
 * How `viewer` may read a thread: as its buyer or seller, or as a moderator when it is an order's thread and that
 * order has had a problem raised. Anyone else, moderators included for listing threads, gets 404: nobody learns
 * that another member's thread exists.
 */
export function assertCanRead(
  viewer: ListingActor,
  conversation: Conversation,
  order: Pick<Order, 'state' | 'problemRaisedAt'> | null,
): ConversationRole {
  const side = sideOf(conversation, viewer.id);
  if (side) return side;
  if (isModerator(viewer) && conversation.kind === 'order' && order && problemRaised(order)) return 'moderator';
  throw notFound('That conversation');
}

/** Only the two members write in a thread; a moderator reading a problem's thread does not. */
export function assertCanWrite(role: ConversationRole): asserts role is 'buyer' | 'seller' {
  if (role === 'moderator') throw forbidden('Moderators can read this conversation but not write in it.');
}

/** A seller is asked by buyers; they do not open a question thread on their own listing. */
export function assertNotOwnListing(viewer: ListingActor, sellerId: number): void {
  if (viewer.id === sellerId)
    throw conflict('own_listing', 'This is your own listing. Questions from buyers appear under Messages.');
}
