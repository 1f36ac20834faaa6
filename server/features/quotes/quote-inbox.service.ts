import type { EntityManager } from 'typeorm';
import { PlanInputError, type PlanInput } from '../../../shared/planner';
import { draftQuote, type QuoteDraft } from '../../../shared/quotes/quote-pricing';
import type { InboxItem, InboxRequestView } from '../../../shared/types/quotes';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { AppContext } from '../../app-context';
import { notFound } from '../../http/errors';
import type { ListingActor } from '../listings/listing-actor';
import { Listing } from '../listings/listing.entity';
import { gazetteer } from '../towns/gazetteer';
import { User } from '../users/user.entity';
import { QuoteRecipient } from './quote-recipient.entity';
import { QuoteRequest } from './quote-request.entity';
import { depositRates, rateCardOf } from './quote-records';
import { presentQuotes } from './quote-request-view.service';
import { Quote } from './quote.entity';

/** The rate card's pricing of the request's plan; null when the saved input no longer makes a plan. */
export function draftFor(request: QuoteRequest, listing: Listing, distanceKm: number): QuoteDraft | null {
  const card = rateCardOf(listing);
  if (!card) return null;
  try {
    return draftQuote(request.planInput as PlanInput, card, distanceKm);
  } catch (error) {
    if (error instanceof PlanInputError) return null;
    throw error;
  }
}

async function inboxItem(m: EntityManager, r: QuoteRecipient, request: QuoteRequest): Promise<InboxItem> {
  const buyer = await m.findOneByOrFail(User, { id: request.buyerId });
  return {
    requestId: request.id,
    buyer: { id: buyer.id, displayName: buyer.displayName },
    planName: request.planName,
    townName: (await gazetteer()).find(request.townId)?.name ?? 'Unknown town',
    distanceKm: r.distanceKm,
    neededBy: request.neededBy,
    notes: request.notes,
    state: r.state,
    receivedAt: r.createdAt.toISOString(),
  };
}

/** GET /api/quotes/inbox: requests sent to the signed-in builder, newest first (none for anyone else). */
export async function listInbox(ctx: AppContext, actor: ListingActor): Promise<InboxItem[]> {
  const m = ctx.dataSource.manager;
  const rows = await m.find(QuoteRecipient, {
    where: { builderId: actor.id },
    relations: { request: true },
    order: { createdAt: 'DESC' },
    take: 100,
  });
  return Promise.all(rows.map((r) => inboxItem(m, r, r.request!)));
}

/** The recipient row of request `requestId` for this builder; a request not sent to them answers 404. */
export async function recipientFor(m: EntityManager, builderId: number, requestId: number, lock = false) {
  const recipient = await m.findOne(QuoteRecipient, {
    where: { requestId, builderId },
    ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
  });
  if (!recipient) throw notFound('That quote request');
  return recipient;
}

/** GET /api/quotes/inbox/:id: one request for the quote editor, prefilled from the plan and the rate card. */
export async function getInboxRequest(
  ctx: AppContext,
  actor: ListingActor,
  requestId: number,
): Promise<InboxRequestView> {
  const m = ctx.dataSource.manager;
  const recipient = await recipientFor(m, actor.id, requestId);
  const request = await m.findOneByOrFail(QuoteRequest, { id: requestId });
  const listing = await m.findOneByOrFail(Listing, { id: recipient.listingId });
  const quote = await m.findOneBy(Quote, { recipientId: recipient.id });
  const deposits = await depositRates(m, [actor.id]);
  return {
    ...(await inboxItem(m, recipient, request)),
    planInput: request.planInput,
    listing: { id: listing.id, title: listing.title },
    currency: listing.currency as Currency,
    draft: draftFor(request, listing, recipient.distanceKm),
    leadTimeWeeks: listing.leadTimeWeeks ?? 1,
    depositBps: quote?.depositBps ?? deposits.get(actor.id)!,
    quote: quote ? (await presentQuotes(m, [quote]))[0]! : null,
  };
}
