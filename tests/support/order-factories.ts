import type { DataSource } from 'typeorm';
import { orderAmounts } from '../../shared/orders/money';
import type { OrderState } from '../../shared/orders/states';
import { DEFAULT_BUYER_FEE_BPS, DEFAULT_COMMISSION_BPS } from '../../shared/orders/timing';
import type { Listing } from '../../server/features/listings/listing.entity';
import { Order } from '../../server/features/orders/order.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildListing } from './listing-factories';

export interface OrderOverrides {
  state?: OrderState;
  listing?: Listing;
  itemMinor?: number;
  problemRaisedAt?: Date | null;
}

/**
 * Insert a module order between `buyer` and `seller` directly, in any state (arrange step): no payment is made, so
 * tests of what happens after payout need not drive the whole purchase. The amounts follow the default fee rates.
 */
export async function buildOrder(
  dataSource: DataSource,
  buyer: User,
  seller: User,
  overrides: OrderOverrides = {},
): Promise<Order> {
  const listing = overrides.listing ?? (await buildListing(dataSource, seller));
  const state = overrides.state ?? 'paid_out';
  const amounts = orderAmounts(overrides.itemMinor ?? listing.priceMinor ?? 15_000, 0, {
    commissionBps: DEFAULT_COMMISSION_BPS,
    buyerFeeBps: DEFAULT_BUYER_FEE_BPS,
  });
  const repo = dataSource.getRepository(Order);
  return repo.save(
    repo.create({
      kind: 'module',
      state,
      listingId: listing.id,
      quoteId: null,
      buyerId: buyer.id,
      sellerId: seller.id,
      currency: listing.currency,
      handover: 'collection',
      deliveryAddress: null,
      ...amounts,
      commissionBps: DEFAULT_COMMISSION_BPS,
      buyerFeeBps: DEFAULT_BUYER_FEE_BPS,
      transferredMinor: state === 'paid_out' ? amounts.payoutMinor : 0,
      handedOverAt: state === 'paid_out' ? new Date() : null,
      problemRaisedAt: overrides.problemRaisedAt ?? null,
      stateChangedAt: new Date(),
    }),
  );
}

/** A module order the seller has been paid for: both sides may now rate each other. */
export const buildPaidOutOrder = (dataSource: DataSource, buyer: User, seller: User, overrides: OrderOverrides = {}) =>
  buildOrder(dataSource, buyer, seller, { ...overrides, state: 'paid_out' });
