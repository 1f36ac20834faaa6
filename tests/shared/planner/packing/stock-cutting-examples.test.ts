import { describe, expect, it } from 'vitest';
import { PlannerInputError } from '../../../../shared/planner/packing/errors';
import { firstFitDecreasing, planStockCutting } from '../../../../shared/planner/packing/stock-cutting';

// Kerf 3 mm throughout: common practice, no source.
const KERF = 3;

describe('planStockCutting, worked by hand', () => {
  it('cuts four 1190 mm cross members from two 2400 mm lengths', () => {
    // 2400 mm stock: UK stock lengths: merchants' published lengths, multiples of 0.3 m (TRADE.md).
    // Two on a bar: 1190 + 3 + 1190 + 3 = 2386 ≤ 2400 (the second needs its cut: 14 mm would be left).
    // Three on a bar: 3 × 1190 + 2 × 3 = 3576 > 2400. So 2 bars, each used 2386, waste 14.
    const plan = planStockCutting({ parts: [{ id: 'cross', length: 1190, quantity: 4 }], stock: [{ length: 2400 }] });

    expect(plan.stockCount).toBe(2);
    expect(plan.bars.map((b) => [b.stockLength, b.cuts.length, b.sawCuts, b.used, b.waste])).toEqual([
      [2400, 2, 2, 2386, 14],
      [2400, 2, 2, 2386, 14],
    ]);
    expect(plan.totalWaste).toBe(28);
    expect(plan.wastePercent).toBeCloseTo((100 * 28) / 4800, 10);
    // Lower bound: 4 × (1190 + 3) = 4772 over 2400 + 3 = 2403 → 1.99 → 2 bars; parts 4 × 1190 = 4760 mm.
    expect(plan.lowerBound).toEqual({ bars: 2, length: 4760 });
  });

  it('finds two bars where First-Fit Decreasing needs three', () => {
    // Every piece is 240·a − 3 mm, so with its kerf it weighs 240·a; a 2400 mm bar holds weight 2400 + 3 (its last
    // piece needs no cut), i.e. pieces whose a add up to at most 10. Sizes a = 5, 4, 4, 3, 2, 2 (sum 20).
    // FFD, longest first: bar 1 takes 5 then 4 (9; nothing left fits in 1); bar 2 takes 4, 3, 2 (9);
    // bar 3 takes the last 2. Three bars.
    // Better: {5, 3, 2} and {4, 4, 2}, each a = 10: 1197 + 717 + 477 + 3 × 3 = 2400 and 957 + 957 + 477 + 9 = 2400.
    const input = {
      parts: [
        { id: 'A', length: 1197, quantity: 1 },
        { id: 'B', length: 957, quantity: 2 },
        { id: 'C', length: 717, quantity: 1 },
        { id: 'D', length: 477, quantity: 2 },
      ],
      stock: [{ length: 2400 }],
      kerf: KERF,
    };

    const ffd = firstFitDecreasing(input);
    const plan = planStockCutting(input);

    expect(ffd.stockCount).toBe(3);
    expect(plan.stockCount).toBe(2);
    expect(plan.algorithm).not.toBe('first-fit-decreasing');
    expect(plan.bars.map((b) => b.waste)).toEqual([0, 0]);
  });

  it('lets the last piece run to the end of the bar without a saw cut', () => {
    // 1200 + 3 + 1197 = 2400 exactly: one cut between the two pieces, none after the last.
    const plan = planStockCutting({
      parts: [
        { id: 'a', length: 1200, quantity: 1 },
        { id: 'b', length: 1197, quantity: 1 },
      ],
      stock: [{ length: 2400 }],
      kerf: KERF,
    });

    expect(plan.bars).toEqual([
      {
        stockLength: 2400,
        cuts: [
          { partId: 'a', length: 1200 },
          { partId: 'b', length: 1197 },
        ],
        sawCuts: 1,
        used: 2400,
        waste: 0,
      },
    ]);
  });

  it('charges the end trim once per bar', () => {
    // Without trim: 1195 + 3 + 1195 = 2393 ≤ 2400, one bar. With 10 mm squared off: 10 + 2393 = 2403 > 2400, two bars.
    const parts = [{ id: 'rail', length: 1195, quantity: 2 }];
    expect(planStockCutting({ parts, stock: [{ length: 2400 }], kerf: KERF }).stockCount).toBe(1);

    const trimmed = planStockCutting({ parts, stock: [{ length: 2400 }], kerf: KERF, trimPerStock: 10 });
    expect(trimmed.stockCount).toBe(2);
    // Each: 10 trim + 1195 + 3 (a 1192 mm offcut remains, so the piece is cut free) = 1208 used.
    expect(trimmed.bars.map((b) => b.used)).toEqual([1208, 1208]);
  });

  it('cuts each bar from the shortest UK stock length that holds it when unpriced', () => {
    // UK stock lengths: merchants' published lengths, multiples of 0.3 m (TRADE.md).
    // Three 1190 mm pieces: 3 × 1190 + 3 × 3 = 3579 ≤ 3600, but 3570 + 2 × 3 = 3576 > 3000: one 3600 mm bar.
    const plan = planStockCutting({ parts: [{ id: 'leg', length: 1190, quantity: 3 }], kerf: KERF });

    expect(plan.bars.map((b) => [b.stockLength, b.used, b.waste])).toEqual([[3600, 3579, 21]]);
    expect(plan.costMinor).toBeUndefined();
  });

  it('cuts a bar from a longer length when that length is the cheaper one', () => {
    // Three 1190 mm pieces need 3579 mm (above): 3600 or 4800 mm hold them. Unpriced, the shorter wins;
    // with 4800 mm on offer at 650 against 700 for 3600 mm, the 4800 mm bar wins.
    const parts = [{ id: 'leg', length: 1190, quantity: 3 }];
    const plan = planStockCutting({
      parts,
      kerf: KERF,
      stock: [
        { length: 3600, priceMinor: 700 },
        { length: 4800, priceMinor: 650 },
      ],
    });
    expect(plan.bars.map((b) => [b.stockLength, b.priceMinor, b.waste])).toEqual([[4800, 650, 4800 - 3579]]);
    expect(plan.costMinor).toBe(650);
  });

  it('never takes more bars than First-Fit Decreasing, even to save money', () => {
    // Two 2400 mm bars at 400 would cost 800, less than one 4800 mm bar at 900, but First-Fit Decreasing needs
    // one bar, and a plan is never allowed more bars (nor more cost) than that.
    const plan = planStockCutting({
      parts: [{ id: 'cross', length: 1190, quantity: 4 }],
      kerf: KERF,
      stock: [
        { length: 2400, priceMinor: 400 },
        { length: 4800, priceMinor: 900 },
      ],
    });
    expect(plan.bars.map((b) => b.stockLength)).toEqual([4800]);
    expect(plan.costMinor).toBe(900);
  });

  it('carries labels to the cut list and plans nothing for no parts', () => {
    const plan = planStockCutting({ parts: [{ id: 'x1', length: 600, quantity: 1, label: 'cross member' }] });
    expect(plan.bars[0]!.cuts).toEqual([{ partId: 'x1', length: 600, label: 'cross member' }]);

    const empty = planStockCutting({ parts: [] });
    expect(empty).toMatchObject({ bars: [], stockCount: 0, totalStockLength: 0, wastePercent: 0 });
  });
});

