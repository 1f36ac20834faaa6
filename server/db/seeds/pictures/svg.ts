/** Small SVG helpers for the demo's drawings. Only generic font families, so any machine renders them. */

export const CANVAS = { width: 1200, height: 800 } as const;
export const FONT = 'sans-serif';
export const INK = '#2b2f36';
export const TIMBER = '#d7b57c';
export const TIMBER_EDGE = '#8a6a3b';
export const PLY = '#eadbb8';

/** Escape text for an SVG text node or attribute. */
export const esc = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** Round to 0.1 px, so the SVG stays short and deterministic. */
export const r = (n: number) => Math.round(n * 10) / 10;

export function text(
  x: number,
  y: number,
  content: string,
  opts: { size?: number; weight?: 'bold'; anchor?: 'start' | 'middle' | 'end'; fill?: string; rotate?: number } = {},
) {
  const rotate = opts.rotate ? ` transform="rotate(${opts.rotate} ${r(x)} ${r(y)})"` : '';
  return (
    `<text x="${r(x)}" y="${r(y)}" font-family="${FONT}" font-size="${opts.size ?? 16}"` +
    `${opts.weight ? ` font-weight="${opts.weight}"` : ''} text-anchor="${opts.anchor ?? 'start'}"` +
    ` fill="${opts.fill ?? INK}"${rotate}>${esc(content)}</text>`
  );
}

export const rect = (x: number, y: number, w: number, h: number, style: string) =>
  `<rect x="${r(x)}" y="${r(y)}" width="${r(w)}" height="${r(h)}" ${style}/>`;

export const line = (x1: number, y1: number, x2: number, y2: number, style = `stroke="${INK}" stroke-width="1"`) =>
  `<line x1="${r(x1)}" y1="${r(y1)}" x2="${r(x2)}" y2="${r(y2)}" ${style}/>`;

/** The whole picture: a paper background, a title and a subtitle, the drawing, then up to two lines of notes. */
export function sheet(title: string, subtitle: string, body: string[], footer: string[] = []): string {
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${CANVAS.width}" height="${CANVAS.height}"`,
    ` viewBox="0 0 ${CANVAS.width} ${CANVAS.height}">`,
    rect(0, 0, CANVAS.width, CANVAS.height, 'fill="#f7f4ec"'),
    rect(0, 0, CANVAS.width, 96, 'fill="#e9e3d3"'),
    text(40, 44, title.length > 70 ? `${title.slice(0, 68)}…` : title, { size: 28, weight: 'bold' }),
    text(40, 78, subtitle, { size: 18 }),
    ...body,
    ...footer.map((note, i) =>
      text(40, CANVAS.height - 24 - (footer.length - 1 - i) * 22, note, { size: 15, fill: '#555b66' }),
    ),
    '</svg>',
  ].join('');
}

/** Label steps a rule may use, mm; the first one at least `minPx` apart wins. */
const LABEL_STEPS = [50, 100, 200, 250, 500, 1000];

/**
 * A scale rule of `lengthMm` drawn at `pxPerMm` from (x, y): a tick every 10 mm where they fit, longer ones every
 * 50 and 100 mm, and figures in mm, so the picture shows the board's true size.
 */
export function scaleRule(x: number, y: number, lengthMm: number, pxPerMm: number): string {
  const parts = [line(x, y, x + lengthMm * pxPerMm, y, `stroke="${INK}" stroke-width="1.5"`)];
  const minor = 10 * pxPerMm >= 4 ? 10 : 50;
  const labelStep = LABEL_STEPS.find((step) => step * pxPerMm >= 64) ?? 1000;
  for (let mm = 0; mm <= lengthMm; mm += minor) {
    const size = mm % 100 === 0 ? 14 : mm % 50 === 0 ? 9 : 5;
    const px = x + mm * pxPerMm;
    parts.push(line(px, y, px, y + size, `stroke="${INK}" stroke-width="1"`));
    if (mm % labelStep === 0) parts.push(text(px, y + 30, String(mm), { size: 13, anchor: 'middle' }));
  }
  const end = x + lengthMm * pxPerMm;
  parts.push(line(end, y, end, y + 14, `stroke="${INK}" stroke-width="1.5"`));
  parts.push(text(end + 8, y + 12, `${lengthMm} mm`, { size: 14, weight: 'bold' }));
  return parts.join('');
}
