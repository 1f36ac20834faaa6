import type { Placement, PlanRect } from './types';

const COS = [1, 0, -1, 0] as const;
const SIN = [0, 1, 0, -1] as const;

function quarterTurns(rotationDeg: number): 0 | 1 | 2 | 3 {
  return (((Math.round(rotationDeg / 90) % 4) + 4) % 4) as 0 | 1 | 2 | 3;
}

/** A point in a board's own coordinates, in room coordinates. */
export function toRoom(placement: Placement, x: number, y: number): { x: number; y: number } {
  const k = quarterTurns(placement.rotationDeg);
  return { x: placement.x + x * COS[k] - y * SIN[k], y: placement.y + x * SIN[k] + y * COS[k] };
}

/** A rectangle in a board's own coordinates, in room coordinates. */
export function rectToRoom(placement: Placement, rect: PlanRect): PlanRect {
  const a = toRoom(placement, rect.x, rect.y);
  const b = toRoom(placement, rect.x + rect.width, rect.y + rect.height);
  const x = Math.min(a.x, b.x);
  const y = Math.min(a.y, b.y);
  return { x, y, width: Math.abs(b.x - a.x), height: Math.abs(b.y - a.y) };
}

/** A board's outline in room coordinates. */
export function outlineOf(placement: Placement, lengthMm: number, widthMm: number): PlanRect {
  return rectToRoom(placement, { x: 0, y: 0, width: lengthMm, height: widthMm });
}

/**
 * Splits a run into the fewest boards no longer than `maxMm`, as equal as whole millimetres allow: the first
 * boards take the odd millimetre, so the lengths add up to the run exactly.
 */
export function splitEvenly(totalMm: number, maxMm: number): number[] {
  const count = Math.max(1, Math.ceil(totalMm / maxMm));
  const base = Math.floor(totalMm / count);
  const extra = totalMm - base * count;
  return Array.from({ length: count }, (_, i) => base + (i < extra ? 1 : 0));
}

/**
 * The starting corner of each wall, walking clockwise from the origin: the first wall runs to the right, and each
 * corner turns a quarter turn clockwise. The rotation of boards along wall `i` is 90 × i degrees.
 */
export function wallCorners(wallLengthsMm: readonly number[]): { x: number; y: number }[] {
  const corners: { x: number; y: number }[] = [];
  let at = { x: 0, y: 0 };
  wallLengthsMm.forEach((length, i) => {
    corners.push(at);
    at = toRoom({ ...at, rotationDeg: 90 * i }, length, 0);
  });
  return corners;
}