describe('planStockCutting refusing input', () => {
  it('names a part longer than the longest stock length', () => {
    // The longest UK stock length is 5400 mm: merchants' published lengths, multiples of 0.3 m (TRADE.md).
    const plan = () => planStockCutting({ parts: [{ id: 'long-rail', length: 6000, quantity: 1 }] });

    expect(plan).toThrow(PlannerInputError);
    expect(plan).toThrow(/"long-rail" is 6000 mm long but the longest timber on sale gives 5400 mm/);
    try {
      plan();
    } catch (error) {
      expect(error).toMatchObject({ code: 'part-too-long', partId: 'long-rail' });
    }
  });

  it('counts the end trim against the longest stock length', () => {
    const plan = () =>
      planStockCutting({ parts: [{ id: 'p', length: 2400, quantity: 1 }], stock: [{ length: 2400 }], trimPerStock: 5 });
    expect(plan).toThrow(/gives 2395 mm/);
  });

  it('refuses stock priced in part, fractional lengths and repeated part ids', () => {
    const parts = [{ id: 'p', length: 500, quantity: 1 }];
    expect(() => planStockCutting({ parts, stock: [{ length: 2400, priceMinor: 300 }, { length: 3000 }] })).toThrow(
      /price for every stock length, or for none/,
    );
    expect(() => planStockCutting({ parts: [{ id: 'p', length: 500.5, quantity: 1 }] })).toThrow(/whole number/);
    expect(() => planStockCutting({ parts: [...parts, ...parts] })).toThrow(/"p" is listed twice/);
    expect(() => planStockCutting({ parts, kerf: -1 })).toThrow(/kerf/);
  });
});
