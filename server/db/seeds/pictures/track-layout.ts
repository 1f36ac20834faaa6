import { hasTrack, type BoardDrawing, type PlanLayout } from './board';

/** A point on the board: mm along it from end A, and mm in from the front edge. */
export type Point = readonly [along: number, offset: number];

/** Track centre lines, buffer stops, and every offset a track runs at (mm from the front). */
export interface TrackLayout {
  tracks: Point[][];
  stops: [Point, Point][];
  offsets: number[];
}

/** Smooth step from 0 to 1: the shape of the easement between two offsets, level at both ends. */
const ease = (t: number) => t * t * (3 - 2 * t);

/** From (x1, o1) to (x2, o2), level at both ends. */
function curve(x1: number, o1: number, x2: number, o2: number): Point[] {
  if (o1 === o2)
    return [
      [x1, o1],
      [x2, o2],
    ];
  return Array.from({ length: 33 }, (_, i) => [x1 + ((x2 - x1) * i) / 32, o1 + (o2 - o1) * ease(i / 32)] as const);
}

/** Extra tracks at one end leave the nearest through track by a turnout (mirrored for end A). */
function branches(from: number[], to: number[], n: number, L: number, mirror: boolean): Point[][] {
  return to.slice(n).map((extra) => {
    const k = to.slice(0, n).reduce((best, o, i) => (Math.abs(o - extra) < Math.abs(to[best]! - extra) ? i : best), 0);
    const start = from[k]! + (to[k]! - from[k]!) * ease(mirror ? 0.7 : 0.3);
    const [x1, x2, x3] = mirror ? [0.7 * L, 0.3 * L, 0] : [0.3 * L, 0.7 * L, L];
    return [...curve(x1, start, x2, extra), [x3, extra]];
  });
}

/** Entry tracks from one end fanning into roads, each ending at a buffer stop. */
function fan(b: BoardDrawing, entry: number[], fromB: boolean): TrackLayout {
  const L = b.lengthMm;
  const W = b.widthMm;
  const spacing = Math.max(b.scale.gaugeMm * 3.2, 20);
  // A fiddle yard fans across the board; a sceniced terminus keeps to three roads beside its entry.
  const scenic = b.finish === 'part-sceniced' || b.finish === 'fully-sceniced';
  const roads = scenic ? 3 : Math.max(2, Math.min(8, Math.floor((W * 0.8) / spacing)));
  const middle = scenic ? entry.reduce((sum, o) => sum + o, 0) / entry.length : W / 2;
  const first = Math.max(spacing, Math.min(W - spacing * roads, middle - ((roads - 1) * spacing) / 2));
  const at = (mm: number) => (fromB ? L - mm : mm);
  const layout: TrackLayout = {
    tracks: entry.map((o) => [
      [at(0), o],
      [at(0.15 * L), o],
    ]),
    stops: [],
    offsets: [],
  };
  for (let i = 0; i < roads; i += 1) {
    const road = first + i * spacing;
    const from = entry.reduce((best, o) => (Math.abs(o - road) < Math.abs(best - road) ? o : best), entry[0]!);
    layout.tracks.push([...curve(at(0.15 * L), from, at(0.45 * L), road), [at(0.95 * L), road]]);
    layout.stops.push([
      [at(0.95 * L), road + spacing * 0.3],
      [at(0.95 * L), road - spacing * 0.3],
    ]);
    layout.offsets.push(road);
  }
  return layout;
}

/** A plain oval, for a board whose ends carry no track. */
function oval(b: BoardDrawing): Point[] {
  const inset = Math.min(b.lengthMm, b.widthMm) * 0.15;
  const r = b.widthMm / 2 - inset;
  const [left, right, mid] = [inset + r, b.lengthMm - inset - r, b.widthMm / 2];
  const arc = (cx: number, from: number): Point[] =>
    Array.from({ length: 25 }, (_, i) => {
      const angle = from - (Math.PI * i) / 24;
      return [cx + r * Math.cos(angle), mid + r * Math.sin(angle)] as const;
    });
  return [...arc(right, Math.PI / 2), ...arc(left, -Math.PI / 2), [right, mid + r]];
}

