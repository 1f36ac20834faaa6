import { differsFromDraft, sumLines, type QuoteLine } from '../../../shared/quotes/quote-pricing';
import type { SendQuoteInput } from '../../../shared/schemas/quotes';
import type { AppContext } from '../../app-context';
import { conflict, validationFailed } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { Listing } from '../listings/listing.entity';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { User } from '../users/user.entity';
import { draftFor, recipientFor } from './quote-inbox.service';
import { QuoteRequest } from './quote-request.entity';
import { builderNames, depositRates, isoDay } from './quote-records';
import { Quote } from './quote.entity';

/**
 * The builder's lines, keeping the draft's quantity and rate where a line's amount is the rate card's own; a line
 * whose amount was changed becomes a lump sum.
 */
function settleLines(input: SendQuoteInput, draftLines: readonly QuoteLine[]): QuoteLine[] {
  const byKey = new Map(draftLines.map((l) => [l.key, l]));
  return input.lines.map((l) => {
    const d = byKey.get(l.key);
    const same = d !== undefined && d.amountMinor === l.amountMinor;
    return {
      key: l.key,
      label: l.label,
      quantity: same ? d.quantity : null,
      unit: same ? d.unit : null,
      rateMinor: same ? d.rateMinor : null,
      amountMinor: l.amountMinor,
    };
  });
}

/**
 * POST /api/quotes/inbox/:id/quote: the builder answers a request sent to them, once. Any change from the rate
 * card's pricing (a line's amount or words, a line added or removed, the delivery) needs a note to the buyer.
 */
export async function sendQuote(
  ctx: AppContext,
  actor: ListingActor,
  requestId: number,
  input: SendQuoteInput,
): Promise<{ id: number }> {
  return ctx.transaction(async (m) => {
    const recipient = await recipientFor(m, actor.id, requestId, true);
    const request = await m.findOneByOrFail(QuoteRequest, { id: requestId });
    if (recipient.state === 'quoted')
      throw conflict('already_quoted', 'You have already sent a quote for this request.');
    if (request.state !== 'open')
      throw conflict('request_closed', 'The buyer has already accepted a quote for this request.');
    const listing = await m.findOneByOrFail(Listing, { id: recipient.listingId });
    const draft = draftFor(request, listing, recipient.distanceKm);
    const lines = settleLines(input, draft?.lines ?? []);
    const adjusted = draft === null || differsFromDraft(draft, lines, input.deliveryMinor);
    if (adjusted && input.note === '')
      throw validationFailed({
        note: 'Say what you changed from your rate card and why: the buyer reads this note beside your prices.',
      });
    const itemMinor = sumLines(lines);
    if (itemMinor === 0) throw validationFailed({ lines: 'The lines add up to nothing: price the build.' });
    const deposits = await depositRates(m, [actor.id]);
    const quote = await m.save(
      m.create(Quote, {
        requestId,
        recipientId: recipient.id,
        currency: listing.currency,
        lines,
        itemMinor,
        deliveryKm: recipient.distanceKm,
        deliveryMinor: input.deliveryMinor,
        depositBps: deposits.get(actor.id)!,
        leadTimeWeeks: input.leadTimeWeeks,
        validUntil: isoDay(input.validDays),
        note: input.note,
        adjusted,
        state: 'sent',
        orderId: null,
      }),
    );
    recipient.state = 'quoted';
    await m.save(recipient);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'quote.sent',
      targetType: 'quote',
      targetId: quote.id,
      detail: { requestId, itemMinor, deliveryMinor: input.deliveryMinor, adjusted },
      ip: actor.ip,
    });
    const buyer = await m.findOneByOrFail(User, { id: request.buyerId });
    const name = (await builderNames(m, [actor.id])).get(actor.id)!.businessName;
    const url = `${ctx.config.appOrigin}/quotes/requests/${requestId}`;
    await enqueueEmail(m, buyer.email, mailTemplates.quoteReceived(buyer.displayName, name, request.planName, url));
    return { id: quote.id };
  });
}
