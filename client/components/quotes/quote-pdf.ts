import { computePlan, type PlanInput } from '@shared/planner';
import type { QuoteView } from '@shared/types/quotes';
import { formatDate, formatMoney } from '@/utils/format';
import { printColours } from '@/utils/plan-pdf/pdf-colours';
import { PdfWriter } from '@/utils/plan-pdf/pdf-writer';
import { formatPercent, formatQuantity } from './quote-format';

/** What the quote document says besides the quote: the plan it prices and who asked. */
export interface QuotePdfContext {
  planName: string;
  planInput: unknown;
  buyerName?: string;
}

/**
 * A quote as a PDF to keep or print: the builder, the priced lines, delivery, the total with the deposit and the
 * balance, lead time and validity, the builder's note, then the plan's bill of materials it was priced from.
 * pdf-lib is loaded here, only when someone asks for the document (as the planner's PDF does).
 */
export async function buildQuotePdf(quote: QuoteView, context: QuotePdfContext): Promise<Uint8Array> {
  const { PDFDocument, StandardFonts, rgb } = await import('pdf-lib');
  const doc = await PDFDocument.create();
  const title = `Quote ${quote.id} from ${quote.builder.businessName}`;
  doc.setTitle(title);
  doc.setCreator('Benchwright');
  const fonts = {
    regular: await doc.embedFont(StandardFonts.Helvetica),
    bold: await doc.embedFont(StandardFonts.HelveticaBold),
  };
  const w = new PdfWriter(doc, fonts, printColours(rgb));
  const money = (minor: number) => formatMoney(minor, quote.currency);

  w.heading(title, 18);
  w.paragraph(`For building "${context.planName}"${context.buyerName ? ` for ${context.buyerName}` : ''}.`);
  w.paragraph(`Sent ${formatDate(quote.sentAt)}; stands until ${formatDate(quote.validUntil)}.`);
  w.heading('Price', 13);
  w.table(
    [
      { title: 'Line', share: 6 },
      { title: 'Quantity', share: 1.6 },
      { title: 'Rate', share: 1.6 },
      { title: 'Amount', share: 1.8 },
    ],
    [
      ...quote.lines.map((l) => [
        l.label,
        formatQuantity(l.quantity, l.unit),
        l.rateMinor === null ? '' : money(l.rateMinor),
        money(l.amountMinor),
      ]),
      [`Delivery, ${quote.deliveryKm} km (left out if you collect)`, '', '', money(quote.deliveryMinor)],
      ...(quote.buyerFeeMinor > 0 ? [['Benchwright buyer’s fee', '', '', money(quote.buyerFeeMinor)]] : []),
      ['Total with delivery', '', '', money(quote.totalMinor)],
    ],
  );
  w.paragraph(
    `Deposit when accepted: ${money(quote.depositMinor)} (${formatPercent(quote.depositBps)}). Balance before hand-over: ${money(quote.balanceMinor)}.`,
    { bold: true },
  );
  w.paragraph(`Lead time: about ${quote.leadTimeWeeks} weeks from the deposit.`);
  if (quote.note) w.paragraph(`Builder's note: ${quote.note}`);
  if (quote.adjusted) w.paragraph('The builder changed some prices from their rate card; the note says why.');

  try {
    const plan = computePlan(context.planInput as PlanInput);
    w.heading('Bill of materials', 13);
    w.table(
      [
        { title: 'Item', share: 7 },
        { title: 'Quantity', share: 1.4 },
      ],
      plan.shoppingList.map((i) => [i.description, String(i.quantity)]),
    );
  } catch {
    w.paragraph('The plan no longer works out in the planner, so its bill of materials is not listed.');
  }
  return doc.save();
}
