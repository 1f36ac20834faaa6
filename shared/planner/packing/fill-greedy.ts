import { buildFillTable, type FillWorkspace, type LengthGroup } from './bar-fill';
import type { LinearPiece, LinearProblem } from './stock-input';

/** How the repeated bar fill picks each bar's stock length. */
export interface FillStrategy {
  /**
   * 'ratio': the length carrying the most piece weight per unit of price (per mm when unpriced);
   * 'longest': always the longest length, shortened afterwards if a shorter one holds the bar.
   */
  stock: 'ratio' | 'longest';
  /** Put the longest remaining piece on each new bar before filling the rest, so long parts are not left to the end. */
  anchored: boolean;
}

/**
 * Cuts one bar at a time, choosing the pieces that fill it as fully as possible (an exact bounded knapsack per
 * bar, kerf included), until every piece is placed. Returns the pieces of each bar.
 */
export function packByBarFill(problem: LinearProblem, strategy: FillStrategy): LinearPiece[][] {
  const { kerf, trim, stock } = problem;
  const groups = groupByLength(problem.pieces);
  const bars: LinearPiece[][] = [];
  const maxCapacity = problem.maxRoom + kerf;
  const workspace: FillWorkspace = { rows: new Uint32Array(0) };
  for (;;) {
    const live = groups.filter((g) => g.pieces.length > 0);
    if (live.length === 0) return bars;
    const anchor = strategy.anchored ? live[0]! : undefined;
    const anchorWeight = anchor ? anchor.length + kerf : 0;
    const counts: LengthGroup[] = live.map((g) => ({
      length: g.length,
      count: g.pieces.length - (g === anchor ? 1 : 0),
    }));
    const table = buildFillTable(counts, kerf, maxCapacity - anchorWeight, workspace);

    let chosen = { score: -Infinity, weight: 0 };
    const candidates = strategy.stock === 'longest' ? stock.slice(-1) : stock;
    for (const s of candidates) {
      const capacity = s.length - trim + kerf - anchorWeight;
      if (capacity < 0) continue;
      const weight = table.bestWeight(capacity) + anchorWeight;
      if (weight === 0) continue;
      const score = weight / (problem.priced ? Math.max(s.priceMinor!, 1e-9) : s.length);
      if (score > chosen.score || (score === chosen.score && weight > chosen.weight)) chosen = { score, weight };
    }

    const taken = table.countsFor(chosen.weight - anchorWeight);
    const bar: LinearPiece[] = anchor ? [anchor.pieces.pop()!] : [];
    live.forEach((g, i) => {
      for (let n = 0; n < taken[i]!; n++) bar.push(g.pieces.pop()!);
    });
    bar.sort((a, b) => b.length - a.length);
    bars.push(bar);
  }
}

interface PieceGroup {
  length: number;
  pieces: LinearPiece[];
}

/** Groups pieces by length, longest group first (the input is already longest first). */
function groupByLength(pieces: readonly LinearPiece[]): PieceGroup[] {
  const groups: PieceGroup[] = [];
  for (const piece of pieces) {
    const last = groups[groups.length - 1];
    if (last && last.length === piece.length) last.pieces.push(piece);
    else groups.push({ length: piece.length, pieces: [piece] });
  }
  for (const g of groups) g.pieces.reverse();
  return groups;
}
