import { SUPPORT_LABELS, TOP_MATERIAL_LABELS } from '../../../../shared/listings/vocabulary';
import type { BoardDrawing } from './board';
import { PLY, TIMBER, TIMBER_EDGE, line, rect, scaleRule, sheet, text } from './svg';

const AREA = { centre: 600, floor: 650, width: 900, height: 500 };
const RED = '#b3261e';

interface Deck {
  /** Height of the top surface above the datum, mm. */
  top: number;
  tracks: number[];
}

/**
 * mm above the datum → canvas pixels, with the board centred. A board high above the floor is drawn larger with its
 * legs broken: below `breakY` the drawing is not to scale, and the height is read from its dimension instead.
 */
function frameOf(b: BoardDrawing, lowMm: number, topMm: number, fromFloor: boolean) {
  const byWidth = AREA.width / (b.widthMm * 1.7);
  const plain = Math.min(byWidth, AREA.height / (topMm + 120));
  const large = Math.min(byWidth, (AREA.height - 200) / (topMm - lowMm + 160));
  const broken = fromFloor && large > plain * 1.5;
  const s = broken ? large : plain;
  const x0 = AREA.centre - (b.widthMm * s) / 2;
  const base = AREA.floor - 170;
  const Y = (mm: number) => (!broken ? AREA.floor - mm * s : mm <= 0 ? AREA.floor : base - (mm - (lowMm - 40)) * s);
  return { s, x0, X: (mm: number) => x0 + mm * s, Y, breakY: broken ? AREA.floor - 90 : null };
}

type Frame = ReturnType<typeof frameOf>;

/** One deck seen end on: top sheet, side rails and end rail of the frame, and the track in section. */
function deck(b: BoardDrawing, f: Frame, d: Deck): string[] {
  const c = b.construction;
  const tt = c.topThicknessMm ?? 0;
  const parts = [
    rect(
      f.X(0),
      f.Y(d.top - tt),
      b.widthMm * f.s,
      c.frameDepthMm * f.s,
      `fill="${TIMBER}" stroke="${TIMBER_EDGE}" stroke-width="1.2"`,
    ),
    rect(
      f.X(0),
      f.Y(d.top - tt),
      c.frameThicknessMm * f.s,
      c.frameDepthMm * f.s,
      `fill="#c49a5c" stroke="${TIMBER_EDGE}"`,
    ),
    rect(
      f.X(b.widthMm - c.frameThicknessMm),
      f.Y(d.top - tt),
      c.frameThicknessMm * f.s,
      c.frameDepthMm * f.s,
      `fill="#c49a5c" stroke="${TIMBER_EDGE}"`,
    ),
  ];
  if (tt > 0) parts.push(rect(f.X(0), f.Y(d.top), b.widthMm * f.s, tt * f.s, `fill="${PLY}" stroke="${TIMBER_EDGE}"`));
  const g = b.scale.gaugeMm;
  const rail = Math.max(1.5, g * 0.12 * f.s);
  for (const offset of d.tracks) {
    const sleeperH = Math.max(2, g * 0.2 * f.s);
    parts.push(rect(f.X(offset - g * 0.9), f.Y(d.top) - sleeperH, g * 1.8 * f.s, sleeperH, 'fill="#6f5843"'));
    for (const side of [-1, 1])
      parts.push(
        rect(
          f.X(offset + (side * g) / 2) - rail / 2,
          f.Y(d.top) - sleeperH - rail * 2,
          rail,
          rail * 2,
          'fill="#50555c"',
        ),
      );
  }
  return parts;
}

/** A zigzag gap across a leg drawn shorter than it is. */
const breakMark = (x: number, y: number, w: number) =>
  `<path d="M${x} ${y - 6} l${w / 4} -6 l${w / 4} 12 l${w / 4} -12 l${w / 4} 6 v12 l${-w / 4} -6 l${-w / 4} 12` +
  ` l${-w / 4} -12 l${-w / 4} 6 Z" fill="#f7f4ec" stroke="${TIMBER_EDGE}"/>`;

/** What holds the board up: legs to the floor, a bracket off the wall, or trestles that do not come with it. */
function supports(b: BoardDrawing, f: Frame, lowestFrame: number, upperFrame: number): string[] {
  const c = b.construction;
  const legW = 44;
  if (c.supports === 'legs')
    return [c.frameThicknessMm, b.widthMm - c.frameThicknessMm - legW].flatMap((x) => [
      rect(f.X(x), f.Y(upperFrame), legW * f.s, f.Y(0) - f.Y(upperFrame), `fill="${TIMBER}" stroke="${TIMBER_EDGE}"`),
      f.breakY === null ? '' : breakMark(f.X(x) - 8, f.breakY, legW * f.s + 16),
    ]);
  if (c.supports === 'wall-brackets') {
    const wall = f.X(b.widthMm);
    const top = Math.max(120, f.Y(upperFrame + 250));
    const foot = Math.min(f.Y(lowestFrame) + b.widthMm * 0.6 * f.s, (f.breakY ?? AREA.floor) - 16);
    return [
      rect(wall, top, 24, f.Y(0) - top, 'fill="#d9d4c9" stroke="#9d968a"'),
      `<path d="M${wall} ${f.Y(lowestFrame)} L${f.X(b.widthMm * 0.2)} ${f.Y(lowestFrame)} L${wall} ${foot} Z"` +
        ` fill="none" stroke="#50555c" stroke-width="4"/>`,
      text(wall + 30, top + 30, 'wall', { size: 14, fill: '#555b66' }),
    ];
  }
  const style = `fill="none" stroke="#9d968a" stroke-width="2" stroke-dasharray="6 4"`;
  return [
    `<path d="M${f.X(b.widthMm * 0.1)} ${f.Y(0)} L${f.X(b.widthMm * 0.3)} ${f.Y(lowestFrame)} L${f.X(b.widthMm * 0.5)} ${f.Y(0)}" ${style}/>`,
    `<path d="M${f.X(b.widthMm * 0.5)} ${f.Y(0)} L${f.X(b.widthMm * 0.7)} ${f.Y(lowestFrame)} L${f.X(b.widthMm * 0.9)} ${f.Y(0)}" ${style}/>`,
    text(f.X(b.widthMm) + 16, (f.Y(0) + f.Y(lowestFrame)) / 2, 'trestles, not included', { size: 14, fill: '#555b66' }),
  ];
}

