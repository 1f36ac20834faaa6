import { FINISH_LABELS } from '../../../../shared/listings/vocabulary';
import { planLayout, type BoardDrawing, type PlanLayout } from './board';
import { drawTrackLayout, trackLayout } from './track-layout';
import { randomFrom } from '../random';
import { PLY, TIMBER_EDGE, rect, scaleRule, sheet } from './svg';

const GREENS = ['#8fa95a', '#9bb365', '#86a052', '#a4b874'];
const has = (b: BoardDrawing, ...words: string[]) => words.some((w) => b.caption.toLowerCase().includes(w));

/** Fields with hedges, or a bare landform half done, by how far the board is finished. */
function ground(b: BoardDrawing, p: PlanLayout, rnd: () => number): string[] {
  const w = b.lengthMm * p.s;
  const h = b.widthMm * p.s;
  if (b.finish === 'track-laid' || b.finish === 'wired-running')
    return [rect(p.x0, p.y0, w, h, `fill="${b.finish === 'wired-running' ? '#c9b994' : PLY}"`)];
  const parts = [rect(p.x0, p.y0, w, h, `fill="${b.finish === 'fully-sceniced' ? GREENS[0] : PLY}"`)];
  const fields = b.finish === 'fully-sceniced' ? 5 : 3;
  for (let i = 0; i < fields; i += 1) {
    const fw = w * (0.2 + rnd() * 0.3);
    const fh = h * (0.3 + rnd() * 0.4);
    const x = p.x0 + rnd() * (w - fw);
    const y = p.y0 + rnd() * (h - fh);
    parts.push(rect(x, y, fw, fh, `fill="${GREENS[i % GREENS.length]}" stroke="#5f7a35" stroke-width="3" rx="6"`));
  }
  return parts;
}

/** Water along the back for harbours and wharves; a river across the board under a viaduct or beside a drain. */
function water(b: BoardDrawing, p: PlanLayout): string[] {
  const w = b.lengthMm * p.s;
  const h = b.widthMm * p.s;
  if (has(b, 'harbour', 'wharf', 'quay'))
    return [rect(p.x0, p.y0, w, h * 0.28, 'fill="#7fa7c9"'), rect(p.x0, p.y0 + h * 0.28, w, 5, 'fill="#9b958a"')];
  if (has(b, 'viaduct', 'drain'))
    return [
      `<path d="M${p.x0 + w * 0.45} ${p.y0} C${p.x0 + w * 0.6} ${p.y0 + h * 0.4} ${p.x0 + w * 0.35} ${p.y0 + h * 0.6}` +
        ` ${p.x0 + w * 0.5} ${p.y0 + h}" fill="none" stroke="#7fa7c9" stroke-width="${Math.max(18, h * 0.12)}"/>`,
    ];
  return [];
}

/** Buildings and trees, kept to the back of the board so the track stays clear. */
function features(b: BoardDrawing, p: PlanLayout, rnd: () => number): string[] {
  if (!['part-sceniced', 'fully-sceniced'].includes(b.finish)) return [];
  const w = b.lengthMm * p.s;
  const h = b.widthMm * p.s;
  const parts: string[] = [];
  const buildings = has(b, 'station', 'terminus', 'halt', 'goods', 'shed', 'village', 'town', 'mill') ? 4 : 1;
  for (let i = 0; i < buildings; i += 1) {
    const bw = 30 + rnd() * 60;
    const bh = 20 + rnd() * 25;
    const x = p.x0 + 20 + rnd() * (w - bw - 40);
    const y = p.y0 + 8 + rnd() * Math.max(1, h * 0.25 - bh);
    parts.push(rect(x, y, bw, bh, 'fill="#b5654a" stroke="#6d3a2a" stroke-width="1.5"'));
    parts.push(
      `<line x1="${x}" y1="${y + bh / 2}" x2="${x + bw}" y2="${y + bh / 2}" stroke="#6d3a2a" stroke-width="1.5"/>`,
    );
  }
  if (has(b, 'quarry', 'slate', 'rock', 'mountain'))
    for (let i = 0; i < 3; i += 1) {
      const x = p.x0 + rnd() * w * 0.8;
      parts.push(`<path d="M${x} ${p.y0 + h * 0.3} l40 -50 l50 30 l30 20 Z" fill="#8c8f94" stroke="#5b5e63"/>`);
    }
  const trees = b.finish === 'fully-sceniced' ? 28 : 12;
  for (let i = 0; i < trees; i += 1) {
    const x = p.x0 + 10 + rnd() * (w - 20);
    const y = p.y0 + 10 + (rnd() < 0.7 ? rnd() * h * 0.3 : h * 0.8 + rnd() * h * 0.15);
    const radius = 6 + rnd() * 9;
    parts.push(
      `<circle cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${radius.toFixed(1)}" fill="#4f7a32" stroke="#355a20"/>`,
    );
  }
  return parts;
}

/** A platform (or loading bank) in front of the frontmost track, or behind the rearmost when the front is full. */
function platforms(b: BoardDrawing, p: PlanLayout, offsets: number[]): string[] {
  if (!has(b, 'station', 'terminus', 'halt', 'goods yard', 'loading') || offsets.length === 0) return [];
  const g = b.scale.gaugeMm;
  const depth = Math.max(g * 3, 20);
  const front = Math.min(...offsets) - g * 1.6 - depth;
  const at = front > 0 ? front : Math.max(...offsets) + g * 1.6;
  const y = p.y0 + (b.widthMm - at - depth) * p.s;
  return [
    rect(
      p.x0 + b.lengthMm * 0.25 * p.s,
      y,
      b.lengthMm * 0.5 * p.s,
      depth * p.s,
      'fill="#cfc8b8" stroke="#7d776b" stroke-width="1.5"',
    ),
  ];
}

/**
 * A plain top view of the board as it stands: bare top with track for track-laid boards, fields, trees, water and
 * buildings for sceniced ones (placed by a generator seeded from the listing, so it is the same every time).
 */
export function sceneView(b: BoardDrawing): string {
  const p = planLayout(b);
  const rnd = randomFrom(b.key);
  const sceniced = b.finish === 'part-sceniced' || b.finish === 'fully-sceniced';
  const layout = trackLayout(b);
  const w = b.lengthMm * p.s;
  const h = b.widthMm * p.s;
  const body = [
    `<clipPath id="board"><rect x="${p.x0}" y="${p.y0}" width="${w}" height="${h}"/></clipPath>`,
    '<g clip-path="url(#board)">',
    ...ground(b, p, rnd),
    ...(sceniced ? water(b, p) : []),
    ...features(b, p, rnd),
    drawTrackLayout(b, p, layout, true),
    ...platforms(b, p, layout.offsets),
    '</g>',
    rect(p.x0, p.y0, b.lengthMm * p.s, b.widthMm * p.s, `fill="none" stroke="${TIMBER_EDGE}" stroke-width="3"`),
    scaleRule(p.x0, p.y0 + b.widthMm * p.s + 40, b.lengthMm, p.s),
  ];
  const subtitle = `Top view · ${b.scaleText} · ${b.lengthMm} × ${b.widthMm} mm · ${FINISH_LABELS[b.finish].toLowerCase()}`;
  return sheet(b.caption, subtitle, body, ['Drawn from the listing’s details for the demo, not a photograph.']);
}
