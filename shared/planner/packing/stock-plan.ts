import { barUsage, fitsOnBar } from './bar-kerf';
import type { LinearPiece, LinearProblem } from './stock-input';
import type { CutBar, StockAlgorithm, StockCuttingPlan, StockLength, StockLowerBound } from './stock-types';

/**
 * Turns packed bars into a plan: each bar gets the stock length that holds its pieces at the lowest price (the
 * shortest when unpriced, or on a tie), then the totals.
 */
export function toStockPlan(
  packed: readonly (readonly LinearPiece[])[],
  problem: LinearProblem,
  algorithm: StockAlgorithm,
): StockCuttingPlan {
  const bars = packed
    .filter((pieces) => pieces.length > 0)
    .map((pieces) => toBar(pieces, problem))
    .sort((a, b) => b.stockLength - a.stockLength || b.used - a.used);
  const totalStockLength = bars.reduce((sum, b) => sum + b.stockLength, 0);
  const totalWaste = bars.reduce((sum, b) => sum + b.waste, 0);
  const plan: StockCuttingPlan = {
    bars,
    stockCount: bars.length,
    totalStockLength,
    totalWaste,
    wastePercent: totalStockLength === 0 ? 0 : (100 * totalWaste) / totalStockLength,
    lowerBound: linearLowerBound(problem),
    algorithm,
    kerf: problem.kerf,
    trimPerStock: problem.trim,
  };
  if (problem.priced) plan.costMinor = bars.reduce((sum, b) => sum + b.priceMinor!, 0);
  return plan;
}

function toBar(pieces: readonly LinearPiece[], problem: LinearProblem): CutBar {
  const lengths = pieces.map((p) => p.length);
  const partsLength = lengths.reduce((sum, l) => sum + l, 0);
  const stock = cheapestHolding(problem.stock, pieces.length, partsLength, problem);
  const bar: CutBar = {
    stockLength: stock.length,
    cuts: pieces.map((p) => (p.label === undefined ? { partId: p.partId, length: p.length } : { ...p })),
    ...barUsage(lengths, stock.length, problem.kerf, problem.trim),
  };
  if (stock.priceMinor !== undefined) bar.priceMinor = stock.priceMinor;
  return bar;
}

function cheapestHolding(stock: readonly StockLength[], count: number, partsLength: number, problem: LinearProblem) {
  let best: StockLength | undefined;
  for (const s of stock) {
    if (!fitsOnBar(count, partsLength, s.length - problem.trim, problem.kerf)) continue;
    if (!best || (problem.priced && s.priceMinor! < best.priceMinor!)) best = s;
  }
  if (!best) throw new Error('A packed bar is longer than every stock length.');
  return best;
}

/**
 * Fewest bars of the longest stock any plan can use: the larger of (a) total piece weight over bar capacity,
 * where a piece weighs its length plus one kerf and a bar holds its usable length plus one kerf (its last piece
 * needs no cut), and (b) the number of pieces too long for any two of them to share a bar.
 */
export function linearLowerBound(problem: LinearProblem): StockLowerBound {
  const { pieces, kerf, maxRoom } = problem;
  const weight = pieces.reduce((sum, p) => sum + p.length + kerf, 0);
  const pairless = pieces.filter((p) => 2 * p.length + kerf > maxRoom).length;
  return {
    bars: Math.max(Math.ceil(weight / (maxRoom + kerf)), pairless),
    length: pieces.reduce((sum, p) => sum + p.length, 0),
  };
}

/** The plan's cost for comparison: its price when priced, else the stock length it buys. */
export function planCost(plan: StockCuttingPlan): number {
  return plan.costMinor ?? plan.totalStockLength;
}

/** Whether `a` beats `b`: lower cost (or stock length), then fewer bars, then less stock length. */
export function isBetterStockPlan(a: StockCuttingPlan, b: StockCuttingPlan): boolean {
  const keysA = [planCost(a), a.stockCount, a.totalStockLength];
  const keysB = [planCost(b), b.stockCount, b.totalStockLength];
  for (let i = 0; i < keysA.length; i++) if (keysA[i] !== keysB[i]) return keysA[i]! < keysB[i]!;
  return false;
}
