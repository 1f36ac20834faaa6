import type TestAgent from 'supertest/lib/agent';
import { expect } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import { SavedPlan } from '../../server/features/plans/saved-plan.entity';
import type { User } from '../../server/features/users/user.entity';
import type { PlanInput } from '../../shared/planner/schema';
import type { InboxRequestView } from '../../shared/types/quotes';
import { buildUser } from '../support/factories';
import { buildListedListing, serviceBody, TOWNS } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { gazetteer } from '../../server/features/towns/gazetteer';

/** One 1200 × 600 mm board on legs (tests/shared/planner/hand-worked-module.test.ts). */
export const ONE_BOARD: PlanInput = { boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }] };

export interface QuoteParty {
  user: User;
  agent: TestAgent;
}

export interface QuoteWorld {
  buyer: QuoteParty;
  /** The buyer's town, Thurso: far from the towns other tests use, so the builders reaching it are these. */
  townId: number;
  /** Builders in Wick and Inverness, whose areas reach Thurso; the third works round London only. */
  near: QuoteParty & { listing: Listing };
  second: QuoteParty & { listing: Listing };
  far: QuoteParty & { listing: Listing };
  planId: number;
}

async function builder(app: AppInstance, moderator: User, name: string, townId: number, serviceAreaKm: number) {
  const user = await buildUser(app.ctx.dataSource, { role: 'builder', displayName: name });
  const listing = await buildListedListing(app.ctx, user, moderator, serviceBody({ townId, serviceAreaKm }));
  return { user, listing, agent: await signedInAs(app, user) };
}

/** A buyer in Thurso with a saved plan, two builders who reach Crewe and one who does not. */
export async function quoteWorld(app: AppInstance): Promise<QuoteWorld> {
  const ds = app.ctx.dataSource;
  const moderator = await buildUser(ds, { role: 'moderator' });
  const buyerUser = await buildUser(ds, { displayName: 'Ada Sidebottom' });
  const plan = await ds
    .getRepository(SavedPlan)
    .save({ ownerId: buyerUser.id, name: 'Club exhibition module', input: ONE_BOARD, shareToken: null });
  const town = async (name: string) => (await gazetteer()).search(name, 20, 'GB').find((t) => t.name === name)!.id;
  return {
    townId: await town('Thurso'),
    buyer: { user: buyerUser, agent: await signedInAs(app, buyerUser) },
    near: await builder(app, moderator, 'Caithness Frames', await town('Wick'), 80),
    second: await builder(app, moderator, 'Highland Benchwork', await town('Inverness'), 250),
    far: await builder(app, moderator, 'Thames Baseboards', TOWNS.london, 50),
    planId: plan.id,
  };
}

/** Send the world's plan to the two near builders as the buyer; the request's id. */
export async function askBoth(world: QuoteWorld): Promise<number> {
  const res = await world.buyer.agent
    .post('/api/quotes/requests')
    .send({
      planId: world.planId,
      townId: world.townId,
      listingIds: [world.near.listing.id, world.second.listing.id],
      notes: 'Four boards eventually; this one first.',
    })
    .expect(201);
  return (res.body as { id: number }).id;
}

/** Send the rate card's own pricing as `who`'s quote, unchanged; the quote's id. */
export async function quoteAsDrafted(who: QuoteParty, requestId: number, extra: object = {}): Promise<number> {
  const view = (await who.agent.get(`/api/quotes/inbox/${requestId}`).expect(200)).body.request as InboxRequestView;
  expect(view.draft).not.toBeNull();
  const body = {
    lines: view.draft!.lines.map((l) => ({ key: l.key, label: l.label, amountMinor: l.amountMinor })),
    deliveryMinor: view.draft!.deliveryMinor,
    leadTimeWeeks: 6,
    validDays: 30,
    ...extra,
  };
  const res = await who.agent.post(`/api/quotes/inbox/${requestId}/quote`).send(body).expect(201);
  return (res.body as { id: number }).id;
}
