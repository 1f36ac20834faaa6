import type { Currency } from '../../../shared/listings/vocabulary';
import { depositSplit, orderAmounts, type FeeRates } from '../../../shared/orders/money';
import type { QuoteView } from '../../../shared/types/quotes';
import type { Listing } from '../listings/listing.entity';
import type { BuilderName } from './quote-records';
import { isoDay } from './quote-records';
import type { Quote } from './quote.entity';

/** A quote with its totals as the buyer would pay them now (with delivery), for buyer and builder alike. */
export function presentQuote(
  q: Quote,
  builder: BuilderName,
  listing: Pick<Listing, 'id' | 'title'>,
  rates: FeeRates,
): QuoteView {
  const amounts = orderAmounts(q.itemMinor, q.deliveryMinor, rates);
  const { depositMinor, balanceMinor } = depositSplit(amounts.totalMinor, q.depositBps);
  return {
    id: q.id,
    requestId: q.requestId,
    state: q.state,
    builder,
    listing: { id: listing.id, title: listing.title },
    currency: q.currency as Currency,
    lines: q.lines,
    itemMinor: q.itemMinor,
    deliveryKm: q.deliveryKm,
    deliveryMinor: q.deliveryMinor,
    buyerFeeMinor: amounts.buyerFeeMinor,
    totalMinor: amounts.totalMinor,
    depositBps: q.depositBps,
    depositMinor,
    balanceMinor,
    leadTimeWeeks: q.leadTimeWeeks,
    validUntil: q.validUntil,
    expired: q.state === 'sent' && q.validUntil < isoDay(),
    note: q.note,
    adjusted: q.adjusted,
    orderId: q.orderId,
    sentAt: q.createdAt.toISOString(),
  };
}
