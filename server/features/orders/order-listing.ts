import type { EntityManager } from 'typeorm';
import { moveListing } from '../listings/listing-lifecycle';
import { Listing } from '../listings/listing.entity';
import type { OrderActor } from './order-lifecycle';
import type { Order } from './order.entity';

export type OrderListingMove = 'sell' | 'release' | 'retire';

/**
 * Move a module order's listing along with the order: sold once receipt is settled, listed again when an order is
 * cancelled before hand-over, withdrawn when a refund comes after hand-over (the module's whereabouts are then
 * the parties' business, not a buyer's). A listing that is no longer reserved (a moderator took it down) is left.
 * Build orders come from a service listing that is never reserved, so nothing moves.
 */
export async function moveOrderListing(
  m: EntityManager,
  order: Order,
  move: OrderListingMove,
  actor: OrderActor,
): Promise<void> {
  if (order.kind !== 'module') return;
  const listing = await m
    .getRepository(Listing)
    .findOne({ where: { id: order.listingId }, lock: { mode: 'pessimistic_write' } });
  if (!listing || listing.state !== 'reserved') return;
  await moveListing(m, listing, move, { id: actor.id, ip: actor.ip ?? null, as: 'orders' }, { orderId: order.id });
}

/** After a full refund: back on sale if the seller still has it, else withdrawn. */
export const afterRefund = (order: Order): OrderListingMove => (order.handedOverAt ? 'retire' : 'release');