/** The rail-top height dimensioned from the datum, and each track's offset from the front edge. */
function dimensions(b: BoardDrawing, f: Frame, railTop: number, upper: Deck, datum: string): string[] {
  const x = f.X(0) - 70;
  const mid = (f.Y(0) + f.Y(railTop)) / 2 - (f.breakY === null ? 0 : 40);
  const parts = [
    line(x, f.Y(0), x, f.Y(railTop), `stroke="${RED}" stroke-width="1.5"`),
    line(x - 8, f.Y(railTop), f.X(0) - 4, f.Y(railTop), `stroke="${RED}" stroke-dasharray="4 3"`),
    line(x - 8, f.Y(0), x + 8, f.Y(0), `stroke="${RED}" stroke-width="1.5"`),
    text(x - 12, mid, `${b.ends.a.railTopHeightMm} mm`, { size: 16, weight: 'bold', anchor: 'end', fill: RED }),
    text(x - 12, mid + 20, `rail top above ${datum}`, { size: 13, anchor: 'end', fill: RED }),
  ];
  if (f.breakY !== null)
    parts.push(
      breakMark(x - 10, f.breakY, 20),
      text(x - 14, f.breakY + 5, 'shortened in the drawing', { size: 13, anchor: 'end', fill: '#555b66' }),
    );
  upper.tracks.forEach((offset, i) => {
    const y = f.Y(upper.top) - 40 - i * 22;
    parts.push(line(f.X(0), y, f.X(offset), y, `stroke="${RED}" stroke-width="1"`));
    parts.push(line(f.X(offset), y - 5, f.X(offset), f.Y(upper.top) - 6, `stroke="${RED}" stroke-dasharray="3 3"`));
    parts.push(text(f.X(offset) + 6, y - 4, `${offset}`, { size: 13, fill: RED }));
  });
  parts.push(text(f.X(0), f.Y(upper.top) - 52 - upper.tracks.length * 22, 'front', { size: 14, anchor: 'middle' }));
  parts.push(
    text(f.X(b.widthMm), f.Y(upper.top) - 52 - upper.tracks.length * 22, 'back', { size: 14, anchor: 'middle' }),
  );
  return parts;
}

/**
 * End elevation from end A: the frame and top in section, the second deck and its storage roads on a two-level
 * board, legs, brackets or trestles, the rail-top height above the floor (or frame) and each track's offset from the
 * front edge, and a scale rule across the width.
 */
export function endView(b: BoardDrawing): string {
  const c = b.construction;
  const g = b.scale.gaugeMm;
  const trackHeight = Math.max(3, Math.round(g * 0.5));
  const fromFloor = b.ends.a.railTopFrom === 'floor';
  const depth = c.frameDepthMm + (c.topThicknessMm ?? 0);
  const upperTop = fromFloor ? b.ends.a.railTopHeightMm - trackHeight : depth;
  const lowerTop = b.deckGapMm ? upperTop - b.deckGapMm : null;
  const railTop = upperTop + trackHeight;
  const lowestFrame = (lowerTop ?? upperTop) - depth;
  const f = frameOf(b, lowestFrame, railTop + 60, fromFloor);
  const upper: Deck = { top: upperTop, tracks: b.ends.a.trackOffsetsMm };
  const roads = Math.max(2, Math.min(6, Math.floor((b.widthMm * 0.7) / (g * 4))));
  const lower: Deck | null =
    lowerTop === null
      ? null
      : { top: lowerTop, tracks: Array.from({ length: roads }, (_, i) => (b.widthMm * (i + 1)) / (roads + 1)) };
  const body = [
    fromFloor ? rect(40, AREA.floor, 1120, 8, 'fill="#cfc8b8"') : '',
    ...(fromFloor ? supports(b, f, lowestFrame, upperTop - depth) : []),
    ...(lower ? deck(b, f, lower) : []),
    ...deck(b, f, upper),
    ...dimensions(b, f, railTop, upper, fromFloor ? 'the floor' : 'the frame'),
    scaleRule(f.X(0), AREA.floor + 40, b.widthMm, f.s),
  ];
  if (lower)
    body.push(text(f.X(b.widthMm) + 16, f.Y(lower.top) - 4, `storage deck, ${b.deckGapMm} mm below`, { size: 14 }));
  const top =
    c.topMaterial === 'none'
      ? 'no top'
      : `${c.topThicknessMm} mm ${TOP_MATERIAL_LABELS[c.topMaterial].toLowerCase()} top`;
  const subtitle = `End A elevation · ${b.scaleText} · ${b.widthMm} mm wide`;
  const footer = [
    `Frame ${c.frameDepthMm} × ${c.frameThicknessMm} mm, ${top}; ${SUPPORT_LABELS[c.supports].toLowerCase()}.`,
    'Red: rail-top height and track offsets from the front edge, mm.',
  ];
  return sheet(b.caption, subtitle, body, footer);
}
