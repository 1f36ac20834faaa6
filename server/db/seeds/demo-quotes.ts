import type { AppContext } from '../../app-context';
import { Listing } from '../../features/listings/listing.entity';
import { SavedPlan } from '../../features/plans/saved-plan.entity';
import { QuoteRecipient } from '../../features/quotes/quote-recipient.entity';
import { QuoteRequest } from '../../features/quotes/quote-request.entity';
import type { User } from '../../features/users/user.entity';
import { TOWN } from './data/kit';

const BUYER = 'owen@cattersby-post.test';
const BUILDER = 'nell@ashgrove-benchworks.test';
const PLAN_NAME = 'Cattersby fiddle yard, two boards';

/** Two 1200 × 450 mm boards: a small fiddle yard for the demo buyer. */
const PLAN_INPUT = {
  boards: [
    { id: 'fy-a', name: 'Fiddle yard A', lengthMm: 1200, widthMm: 450 },
    { id: 'fy-b', name: 'Fiddle yard B', lengthMm: 1200, widthMm: 450 },
  ],
};

/**
 * The demo builder's inbox holds one quote request, waiting for her quote: Owen asks Ashgrove Benchworks to price a
 * saved fiddle-yard plan for Matlock. Written directly (no e-mail), once: a second run finds it and changes nothing.
 */
export async function seedDemoQuoteRequest(ctx: AppContext, users: ReadonlyMap<string, User>): Promise<boolean> {
  const buyer = users.get(BUYER)!;
  const builder = users.get(BUILDER)!;
  return ctx.transaction(async (m) => {
    if (await m.findOneBy(QuoteRequest, { buyerId: buyer.id, planName: PLAN_NAME })) return false;
    const listing = await m.findOne(Listing, {
      where: { ownerId: builder.id, kind: 'service', state: 'listed' },
      order: { id: 'ASC' },
    });
    if (!listing) return false;
    const plan =
      (await m.findOneBy(SavedPlan, { ownerId: buyer.id, name: PLAN_NAME })) ??
      (await m.save(m.create(SavedPlan, { ownerId: buyer.id, name: PLAN_NAME, input: PLAN_INPUT, shareToken: null })));
    const request = await m.save(
      m.create(QuoteRequest, {
        buyerId: buyer.id,
        planId: plan.id,
        planName: PLAN_NAME,
        planInput: plan.input,
        townId: TOWN.matlock,
        notes: 'For the club’s Cattersby layout: the boards stack in a car boot, so legs that fold would help.',
        neededBy: null,
        state: 'open',
      }),
    );
    await m.insert(QuoteRecipient, {
      requestId: request.id,
      builderId: builder.id,
      listingId: listing.id,
      distanceKm: 0,
      state: 'waiting',
    });
    return true;
  });
}
