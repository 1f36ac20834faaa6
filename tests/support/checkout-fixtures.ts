import type TestAgent from 'supertest/lib/agent';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import type { OrderView } from '../../shared/types/orders';
import { buildUser } from './factories';
import { buildListedListing, type moduleBody } from './listing-factories';
import { signedInAs } from './sessions';

/** A module offered every way: collection, the seller's delivery within 40 km, and a parcel courier. */
export const EVERY_WAY: Parameters<typeof moduleBody>[0] = {
  priceMinor: 18_000,
  handling: {
    collection: true,
    delivery: { withinKm: 40, priceMinor: 2_500 },
    courier: 'parcel',
    courierPriceMinor: 1_800,
  },
};

export const ADDRESS = 'Ada Sidebottom\n12 Sleeper Lane\nNantwich\nCW5 5AA';

export interface Sale {
  seller: User;
  buyer: User;
  listing: Listing;
  sellerAgent: TestAgent;
  buyerAgent: TestAgent;
}

/** A seller with a listed module (every way by default) and a signed-in buyer. */
export async function saleFixture(
  app: AppInstance,
  overrides: Parameters<typeof moduleBody>[0] = EVERY_WAY,
): Promise<Sale> {
  const ds = app.ctx.dataSource;
  const seller = await buildUser(ds, { displayName: 'Hollin Bridge Sidings' });
  const moderator = await buildUser(ds, { role: 'moderator' });
  const buyer = await buildUser(ds, { displayName: 'Ada Sidebottom' });
  const listing = await buildListedListing(app.ctx, seller, moderator, overrides);
  return {
    seller,
    buyer,
    listing,
    sellerAgent: await signedInAs(app, seller),
    buyerAgent: await signedInAs(app, buyer),
  };
}

/** Start an order for the sale's listing as its buyer, by parcel courier to ADDRESS. */
export async function startOrder(sale: Sale, handover = 'parcel'): Promise<OrderView> {
  const res = await sale.buyerAgent
    .post('/api/orders')
    .send({ listingId: sale.listing.id, handover, deliveryAddress: handover === 'collection' ? null : ADDRESS })
    .expect(201);
  return res.body as OrderView;
}
