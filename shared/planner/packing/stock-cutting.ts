import { packDecreasing, type FitRule } from './fit-decreasing';
import { packByBarFill, type FillStrategy } from './fill-greedy';
import { toLinearProblem, type LinearProblem } from './stock-input';
import { isBetterStockPlan, planCost, toStockPlan } from './stock-plan';
import type { StockAlgorithm, StockCuttingInput, StockCuttingPlan } from './stock-types';

const FILL_STRATEGIES: readonly [StockAlgorithm, FillStrategy][] = [
  ['bar-fill-ratio', { stock: 'ratio', anchored: false }],
  ['bar-fill-longest', { stock: 'longest', anchored: false }],
  ['bar-fill-anchored-ratio', { stock: 'ratio', anchored: true }],
  ['bar-fill-anchored-longest', { stock: 'longest', anchored: true }],
];

/**
 * First-Fit Decreasing: longest piece first, each onto the first bar with room, bars opened at the longest stock
 * length and then each cut from the cheapest (or shortest) length that holds it. The baseline plans are compared with.
 * Throws {@link PlannerInputError} when the input cannot be planned, e.g. a part longer than any stock.
 */
export function firstFitDecreasing(input: StockCuttingInput): StockCuttingPlan {
  return decreasingPlan(toLinearProblem(input), 'first');
}

/** Best-Fit Decreasing: as {@link firstFitDecreasing}, but each piece goes to the open bar it leaves least room on. */
export function bestFitDecreasing(input: StockCuttingInput): StockCuttingPlan {
  return decreasingPlan(toLinearProblem(input), 'best');
}

/**
 * Plans the cutting of every part from the stock on sale, kerf and end trim included.
 *
 * Runs First- and Best-Fit Decreasing and four variants of a repeated "fill the bar best" (an exact bounded
 * knapsack per bar), then returns the cheapest plan (least stock length when unpriced; then fewest bars) among
 * those that use neither more bars nor more money (or stock length) than First-Fit Decreasing — so it is never
 * worse than First-Fit Decreasing. Throws {@link PlannerInputError} naming the part or field at fault.
 */
export function planStockCutting(input: StockCuttingInput): StockCuttingPlan {
  const problem = toLinearProblem(input);
  const baseline = decreasingPlan(problem, 'first');
  let best = baseline;
  const candidates = [
    () => decreasingPlan(problem, 'best'),
    ...FILL_STRATEGIES.map(
      ([name, strategy]) =>
        () =>
          toStockPlan(packByBarFill(problem, strategy), problem, name),
    ),
  ];
  for (const make of candidates) {
    const plan = make();
    const noWorseThanBaseline = plan.stockCount <= baseline.stockCount && planCost(plan) <= planCost(baseline);
    if (noWorseThanBaseline && isBetterStockPlan(plan, best)) best = plan;
  }
  return best;
}

function decreasingPlan(problem: LinearProblem, rule: FitRule): StockCuttingPlan {
  const bars = packDecreasing(problem.pieces, problem.maxRoom, problem.kerf, rule);
  return toStockPlan(bars, problem, rule === 'first' ? 'first-fit-decreasing' : 'best-fit-decreasing');
}
