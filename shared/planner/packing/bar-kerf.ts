/**
 * Saw-cut arithmetic for one bar, following the convention on {@link CutBar}: each piece is followed by one cut,
 * except the last when less than one kerf would remain after it.
 *
 * In "weight" terms a piece costs `length + kerf` and a bar with `room` usable mm holds `room + kerf`, because the
 * last piece may go without its cut. The packers compare weights; the helpers below turn a bar back into mm.
 */

/** The saw cuts needed for `count` pieces totalling `partsLength` mm on a bar with `room` usable mm. */
export function sawCutsFor(count: number, partsLength: number, room: number, kerf: number): number {
  if (count === 0) return 0;
  return partsLength + count * kerf <= room ? count : count - 1;
}

/** Whether `count` pieces totalling `partsLength` mm fit a bar with `room` usable mm. */
export function fitsOnBar(count: number, partsLength: number, room: number, kerf: number): boolean {
  return count === 0 || partsLength + (count - 1) * kerf <= room;
}

/** How much of a bar the pieces take, trim and saw cuts included, and what is left over. */
export function barUsage(
  lengths: readonly number[],
  stockLength: number,
  kerf: number,
  trim: number,
): { sawCuts: number; used: number; waste: number } {
  const partsLength = lengths.reduce((sum, l) => sum + l, 0);
  const sawCuts = sawCutsFor(lengths.length, partsLength, stockLength - trim, kerf);
  const used = trim + partsLength + kerf * sawCuts;
  return { sawCuts, used, waste: stockLength - used };
}
