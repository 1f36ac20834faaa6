import { MoreThan, type EntityManager } from 'typeorm';
import { computePlan, PlanInputError, type PlanInput } from '../../../shared/planner';
import type { CreateQuoteRequestInput } from '../../../shared/schemas/quotes';
import type { QuoteRequestSummary } from '../../../shared/types/quotes';
import type { AppContext } from '../../app-context';
import { conflict, validationFailed } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { SavedPlan } from '../plans/saved-plan.entity';
import { gazetteer } from '../towns/gazetteer';
import { User } from '../users/user.entity';
import { servicesReaching, townFor } from './builder-choices.service';
import { QuoteRecipient } from './quote-recipient.entity';
import { QuoteRequest } from './quote-request.entity';
import { isoDay } from './quote-records';
import { Quote } from './quote.entity';

/** Requests one buyer may send in a day: enough for real use, too few to flood builders. */
export const MAX_REQUESTS_PER_DAY = 10;

async function ownPlan(m: EntityManager, ownerId: number, planId: number): Promise<SavedPlan> {
  const plan = await m.findOneBy(SavedPlan, { id: planId, ownerId });
  if (!plan) throw validationFailed({ planId: 'Choose one of your saved plans.' });
  try {
    computePlan(plan.input as PlanInput);
  } catch (error) {
    if (!(error instanceof PlanInputError)) throw error;
    throw validationFailed({ planId: 'This plan no longer works out. Open it in the planner, fix it and save it.' });
  }
  return plan;
}

/** POST /api/quotes/requests: send a saved plan to up to five builders whose service area reaches the town. */
export async function createQuoteRequest(
  ctx: AppContext,
  actor: ListingActor,
  input: CreateQuoteRequestInput,
): Promise<{ id: number }> {
  const town = await townFor(input.townId);
  if (input.neededBy !== null && input.neededBy <= isoDay())
    throw validationFailed({ neededBy: 'The date you need the boards by must be after today.' });
  return ctx.transaction(async (m) => {
    const since = new Date(Date.now() - 24 * 3600 * 1000);
    if ((await m.countBy(QuoteRequest, { buyerId: actor.id, createdAt: MoreThan(since) })) >= MAX_REQUESTS_PER_DAY)
      throw conflict('request_limit', `You can send ${MAX_REQUESTS_PER_DAY} quote requests a day. Try again tomorrow.`);
    const plan = await ownPlan(m, actor.id, input.planId);
    const reaching = await servicesReaching(m, town, actor.id, input.listingIds);
    if (reaching.length !== input.listingIds.length)
      throw validationFailed({
        listingIds: `Choose builders from the list: one of those chosen does not work as far as ${town.name}.`,
      });
    const owners = new Set(reaching.map((s) => s.listing.ownerId));
    if (owners.size !== reaching.length) throw validationFailed({ listingIds: 'Choose each builder once.' });

    const request = await m.save(
      m.create(QuoteRequest, {
        buyerId: actor.id,
        planId: plan.id,
        planName: plan.name,
        planInput: plan.input,
        townId: town.id,
        notes: input.notes,
        neededBy: input.neededBy,
        state: 'open',
      }),
    );
    const buyer = await m.findOneByOrFail(User, { id: actor.id });
    const url = `${ctx.config.appOrigin}/quotes/inbox/${request.id}`;
    for (const { listing, distanceKm } of reaching) {
      await m.insert(QuoteRecipient, {
        requestId: request.id,
        builderId: listing.ownerId,
        listingId: listing.id,
        distanceKm,
        state: 'waiting',
      });
      const builder = await m.findOneByOrFail(User, { id: listing.ownerId });
      await enqueueEmail(
        m,
        builder.email,
        mailTemplates.quoteRequested(builder.displayName, buyer.displayName, plan.name, url),
      );
    }
    await recordAudit(m, {
      actorId: actor.id,
      action: 'quote_request.sent',
      targetType: 'quote_request',
      targetId: request.id,
      detail: { listings: input.listingIds },
      ip: actor.ip,
    });
    return { id: request.id };
  });
}

/** A request in the buyer's list, with how many builders were asked and how many answered. */
export async function summarise(m: EntityManager, request: QuoteRequest): Promise<QuoteRequestSummary> {
  const [builderCount, quoteCount, towns] = await Promise.all([
    m.countBy(QuoteRecipient, { requestId: request.id }),
    m.countBy(Quote, { requestId: request.id }),
    gazetteer(),
  ]);
  return {
    id: request.id,
    planName: request.planName,
    townName: towns.find(request.townId)?.name ?? 'Unknown town',
    state: request.state,
    neededBy: request.neededBy,
    builderCount,
    quoteCount,
    createdAt: request.createdAt.toISOString(),
  };
}

/** GET /api/quotes/requests: the buyer's requests, newest first. */
export async function listMyRequests(ctx: AppContext, actor: ListingActor): Promise<QuoteRequestSummary[]> {
  const m = ctx.dataSource.manager;
  const rows = await m.find(QuoteRequest, { where: { buyerId: actor.id }, order: { createdAt: 'DESC' }, take: 100 });
  return Promise.all(rows.map((r) => summarise(m, r)));
}
