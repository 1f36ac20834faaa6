import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildFillTable } from '../../../../shared/planner/packing/bar-fill';
import {
  bestFitDecreasing,
  firstFitDecreasing,
  planStockCutting,
} from '../../../../shared/planner/packing/stock-cutting';
import type { StockCuttingInput, StockCuttingPlan } from '../../../../shared/planner/packing/stock-types';
import { linearInput } from './arbitraries';

const cost = (plan: StockCuttingPlan) => plan.costMinor ?? plan.totalStockLength;

/** Every check a plan must pass for its input, whichever method made it. */
function expectSoundPlan(plan: StockCuttingPlan, input: StockCuttingInput): void {
  const kerf = input.kerf ?? 3;
  const trim = input.trimPerStock ?? 0;
  const stockLengths = new Set((input.stock ?? []).map((s) => s.length));

  const wanted = input.parts.flatMap((p) => Array.from({ length: p.quantity }, () => `${p.id}:${p.length}`)).sort();
  const cut = plan.bars.flatMap((b) => b.cuts.map((c) => `${c.partId}:${c.length}`)).sort();
  expect(cut).toEqual(wanted);

  for (const bar of plan.bars) {
    const parts = bar.cuts.reduce((sum, c) => sum + c.length, 0);
    const n = bar.cuts.length;
    expect(n).toBeGreaterThan(0);
    expect(stockLengths.has(bar.stockLength)).toBe(true);
    // The kerf convention: a cut after every piece but the last, which needs one only if a kerf's width remains.
    expect(bar.sawCuts).toBe(trim + parts + n * kerf <= bar.stockLength ? n : n - 1);
    expect(bar.used).toBe(trim + parts + kerf * bar.sawCuts);
    expect(bar.used).toBeLessThanOrEqual(bar.stockLength);
    expect(bar.waste).toBe(bar.stockLength - bar.used);
    expect(bar.waste).toBeGreaterThanOrEqual(0);
  }
  expect(plan.stockCount).toBe(plan.bars.length);
  expect(plan.totalStockLength).toBe(plan.bars.reduce((sum, b) => sum + b.stockLength, 0));
  expect(plan.totalWaste).toBe(plan.bars.reduce((sum, b) => sum + b.waste, 0));
  expect(plan.stockCount).toBeGreaterThanOrEqual(plan.lowerBound.bars);
  expect(plan.lowerBound.length).toBe(input.parts.reduce((sum, p) => sum + p.length * p.quantity, 0));
}

describe('planStockCutting, for any parts list on UK stock lengths', () => {
  // UK stock lengths: merchants' published lengths, multiples of 0.3 m (TRADE.md); kerf 0–6 mm, common practice.
  it('cuts every piece exactly once, keeps each bar within its stock length and never wastes below zero', () => {
    fc.assert(
      fc.property(linearInput, (input) => expectSoundPlan(planStockCutting(input), input)),
      { numRuns: 300 },
    );
  });

  it('never uses more bars, nor more money or stock length, than First-Fit Decreasing', () => {
    fc.assert(
      fc.property(linearInput, (input) => {
        const plan = planStockCutting(input);
        const ffd = firstFitDecreasing(input);
        expect(plan.stockCount).toBeLessThanOrEqual(ffd.stockCount);
        expect(cost(plan)).toBeLessThanOrEqual(cost(ffd));
      }),
      { numRuns: 300 },
    );
  });

  it('gives sound plans from First- and Best-Fit Decreasing too', () => {
    fc.assert(
      fc.property(linearInput, (input) => {
        expectSoundPlan(firstFitDecreasing(input), input);
        expectSoundPlan(bestFitDecreasing(input), input);
      }),
      { numRuns: 150 },
    );
  });

  it('returns the same plan for the same input', () => {
    fc.assert(
      fc.property(linearInput, (input) => {
        expect(planStockCutting(input)).toEqual(planStockCutting(input));
      }),
      { numRuns: 50 },
    );
  });
});

describe('the bar fill table', () => {
  const groups = fc.array(
    fc.record({ length: fc.integer({ min: 1, max: 700 }), count: fc.integer({ min: 0, max: 3 }) }),
    { maxLength: 4 },
  );

  it('finds the heaviest load of pieces that fits, and the pieces that make it up', () => {
    fc.assert(
      fc.property(groups, fc.integer({ min: 0, max: 5 }), fc.integer({ min: 1, max: 2500 }), (gs, kerf, max) => {
        const table = buildFillTable(gs, kerf, max);
        // Every reachable load by brute force: each group contributes 0..count pieces.
        let loads = [0];
        for (const g of gs) {
          loads = loads.flatMap((l) => Array.from({ length: g.count + 1 }, (_, n) => l + n * (g.length + kerf)));
        }
        for (const capacity of [0, Math.floor(max / 3), Math.floor(max / 2), max]) {
          const best = Math.max(...loads.filter((l) => l <= capacity));
          expect(table.bestWeight(capacity)).toBe(best);
          const counts = table.countsFor(best);
          counts.forEach((n, i) => expect(n).toBeLessThanOrEqual(gs[i]!.count));
          expect(counts.reduce((sum, n, i) => sum + n * (gs[i]!.length + kerf), 0)).toBe(best);
        }
      }),
      { numRuns: 300 },
    );
  });
});
