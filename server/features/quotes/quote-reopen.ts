import type { EntityManager } from 'typeorm';
import { QuoteRequest } from './quote-request.entity';
import { Quote } from './quote.entity';

/**
 * A build order lapsed before its deposit was paid: open its quote request again, so the buyer can accept the same
 * quote or another one while they are still valid. The lapsed order keeps its history; the quote forgets it.
 */
export async function reopenQuoteAfterLapse(m: EntityManager, quoteId: number): Promise<void> {
  const quote = await m.findOne(Quote, { where: { id: quoteId }, lock: { mode: 'pessimistic_write' } });
  if (!quote) return;
  const request = await m.findOne(QuoteRequest, {
    where: { id: quote.requestId },
    lock: { mode: 'pessimistic_write' },
  });
  if (!request || request.state !== 'accepted') return;
  await m.update(Quote, { requestId: request.id }, { state: 'sent', orderId: null });
  request.state = 'open';
  await m.save(request);
}
