/**
 * "Fill the bar best": a bounded subset-sum over the remaining pieces, answered for every stock length at once.
 *
 * Pieces are grouped by length; a group of `q` equal pieces becomes items of 1, 2, 4, … pieces so each count
 * 0..q can be formed. Reachable weights are kept as a bitset (bit w set ⇔ some choice of pieces weighs exactly w),
 * with one snapshot per item so the choice behind any reachable weight can be read back.
 */

/** Remaining pieces of one length. */
export interface LengthGroup {
  length: number;
  count: number;
}

/** Reachable weights of one group set, with the means to read a filling back. */
export interface FillTable {
  /** The heaviest reachable weight not above `capacity` (0 when nothing fits). */
  bestWeight(capacity: number): number;
  /** How many pieces of each group make up `weight`, which must be reachable. */
  countsFor(weight: number): number[];
}

interface Item {
  group: number;
  pieces: number;
  weight: number;
}

/** Memory one run of bar fills reuses from bar to bar; a table is valid until the next one built in it. */
export interface FillWorkspace {
  rows: Uint32Array;
}

/**
 * Builds the table for `groups` where a piece weighs `length + kerf` and no bar holds more than `maxCapacity`.
 * Pass the same `workspace` for every bar of a run to avoid reallocating.
 */
export function buildFillTable(
  groups: readonly LengthGroup[],
  kerf: number,
  maxCapacity: number,
  workspace: FillWorkspace = { rows: new Uint32Array(0) },
): FillTable {
  const items = splitIntoItems(groups, kerf, maxCapacity);
  const words = (maxCapacity >>> 5) + 1;
  // Row i holds the weights reachable with the first i items; all rows share one buffer.
  const size = (items.length + 1) * words;
  if (workspace.rows.length < size) workspace.rows = new Uint32Array(size);
  const rows = workspace.rows;
  rows.fill(0, 0, words);
  rows[0] = 1;
  items.forEach((item, i) => shiftOrRow(rows, i * words, words, item.weight));
  const lastRow = items.length * words;

  return {
    bestWeight: (capacity) => highestBitAtMost(rows, lastRow, Math.min(capacity, maxCapacity)),
    countsFor: (weight) => {
      const counts = groups.map(() => 0);
      let left = weight;
      for (let i = items.length; i > 0 && left > 0; i--) {
        if (hasBit(rows, (i - 1) * words, left)) continue;
        const item = items[i - 1]!;
        counts[item.group]! += item.pieces;
        left -= item.weight;
      }
      return counts;
    },
  };
}

function splitIntoItems(groups: readonly LengthGroup[], kerf: number, maxCapacity: number): Item[] {
  const items: Item[] = [];
  groups.forEach((g, group) => {
    const unit = g.length + kerf;
    let left = Math.min(g.count, Math.floor(maxCapacity / unit));
    for (let pieces = 1; left > 0; pieces *= 2) {
      const take = Math.min(pieces, left);
      items.push({ group, pieces: take, weight: take * unit });
      left -= take;
    }
  });
  return items;
}

/** Writes `row | (row << shift)` into the next row (bits pushed past the row's end are dropped). */
function shiftOrRow(rows: Uint32Array, from: number, words: number, shift: number): void {
  const to = from + words;
  const wordShift = shift >>> 5;
  const bitShift = shift & 31;
  for (let j = words - 1; j >= 0; j--) {
    let value = rows[from + j]!;
    const source = j - wordShift;
    if (source >= 0) {
      value |= rows[from + source]! << bitShift;
      if (bitShift !== 0 && source > 0) value |= rows[from + source - 1]! >>> (32 - bitShift);
    }
    rows[to + j] = value;
  }
}

function hasBit(rows: Uint32Array, row: number, index: number): boolean {
  return ((rows[row + (index >>> 5)]! >>> (index & 31)) & 1) === 1;
}

function highestBitAtMost(rows: Uint32Array, row: number, limit: number): number {
  let word = limit >>> 5;
  const top = limit & 31;
  let value = top === 31 ? rows[row + word]! : rows[row + word]! & ((1 << (top + 1)) - 1);
  for (;;) {
    if (value !== 0) return word * 32 + (31 - Math.clz32(value));
    if (word === 0) return 0;
    word--;
    value = rows[row + word]!;
  }
}
