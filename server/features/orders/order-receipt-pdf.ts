import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import type { OrderView } from '../../../shared/types/orders';
import { conflict } from '../../http/errors';

const A4: [number, number] = [595.28, 841.89];
const LEFT = 56;
const RIGHT = A4[0] - 56;
const INK = rgb(0.11, 0.15, 0.13);
const MUTED = rgb(0.35, 0.4, 0.37);

/** States before any money arrived: there is nothing to give a receipt for. */
const NOT_PAID = ['awaiting_payment', 'awaiting_deposit', 'lapsed'];

/** "£253.00": British format, and characters the standard PDF fonts can draw. */
const money = (minor: number, currency: string) =>
  new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(minor / 100);
const day = (iso: string) =>
  new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'long',
    year: 'numeric',
    timeZone: 'Europe/London',
  }).format(new Date(iso));
class ReceiptWriter {
  y = A4[1] - 64;
  private readonly supported: Set<number>;
  constructor(
    private readonly page: PDFPage,
    private readonly fonts: { regular: PDFFont; bold: PDFFont },
  ) {
    this.supported = new Set(fonts.regular.getCharacterSet());
  }

  /** Standard fonts use WinAnsi: anything it lacks becomes "?" rather than failing the whole receipt. */
  private plain(text: string): string {
    return [...text.replace(/\u00a0/g, ' ')].map((ch) => (this.supported.has(ch.codePointAt(0)!) ? ch : '?')).join('');
  }

  line(text: string, size = 11, bold = false, colour = INK): void {
    this.page.drawText(this.plain(text), {
      x: LEFT,
      y: this.y,
      size,
      font: bold ? this.fonts.bold : this.fonts.regular,
      color: colour,
    });
    this.y -= size + 7;
  }

  /** A label on the left and an amount on the right. */
  row(label: string, value: string, bold = false): void {
    const font = bold ? this.fonts.bold : this.fonts.regular;
    this.page.drawText(this.plain(label), { x: LEFT, y: this.y, size: 11, font, color: INK });
    const text = this.plain(value);
    this.page.drawText(text, { x: RIGHT - font.widthOfTextAtSize(text, 11), y: this.y, size: 11, font, color: INK });
    this.y -= 18;
  }

  rule(): void {
    this.page.drawLine({
      start: { x: LEFT, y: this.y + 10 },
      end: { x: RIGHT, y: this.y + 10 },
      thickness: 0.6,
      color: MUTED,
    });
    this.y -= 6;
  }

  gap(points = 10): void {
    this.y -= points;
  }
}

/**
 * A one-page A4 receipt of an order as the viewer sees it: what was bought, from whom, what was paid and refunded;
 * the seller's copy also shows the commission and their payout. Refused (409) before the order is paid.
 */
export async function orderReceiptPdf(order: OrderView): Promise<Uint8Array> {
  if (NOT_PAID.includes(order.state))
    throw conflict('order_state', 'A receipt is available once the order has been paid.');
  const doc = await PDFDocument.create();
  doc.setTitle(`Benchwright receipt for order ${order.id}`);
  doc.setAuthor('Benchwright');
  doc.setCreationDate(new Date(order.createdAt));
  const w = new ReceiptWriter(doc.addPage(A4), {
    regular: await doc.embedFont(StandardFonts.Helvetica),
    bold: await doc.embedFont(StandardFonts.HelveticaBold),
  });
  const c = order.currency;
  w.line('Benchwright', 20, true);
  w.line(order.viewerRole === 'seller' ? 'Sale receipt' : 'Receipt', 14, true, MUTED);
  w.gap();
  w.line(`Order ${order.id}, made on ${day(order.createdAt)}`);
  w.line(`Module: ${order.listing.title}`);
  w.line(`Bought by ${order.buyer.displayName} from ${order.seller.displayName}`);
  w.line(`Hand-over: ${order.handoverLabel}`);
  w.line(`Now: ${order.stateLabel}`);
  w.gap();
  w.row('Item', money(order.amounts.itemMinor, c));
  w.row('Delivery', money(order.amounts.deliveryMinor, c));
  if (order.amounts.buyerFeeMinor > 0) w.row("Buyer's fee", money(order.amounts.buyerFeeMinor, c));
  w.rule();
  w.row('Total paid', money(order.amounts.totalMinor, c), true);
  if (order.amounts.refundedMinor > 0) w.row('Refunded to the card', `- ${money(order.amounts.refundedMinor, c)}`);
  if (order.sellerMoney) {
    const s = order.sellerMoney;
    w.gap();
    w.row(`Benchwright commission (${(s.commissionBps / 100).toFixed(2)} %)`, `- ${money(s.commissionMinor, c)}`);
    w.row('Payout to the seller', money(s.payoutMinor, c), true);
    w.row('Transferred so far', money(s.transferredMinor, c));
  }
  w.gap(16);
  w.line(
    'Money is held by Benchwright until the buyer confirms receipt or a moderator settles a problem.',
    9,
    false,
    MUTED,
  );
  return doc.save();
}
