import type { LinearPiece } from './stock-input';

/** Which open bar takes the next piece: the first with room, or the one its piece fills most closely. */
export type FitRule = 'first' | 'best';

/**
 * Packs pieces (already longest first) into bars that each hold `room` usable mm, opening a bar only when no open
 * bar has room. Returns the pieces of each bar; the caller picks each bar's stock length afterwards.
 */
export function packDecreasing(
  pieces: readonly LinearPiece[],
  room: number,
  kerf: number,
  rule: FitRule,
): LinearPiece[][] {
  const capacity = room + kerf;
  const bars: LinearPiece[][] = [];
  const loads: number[] = [];
  for (const piece of pieces) {
    const weight = piece.length + kerf;
    const index = rule === 'first' ? firstWithRoom(loads, weight, capacity) : closestFit(loads, weight, capacity);
    if (index < 0) {
      bars.push([piece]);
      loads.push(weight);
    } else {
      bars[index]!.push(piece);
      loads[index]! += weight;
    }
  }
  return bars;
}

function firstWithRoom(loads: readonly number[], weight: number, capacity: number): number {
  return loads.findIndex((load) => load + weight <= capacity);
}

function closestFit(loads: readonly number[], weight: number, capacity: number): number {
  let best = -1;
  let bestLeft = Infinity;
  loads.forEach((load, i) => {
    const left = capacity - load - weight;
    if (left >= 0 && left < bestLeft) {
      best = i;
      bestLeft = left;
    }
  });
  return best;
}
