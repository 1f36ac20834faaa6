import type { PDFDocument, PDFFont, PDFPage } from 'pdf-lib';
import type { PdfColours } from './pdf-colours';

/** A4 portrait in PDF points (1/72 in). */
export const A4 = { width: 595.28, height: 841.89 };
const MARGIN = 42;

/** One table column: its heading and its share of the page width. */
export interface PdfColumn {
  title: string;
  share: number;
}

/**
 * Writes a plan down A4 pages from the top: headings, wrapped paragraphs and ruled tables, starting a new page
 * whenever the next thing would not fit. Text is reduced to the characters the standard Helvetica font can show.
 */
export class PdfWriter {
  page: PDFPage;
  y = A4.height - MARGIN;
  readonly left = MARGIN;
  readonly width = A4.width - 2 * MARGIN;
  private readonly supported: Set<number>;

  constructor(
    private readonly doc: PDFDocument,
    readonly fonts: { regular: PDFFont; bold: PDFFont },
    readonly colours: PdfColours,
  ) {
    this.page = doc.addPage([A4.width, A4.height]);
    this.supported = new Set(fonts.regular.getCharacterSet());
  }

  /** Standard fonts use WinAnsi encoding: swap what it lacks for plain equivalents rather than fail. */
  clean(text: string): string {
    const swaps: Record<string, string> = { '→': '->', '≤': '<=', '≥': '>=', '⚠': '!', '−': '-', '′': "'", '″': '"' };
    return [...text].map((ch) => (this.supported.has(ch.codePointAt(0)!) ? ch : (swaps[ch] ?? '?'))).join('');
  }

  /** Start a new page when `height` points will not fit on this one. */
  ensure(height: number): void {
    if (this.y - height >= MARGIN) return;
    this.page = this.doc.addPage([A4.width, A4.height]);
    this.y = A4.height - MARGIN;
  }

  /** Lines of `text` that fit `width` at `size`. */
  wrap(text: string, size: number, width: number, font = this.fonts.regular): string[] {
    const lines: string[] = [];
    for (const paragraph of this.clean(text).split('\n')) {
      let line = '';
      for (const word of paragraph.split(/\s+/)) {
        const next = line ? `${line} ${word}` : word;
        if (font.widthOfTextAtSize(next, size) <= width || !line) line = next;
        else {
          lines.push(line);
          line = word;
        }
      }
      lines.push(line);
    }
    return lines;
  }

  heading(text: string, size = 14): void {
    this.ensure(size * 2.4);
    this.y -= size * 1.4;
    this.page.drawText(this.clean(text), {
      x: this.left,
      y: this.y,
      size,
      font: this.fonts.bold,
      color: this.colours.ink,
    });
    this.y -= size * 0.6;
  }

  paragraph(text: string, options: { size?: number; bold?: boolean; indent?: number } = {}): void {
    const size = options.size ?? 9.5;
    const font = options.bold ? this.fonts.bold : this.fonts.regular;
    const indent = options.indent ?? 0;
    for (const line of this.wrap(text, size, this.width - indent, font)) {
      this.ensure(size * 1.35);
      this.y -= size * 1.35;
      this.page.drawText(line, { x: this.left + indent, y: this.y, size, font, color: this.colours.ink });
    }
    this.y -= size * 0.4;
  }

  /** A ruled table; the heading row is repeated on each new page. */
  table(columns: readonly PdfColumn[], rows: readonly (readonly string[])[], size = 8.5): void {
    const total = columns.reduce((sum, c) => sum + c.share, 0);
    const widths = columns.map((c) => (c.share / total) * this.width);
    const drawRow = (cells: readonly string[], bold: boolean) => {
      const font = bold ? this.fonts.bold : this.fonts.regular;
      const wrapped = cells.map((cell, i) => this.wrap(cell, size, widths[i]! - 6, font));
      const height = Math.max(...wrapped.map((lines) => lines.length)) * size * 1.25 + 5;
      if (this.y - height < MARGIN) {
        this.ensure(height + 100);
        if (!bold)
          drawRow(
            columns.map((c) => c.title),
            true,
          );
      }
      let x = this.left;
      wrapped.forEach((lines, i) => {
        lines.forEach((line, k) => {
          const y = this.y - 2 - size * 1.25 * (k + 1) + 2;
          this.page.drawText(line, { x: x + 3, y, size, font, color: this.colours.ink });
        });
        x += widths[i]!;
      });
      this.y -= height;
      const line = { start: { x: this.left, y: this.y }, end: { x: this.left + this.width, y: this.y } };
      this.page.drawLine({ ...line, thickness: bold ? 1 : 0.4, color: bold ? this.colours.ink : this.colours.muted });
    };
    this.ensure(size * 6);
    drawRow(
      columns.map((c) => c.title),
      true,
    );
    rows.forEach((row) => drawRow(row, false));
    this.y -= 8;
  }
}
