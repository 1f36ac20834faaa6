import { In, type EntityManager } from 'typeorm';
import type { QuoteRequestView, QuoteView } from '../../../shared/types/quotes';
import type { AppContext } from '../../app-context';
import { notFound } from '../../http/errors';
import type { ListingActor } from '../listings/listing-actor';
import { Listing } from '../listings/listing.entity';
import { currentFeeRates } from '../orders/fee-rates';
import { presentQuote } from './quote.presenter';
import { QuoteRecipient } from './quote-recipient.entity';
import { QuoteRequest } from './quote-request.entity';
import { builderNames } from './quote-records';
import { summarise } from './quote-requests.service';
import { Quote } from './quote.entity';

/** Present quotes with their builders' names and listings, in the order given. */
export async function presentQuotes(m: EntityManager, quotes: Quote[]): Promise<QuoteView[]> {
  if (quotes.length === 0) return [];
  const recipients = await m.find(QuoteRecipient, { where: { id: In(quotes.map((q) => q.recipientId)) } });
  const byId = new Map(recipients.map((r) => [r.id, r]));
  const listings = await m.find(Listing, {
    where: { id: In(recipients.map((r) => r.listingId)) },
    select: { id: true, title: true },
  });
  const titles = new Map(listings.map((l) => [l.id, l]));
  const names = await builderNames(
    m,
    recipients.map((r) => r.builderId),
  );
  const rates = await currentFeeRates(m);
  return quotes.map((q) => {
    const r = byId.get(q.recipientId)!;
    return presentQuote(q, names.get(r.builderId)!, titles.get(r.listingId)!, rates);
  });
}

/** GET /api/quotes/requests/:id: the buyer's request with every quote; anyone else gets 404. */
export async function getMyRequest(ctx: AppContext, actor: ListingActor, id: number): Promise<QuoteRequestView> {
  const m = ctx.dataSource.manager;
  const request = await m.findOneBy(QuoteRequest, { id, buyerId: actor.id });
  if (!request) throw notFound('That quote request');
  const [summary, recipients, quotes] = await Promise.all([
    summarise(m, request),
    m.find(QuoteRecipient, { where: { requestId: id }, order: { distanceKm: 'ASC', id: 'ASC' } }),
    m.find(Quote, { where: { requestId: id }, order: { createdAt: 'ASC', id: 'ASC' } }),
  ]);
  const names = await builderNames(
    m,
    recipients.map((r) => r.builderId),
  );
  return {
    ...summary,
    planId: request.planId,
    planInput: request.planInput,
    notes: request.notes,
    recipients: recipients.map((r) => ({
      listingId: r.listingId,
      builder: names.get(r.builderId)!,
      distanceKm: r.distanceKm,
      state: r.state,
    })),
    quotes: await presentQuotes(m, quotes),
    orderId: quotes.find((q) => q.orderId !== null)?.orderId ?? null,
  };
}
