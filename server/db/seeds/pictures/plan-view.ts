import { TOP_MATERIAL_LABELS } from '../../../../shared/listings/vocabulary';
import { hasTrack, planLayout, type BoardDrawing, type PlanLayout } from './board';
import { drawTrackLayout, trackLayout } from './track-layout';
import { INK, PLY, TIMBER, TIMBER_EDGE, line, rect, scaleRule, sheet, text } from './svg';

/** The frame members seen from above: two side rails, two end rails, and cross members at the listed spacing. */
function frameMembers(b: BoardDrawing, p: PlanLayout, hidden: boolean): string[] {
  const { lengthMm: L, widthMm: W } = b;
  const t = b.construction.frameThicknessMm;
  const style = hidden
    ? `fill="${TIMBER}" fill-opacity="0.45" stroke="${TIMBER_EDGE}" stroke-width="1.2" stroke-dasharray="6 4"`
    : `fill="${TIMBER}" stroke="${TIMBER_EDGE}" stroke-width="1.2"`;
  const member = (x: number, y: number, w: number, h: number) =>
    rect(p.x0 + x * p.s, p.y0 + y * p.s, w * p.s, h * p.s, style);
  const parts = [
    member(0, 0, L, t),
    member(0, W - t, L, t),
    member(0, t, t, W - 2 * t),
    member(L - t, t, t, W - 2 * t),
  ];
  const spacing = b.construction.crossMemberSpacingMm;
  for (let x = spacing; x < L - t - spacing / 4; x += spacing) parts.push(member(x - t / 2, t, t, W - 2 * t));
  return parts;
}

/** Each end's track offsets, marked and figured at the board's edge. */
function endMarks(b: BoardDrawing, p: PlanLayout): string[] {
  const parts: string[] = [];
  const y = (offset: number) => p.y0 + (b.widthMm - offset) * p.s;
  for (const [end, x, anchor] of [
    ['a', p.x0 - 10, 'end'],
    ['b', p.x0 + b.lengthMm * p.s + 10, 'start'],
  ] as const) {
    for (const offset of b.ends[end].trackOffsetsMm) {
      parts.push(line(x - 6, y(offset), x + 6, y(offset), `stroke="#b3261e" stroke-width="2"`));
      parts.push(
        text(anchor === 'end' ? x - 10 : x + 10, y(offset) + 5, String(offset), { size: 13, anchor, fill: '#b3261e' }),
      );
    }
    const label = end.toUpperCase();
    parts.push(
      text(anchor === 'end' ? x - 10 : x + 10, p.y0 - 8, `End ${label}`, { size: 15, weight: 'bold', anchor }),
    );
  }
  return parts;
}

/** The width, dimensioned beside end B, and the front edge named. */
function widthDimension(b: BoardDrawing, p: PlanLayout): string[] {
  const x = p.x0 + b.lengthMm * p.s + 48;
  const top = p.y0;
  const bottom = p.y0 + b.widthMm * p.s;
  return [
    line(x, top, x, bottom, `stroke="${INK}" stroke-width="1.2"`),
    line(x - 6, top, x + 6, top),
    line(x - 6, bottom, x + 6, bottom),
    text(x + 10, (top + bottom) / 2 + 5, `${b.widthMm} mm`, { size: 14, weight: 'bold' }),
    text(p.x0 + (b.lengthMm * p.s) / 2, bottom + 18, 'front edge', { size: 13, anchor: 'middle', fill: '#555b66' }),
  ];
}

/**
 * Plan of the board's frame: rails and cross members at the listed spacing (dashed when a top hides them), the top
 * as a translucent sheet, the track centre lines or laid track at the end-profile offsets, a scale rule in mm.
 */
export function planView(b: BoardDrawing): string {
  const p = planLayout(b);
  const c = b.construction;
  const hasTop = c.topMaterial !== 'none';
  const body = [
    hasTop
      ? rect(p.x0, p.y0, b.lengthMm * p.s, b.widthMm * p.s, `fill="${PLY}" stroke="${TIMBER_EDGE}" stroke-width="1.5"`)
      : '',
    ...frameMembers(b, p, hasTop),
  ];
  body.push(drawTrackLayout(b, p, trackLayout(b)));
  body.push(...endMarks(b, p), ...widthDimension(b, p));
  body.push(scaleRule(p.x0, p.y0 + b.widthMm * p.s + 40, b.lengthMm, p.s));
  const top = hasTop ? `${c.topThicknessMm} mm ${TOP_MATERIAL_LABELS[c.topMaterial].toLowerCase()} top` : 'no top';
  const subtitle = `Plan of the frame · ${b.scaleText} · ${b.lengthMm} × ${b.widthMm} mm`;
  const marked = b.ends.a.trackOffsetsMm.length + b.ends.b.trackOffsetsMm.length > 0;
  const footer = [
    `Frame ${c.frameDepthMm} × ${c.frameThicknessMm} mm, cross members at ${c.crossMemberSpacingMm} mm centres, ${top}.`,
    marked
      ? `Red figures: track offsets from the front edge, mm.${hasTrack(b.finish) ? '' : ' Dashed red: where the tracks will run.'}`
      : '',
  ].filter(Boolean);
  return sheet(b.caption, subtitle, body, footer);
}
