import type { SheetStockPlan } from '@shared/planner';
import type { Rotation } from 'pdf-lib';
import { fitLabel } from '@/utils/planner/sheet-labels';
import type { PdfWriter } from './pdf-writer';

type Layout = SheetStockPlan['plan']['sheets'][number];
type Rect = { x: number; y: number; width: number; height: number };

const MAX_HEIGHT = 250;
const HATCH_PT = 6;
/** A quarter turn, written as pdf-lib's `degrees(90)` gives it, so this file needs no runtime import of pdf-lib. */
const UPRIGHT = { type: 'degrees', angle: 90 } as Rotation;

/**
 * Draws one sheet layout as vectors across the page width: parts labelled with their size, offcuts hatched, and each
 * saw cut as a line with its number in the order to make it. Sheet y runs down; the page's runs up.
 */
export function drawSheetLayout(w: PdfWriter, layout: Layout, title: string, format: (mm: number) => string): void {
  const scale = Math.min(w.width / layout.sheet.width, MAX_HEIGHT / layout.sheet.height);
  const height = layout.sheet.height * scale;
  w.ensure(height + 40);
  w.paragraph(title, { bold: true, size: 10 });
  const top = w.y - 4;
  const box = (r: Rect) => ({
    x: w.left + r.x * scale,
    y: top - (r.y + r.height) * scale,
    width: r.width * scale,
    height: r.height * scale,
  });
  const { page, colours, fonts } = w;

  page.drawRectangle({ ...box({ x: 0, y: 0, ...layout.sheet }), borderColor: colours.ink, borderWidth: 0.8 });
  for (const offcut of layout.offcuts) hatch(w, box(offcut));
  for (const p of layout.placements) {
    const b = box(p);
    page.drawRectangle({ ...b, color: colours.ply, borderColor: colours.timber, borderWidth: 0.8 });
    const size = `${format(p.width)} x ${format(p.height)}`;
    const fit = fitLabel(`${p.label ?? p.partId}${p.rotated ? ' (turned)' : ''}`, size, b.width, b.height, 8);
    if (fit === null) continue;
    const lines = fit.withSize ? [fit.name, size] : [fit.name];
    lines.forEach((text, i) => {
      const clean = w.clean(text);
      const pt = i === 0 ? fit.size : fit.size * 0.85;
      const font = i === 0 ? fonts.bold : fonts.regular;
      const half = font.widthOfTextAtSize(clean, pt) / 2;
      // Lines stack down the part; turned up a narrow part, "down" runs to the right.
      const drop = i === 0 ? (lines.length > 1 ? -1 : -pt / 3) : pt + 1;
      const at = fit.rotate
        ? { x: b.x + b.width / 2 + drop, y: b.y + b.height / 2 - half }
        : { x: b.x + b.width / 2 - half, y: b.y + b.height / 2 - drop };
      page.drawText(clean, { ...at, size: pt, font, color: colours.ink, ...(fit.rotate ? { rotate: UPRIGHT } : {}) });
    });
  }
  for (const cut of layout.cuts) {
    const vertical = cut.orientation === 'vertical';
    const start = vertical ? { x: cut.position, y: cut.from } : { x: cut.from, y: cut.position };
    const end = vertical ? { x: cut.position, y: cut.to } : { x: cut.to, y: cut.position };
    const at = (pt: { x: number; y: number }) => ({ x: w.left + pt.x * scale, y: top - pt.y * scale });
    page.drawLine({ start: at(start), end: at(end), thickness: 1, color: colours.wire, dashArray: [4, 2] });
    const mid = at({ x: (start.x + end.x) / 2, y: (start.y + end.y) / 2 });
    page.drawCircle({ ...mid, size: 6, color: colours.ply, borderColor: colours.wire, borderWidth: 0.8 });
    const label = String(cut.order);
    const lw = fonts.bold.widthOfTextAtSize(label, 7);
    page.drawText(label, { x: mid.x - lw / 2, y: mid.y - 2.5, size: 7, font: fonts.bold, color: colours.ink });
  }
  w.y = top - height - 14;
}

/** Diagonal lines across a rectangle (PDF points), each clipped to it by hand. */
function hatch(w: PdfWriter, b: Rect): void {
  for (let c = -b.height; c < b.width; c += HATCH_PT) {
    const u0 = Math.max(0, c);
    const u1 = Math.min(b.width, c + b.height);
    if (u1 <= u0) continue;
    w.page.drawLine({
      start: { x: b.x + u0, y: b.y + b.height - (u0 - c) },
      end: { x: b.x + u1, y: b.y + b.height - (u1 - c) },
      thickness: 0.4,
      color: w.colours.muted,
    });
  }
  w.page.drawRectangle({ ...b, borderColor: w.colours.muted, borderWidth: 0.5 });
}
