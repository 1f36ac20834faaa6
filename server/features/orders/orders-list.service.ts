import type { EntityManager } from 'typeorm';
import { ORDER_STATE_LABELS } from '../../../shared/orders/states';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { OrderSide } from '../../../shared/schemas/order-aftercare';
import type { OrderSummary } from '../../../shared/types/order-aftercare';
import type { Page } from '../../../shared/types/user';
import { Order } from './order.entity';

export const ORDERS_PAGE_SIZE = 20;

/** An order with its listing and both people loaded, as one line of a list. */
export function summarise(o: Order, side: OrderSide): OrderSummary {
  return {
    id: o.id,
    kind: o.kind,
    state: o.state,
    stateLabel: ORDER_STATE_LABELS[o.state],
    listingTitle: o.listing?.title ?? 'A listing no longer shown',
    otherParty: (side === 'buying' ? o.seller?.displayName : o.buyer?.displayName) ?? 'A member',
    currency: o.currency as Currency,
    amountMinor: side === 'buying' ? o.totalMinor : o.payoutMinor,
    createdAt: o.createdAt.toISOString(),
    stateChangedAt: o.stateChangedAt.toISOString(),
  };
}

/** A person's purchases or sales, newest first. */
export async function listOrders(
  m: EntityManager,
  userId: number,
  side: OrderSide,
  page: number,
  pageSize = ORDERS_PAGE_SIZE,
): Promise<Page<OrderSummary>> {
  const [rows, total] = await m.getRepository(Order).findAndCount({
    where: side === 'buying' ? { buyerId: userId } : { sellerId: userId },
    relations: { listing: true, buyer: true, seller: true },
    order: { createdAt: 'DESC', id: 'DESC' },
    skip: (page - 1) * pageSize,
    take: pageSize,
  });
  return { items: rows.map((o) => summarise(o, side)), total, page, pageSize };
}
