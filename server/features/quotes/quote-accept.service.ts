import { Not } from 'typeorm';
import { depositSplit, orderAmounts } from '../../../shared/orders/money';
import type { AcceptQuoteInput } from '../../../shared/schemas/quotes';
import type { AppContext } from '../../app-context';
import { conflict, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { Listing } from '../listings/listing.entity';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { currentFeeRates } from '../orders/fee-rates';
import { noteOrderEvent } from '../orders/order-lifecycle';
import { Order } from '../orders/order.entity';
import { User } from '../users/user.entity';
import { QuoteRecipient } from './quote-recipient.entity';
import { QuoteRequest } from './quote-request.entity';
import { isoDay } from './quote-records';
import { Quote } from './quote.entity';

/** The deposit can be paid until the end of the quote's last day (then the order lapses). */
const endOfDay = (day: string) => new Date(`${day}T23:59:59.999Z`);

/**
 * POST /api/quotes/:id/accept: the buyer accepts one quote of their request. The request row is locked first, so
 * two acceptances of one request (the same quote twice, or two quotes) cannot both pass: the second gets 409. The
 * build order waits for the deposit; the other quotes become "not chosen".
 */
export async function acceptQuote(
  ctx: AppContext,
  actor: ListingActor,
  quoteId: number,
  input: AcceptQuoteInput,
): Promise<{ orderId: number }> {
  return ctx.transaction(async (m) => {
    const found = await m.findOneBy(Quote, { id: quoteId });
    const request = found
      ? await m.findOne(QuoteRequest, { where: { id: found.requestId }, lock: { mode: 'pessimistic_write' } })
      : null;
    if (!found || !request || request.buyerId !== actor.id) throw notFound('That quote');
    const quote = await m.findOneOrFail(Quote, { where: { id: quoteId }, lock: { mode: 'pessimistic_write' } });
    if (request.state !== 'open' || quote.state !== 'sent')
      throw conflict('quote_state', 'A quote for this request has already been accepted.');
    if (quote.validUntil < isoDay())
      throw conflict('quote_expired', 'This quote has run out. Ask the builder for a new one.');
    const recipient = await m.findOneByOrFail(QuoteRecipient, { id: quote.recipientId });
    const listing = await m.findOneByOrFail(Listing, { id: recipient.listingId });
    if (listing.state !== 'listed')
      throw conflict('builder_unavailable', 'This builder is not taking work through Benchwright just now.');

    const rates = await currentFeeRates(m);
    const delivery = input.handover === 'collection' ? 0 : quote.deliveryMinor;
    const amounts = orderAmounts(quote.itemMinor, delivery, rates);
    const { depositMinor } = depositSplit(amounts.totalMinor, quote.depositBps);
    const order = await m.save(
      m.create(Order, {
        kind: 'build',
        state: 'awaiting_deposit',
        listingId: listing.id,
        quoteId: quote.id,
        buyerId: actor.id,
        sellerId: recipient.builderId,
        currency: quote.currency,
        handover: input.handover,
        deliveryAddress: input.handover === 'collection' ? null : (input.deliveryAddress ?? null),
        ...amounts,
        commissionBps: rates.commissionBps,
        buyerFeeBps: rates.buyerFeeBps,
        depositMinor,
        payableUntil: endOfDay(quote.validUntil),
        stateChangedAt: new Date(),
      }),
    );
    const by = { as: 'buyer' as const, id: actor.id, ip: actor.ip };
    await noteOrderEvent(m, order, 'create', by, `Quote ${quote.id} accepted`);

    Object.assign(quote, { state: 'accepted', orderId: order.id });
    await m.save(quote);
    await m.update(Quote, { requestId: request.id, id: Not(quote.id) }, { state: 'not_chosen' });
    request.state = 'accepted';
    await m.save(request);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'quote.accepted',
      targetType: 'quote',
      targetId: quote.id,
      detail: { orderId: order.id, totalMinor: amounts.totalMinor, depositMinor },
      ip: actor.ip,
    });
    const [builder, buyer] = await Promise.all([
      m.findOneByOrFail(User, { id: recipient.builderId }),
      m.findOneByOrFail(User, { id: actor.id }),
    ]);
    const url = `${ctx.config.appOrigin}/builds/${order.id}`;
    await enqueueEmail(
      m,
      builder.email,
      mailTemplates.quoteAccepted(builder.displayName, buyer.displayName, request.planName, url),
    );
    return { orderId: order.id };
  });
}
