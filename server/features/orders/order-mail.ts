import type { EntityManager } from 'typeorm';
import { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';
import type { Order } from './order.entity';

/** Money in words for e-mail: British format, e.g. "£253.00". */
export const formatMoney = (minor: number, currency: string) =>
  new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(minor / 100);

/** The people and the listing an order's e-mails name. */
export interface OrderParties {
  buyer: User;
  seller: User;
  title: string;
  /** The order page on the site. */
  url: string;
}

export async function orderParties(m: EntityManager, order: Order, appOrigin: string): Promise<OrderParties> {
  const buyer = await m.findOneByOrFail(User, { id: order.buyerId });
  const seller = await m.findOneByOrFail(User, { id: order.sellerId });
  const listing = await m.findOneBy(Listing, { id: order.listingId });
  return { buyer, seller, title: listing?.title ?? `order ${order.id}`, url: `${appOrigin}/orders/${order.id}` };
}
