import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import { materialsCost } from '../../../shared/planner/plan/cost';
import { costPlan } from '../../../shared/planner/plan/costing';
import { priceBook } from '../../../shared/planner/plan/price-book';
import { addDays, planSchedule } from '../../../shared/planner/plan/schedule';
import type { ShoppingItem } from '../../../shared/planner/plan/shopping';

const items: ShoppingItem[] = [
  { itemKey: 'timber:uk-2x1:2400', description: '2x1, 2400 mm', quantity: 3, unit: 'length' },
  { itemKey: 'sheet:birch-ply:9:2440x1220', description: 'Birch 9 mm', quantity: 2, unit: 'sheet', cuts: 5 },
  { itemKey: 'screw:4x45', description: 'Screw 4 × 45', quantity: 100, unit: 'each' },
];

const book = priceBook([
  {
    name: 'Merchant',
    deliveryMinor: 2000,
    cuttingChargePerCutMinor: 40,
    items: [
      { itemKey: 'timber:uk-2x1:2400', priceMinor: 300 },
      { itemKey: 'sheet:birch-ply:9:2440x1220', priceMinor: 5000 },
      { itemKey: 'screw:4x45', priceMinor: 6 },
    ],
  },
  {
    name: 'Store',
    deliveryMinor: 0,
    items: [
      { itemKey: 'timber:uk-2x1:2400', priceMinor: 280 },
      { itemKey: 'screw:4x45', priceMinor: 5 },
    ],
  },
]);

describe('the cost of materials', () => {
  it('buys each item from whoever sells it cheapest, paying each supplier’s delivery once', () => {
    const cost = materialsCost(items, book, 'cheapest-per-item');
    expect(cost.lines.map((l) => [l.itemKey, l.supplier, l.totalMinor])).toEqual([
      ['timber:uk-2x1:2400', 'Store', 840],
      ['sheet:birch-ply:9:2440x1220', 'Merchant', 10_000],
      ['screw:4x45', 'Store', 500],
    ]);
    expect(cost.deliveryMinor).toBe(2000);
    expect(cost.cuttingMinor).toBe(5 * 40);
    expect(cost.totalMinor).toBe(840 + 10_000 + 500 + 2000 + 200);
    expect(cost.complete).toBe(true);
  });

  it('buys everything from the one supplier that sells the most, cheapest in all', () => {
    const cost = materialsCost(items, book, 'cheapest-supplier');
    expect(cost.suppliersUsed).toEqual(['Merchant']);
    expect(cost.totalMinor).toBe(900 + 10_000 + 600 + 2000 + 200);
  });

  it('leaves out and names the items nobody prices', () => {
    const cost = materialsCost(
      [...items, { itemKey: 'bracket:shelf', description: 'Bracket', quantity: 4, unit: 'each' }],
      book,
      'cheapest-per-item',
    );
    expect(cost.unpriced).toEqual(['bracket:shelf']);
    expect(cost.complete).toBe(false);
  });

  it('marks up what is paid to suppliers by the rate card’s basis points, rounded to a whole penny', () => {
    const rates = {
      perMetreFrameMinor: 0,
      perSquareMetreTopMinor: 0,
      perLegSetMinor: 0,
      perSecondLevelMinor: 0,
      deliveryPerKmMinor: 0,
      deliveryKm: 0,
      materialsMarkupBasisPoints: 1250,
    };
    const cost = costPlan(
      items,
      book,
      { mode: 'cheapest-per-item', currency: 'GBP' },
      { rates, cost: { lines: [], totalMinor: 0 } },
    )!;
    // 13 540 × 12.5 % = 1692.5 → 1693
    expect(cost.materials!.totalMinor).toBe(13_540);
    expect(cost.markupMinor).toBe(1693);
    expect(cost.totalMinor).toBe(13_540 + 1693);
  });
});

describe('labour from a rate card', () => {
  it('charges per metre of frame, per square metre of sheet, per leg set and for delivery', () => {
    const plan = computePlan({
      boards: [{ lengthMm: 1200, widthMm: 600 }],
      labour: {
        perMetreFrameMinor: 500,
        perSquareMetreTopMinor: 1000,
        perLegSetMinor: 1500,
        deliveryPerKmMinor: 45,
        deliveryKm: 10,
      },
    });
    // Frame timber, legs left out: 2 × 1200 + 6 × 564 + 2 × 1319 = 8422 mm → 8.422 m × 500 = 4211
    // Top: 1.2 × 0.6 = 0.72 m² × 1000 = 720; one leg set 1500; 10 km × 45 = 450
    expect(plan.cost!.labour!.lines.map((l) => [l.what, l.totalMinor])).toEqual([
      ['Frame timber', 4211],
      ['Tops, shelves and kickboards', 720],
      ['Leg sets', 1500],
      ['Delivery', 450],
    ]);
    expect(plan.cost!.materials).toBeNull();
    expect(plan.cost!.totalMinor).toBe(4211 + 720 + 1500 + 450);
  });
});

describe('the schedule', () => {
  it('builds half a day per board, rounded up to whole days, after acclimatising', () => {
    // 0.5 days a board: common practice, no source; 7 days to acclimatise: TRADE.md "at least a week" (practice)
    const s = planSchedule({ startDate: '2025-02-24', buildDaysPerBoard: 0.5, acclimatiseDays: 7 }, 5);
    expect(s).toEqual({
      materialsDeliveredOn: '2025-02-24',
      acclimatiseDays: 7,
      buildStartsOn: '2025-03-03',
      buildDays: 3,
      lastBuildDayOn: '2025-03-05',
      readyOn: '2025-03-06',
    });
  });

  it('counts calendar days across month and year ends and leap days', () => {
    expect(addDays('2024-02-28', 1)).toBe('2024-02-29');
    expect(addDays('2024-12-30', 3)).toBe('2025-01-02');
    expect(addDays('2025-03-29', 2)).toBe('2025-03-31'); // across the clock change, still whole days
  });

  it('refuses fewer than seven days to acclimatise', () => {
    expect(() =>
      computePlan({
        boards: [{ lengthMm: 1200, widthMm: 600 }],
        schedule: { startDate: '2025-03-01', acclimatiseDays: 3 },
      }),
    ).toThrow('Days to acclimatise must be at least 7 days.');
  });
});