/**
 * The board's track, from its end profiles: tracks that meet at both ends run across (easing where the offsets
 * differ); extra tracks at one end leave the nearest through track by a turnout; an end with tracks facing an end
 * with none fans out into roads ending at buffer stops; a board with track laid but none at its ends has an oval.
 */
export function trackLayout(b: BoardDrawing): TrackLayout {
  const L = b.lengthMm;
  const a = b.ends.a.trackOffsetsMm;
  const z = b.ends.b.trackOffsetsMm;
  const n = Math.min(a.length, z.length);
  if (n > 0) {
    const through = a.slice(0, n).map((o, i) => curve(0, o, L, z[i]!));
    const tracks = [...through, ...branches(a, z, n, L, false), ...branches(z, a, n, L, true)];
    return { tracks, stops: [], offsets: [...a, ...z] };
  }
  if (a.length || z.length) {
    const yard = fan(b, a.length ? a : z, !a.length);
    return { ...yard, offsets: [...a, ...z, ...yard.offsets] };
  }
  return hasTrack(b.finish) ? { tracks: [oval(b)], stops: [], offsets: [] } : { tracks: [], stops: [], offsets: [] };
}

const r1 = (n: number) => Math.round(n * 10) / 10;

/** A polyline of canvas points as SVG path data. */
const pathOf = (points: readonly (readonly [number, number])[]) =>
  `M${points.map(([x, y]) => `${r1(x)} ${r1(y)}`).join(' L')}`;

/** The polyline moved sideways by `d` pixels along its normals: one rail of a track. */
function sideways(points: readonly (readonly [number, number])[], d: number): [number, number][] {
  return points.map(([x, y], i) => {
    const [px, py] = points[Math.max(0, i - 1)]!;
    const [nx, ny] = points[Math.min(points.length - 1, i + 1)]!;
    const length = Math.hypot(nx - px, ny - py) || 1;
    return [x - ((ny - py) / length) * d, y + ((nx - px) / length) * d];
  });
}

/**
 * The layout drawn on a plan: laid track as ballast (when asked), sleepers as a dashed stroke and two rails offset
 * half the gauge either side; track not yet laid as dashed centre lines; buffer stops in red.
 */
export function drawTrackLayout(b: BoardDrawing, p: PlanLayout, layout: TrackLayout, ballast = false): string {
  const px = ([along, offset]: Point) => [p.x0 + along * p.s, p.y0 + (b.widthMm - offset) * p.s] as const;
  const lines = layout.tracks.map((t) => t.map(px));
  const gauge = Math.max(2.5, b.scale.gaugeMm * p.s);
  const each = (style: string, list = lines) =>
    list.map((l) => `<path d="${pathOf(l)}" fill="none" ${style}/>`).join('');
  const stops = layout.stops.map((s) => `<path d="${pathOf(s.map(px))}" stroke="#b3261e" stroke-width="3"/>`).join('');
  if (!hasTrack(b.finish)) return each('stroke="#b3261e" stroke-width="1.5" stroke-dasharray="10 6"') + stops;
  const sleeper = Math.max(1.5, gauge * 0.3);
  const rails = lines.flatMap((l) => [sideways(l, gauge / 2), sideways(l, -gauge / 2)]);
  return [
    ballast ? each(`stroke="#a39d92" stroke-width="${r1(gauge * 2.6)}"`) : '',
    each(`stroke="#6f5843" stroke-width="${r1(gauge * 1.8)}" stroke-dasharray="${r1(sleeper)} ${r1(sleeper * 1.6)}"`),
    each(`stroke="#50555c" stroke-width="${r1(Math.max(1.2, gauge * 0.14))}"`, rails),
    stops,
  ].join('');
}
