import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import { singlePortableModule, tenByThirteenTwoLevel } from '../../../shared/planner/examples';
import type { Plan } from '../../../shared/planner/plan-types';

const examples = [
  ['a single portable module', singlePortableModule],
  ['a 10 × 13 ft two-level room', tenByThirteenTwoLevel],
] as const;

/** How many pieces of each part the cutting plans cut, by part id. */
function piecesCut(plan: Plan): Map<string, number> {
  const counts = new Map<string, number>();
  const add = (id: string) => counts.set(id, (counts.get(id) ?? 0) + 1);
  plan.stock.forEach((s) => s.plan.bars.forEach((bar) => bar.cuts.forEach((cut) => add(cut.partId))));
  plan.sheets.forEach((s) => s.plan.sheets.forEach((sheet) => sheet.placements.forEach((p) => add(p.partId))));
  return counts;
}

/** Every number held under a key ending in "Minor", anywhere in `value`. */
function minorAmounts(value: unknown, found: number[] = []): number[] {
  if (Array.isArray(value)) value.forEach((v) => minorAmounts(v, found));
  else if (value !== null && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      if (key.endsWith('Minor') && typeof v === 'number') found.push(v);
      else minorAmounts(v, found);
    }
  }
  return found;
}

describe.each(examples)('the plan of %s', (_, input) => {
  const plan = computePlan(input);

  it('cuts every part of the cutting list exactly once, in the timber or the sheet plans', () => {
    const cut = piecesCut(plan);
    const wanted = new Map(plan.cuttingList.map((row) => [row.id, row.quantity]));
    expect(cut).toEqual(wanted);
  });

  it('counts each row as the sum of what its boards take', () => {
    for (const row of plan.cuttingList) {
      expect(row.boards.reduce((sum, b) => sum + b.quantity, 0)).toBe(row.quantity);
    }
    const boardIds = new Set(plan.boards.map((b) => b.id));
    expect(plan.cuttingList.every((row) => row.boards.every((b) => boardIds.has(b.boardId)))).toBe(true);
  });

  it('never plans the timber worse than First-Fit Decreasing, nor below the lower bound', () => {
    for (const section of plan.stock) {
      expect(section.plan.stockCount).toBeLessThanOrEqual(section.firstFitDecreasing.stockCount);
      expect(section.plan.stockCount).toBeGreaterThanOrEqual(section.plan.lowerBound.bars);
      expect(section.savedMm).toBeGreaterThanOrEqual(0);
    }
  });

  it('buys the bars and sheets the cutting plans use', () => {
    const bought = (prefix: string) =>
      plan.shoppingList.filter((i) => i.itemKey.startsWith(prefix)).reduce((sum, i) => sum + i.quantity, 0);
    expect(bought('timber:')).toBe(plan.stock.reduce((sum, s) => sum + s.plan.stockCount, 0));
    expect(bought('sheet:')).toBe(plan.sheets.reduce((sum, s) => sum + s.plan.sheetCount, 0));
  });

  it('adds up the weight of each board to the whole', () => {
    const sum = plan.weight.boards.reduce((total, b) => total + b.totalKg, 0);
    expect(plan.weight.totalKg).toBeCloseTo(sum, 9);
    expect(plan.weight.boards.every((b) => Math.abs(b.timberKg + b.sheetKg - b.totalKg) < 1e-9)).toBe(true);
    expect(plan.shippingPerBoard).toHaveLength(plan.boards.length);
  });

  it('keeps money in whole minor units that add up', () => {
    const amounts = minorAmounts(plan.cost);
    expect(amounts.length).toBeGreaterThan(0);
    expect(amounts.every((n) => Number.isSafeInteger(n) && n >= 0)).toBe(true);
    const cost = plan.cost!;
    const m = cost.materials!;
    expect(m.totalMinor).toBe(m.itemsMinor + m.deliveryMinor + m.cuttingMinor);
    expect(m.itemsMinor).toBe(m.lines.reduce((sum, l) => sum + l.totalMinor, 0));
    expect(m.complete).toBe(true);
    expect(cost.totalMinor).toBe(m.totalMinor + cost.markupMinor + (cost.labour?.totalMinor ?? 0));
  });

  it('schedules delivery, at least seven days to acclimatise, then the build, in order', () => {
    // TRADE.md: "at least a week for sheet stock" before building (practice)
    const s = plan.schedule!;
    const day = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / 86_400_000;
    expect(day(s.buildStartsOn) - day(s.materialsDeliveredOn)).toBeGreaterThanOrEqual(7);
    expect(day(s.lastBuildDayOn) - day(s.buildStartsOn)).toBe(s.buildDays - 1);
    expect(day(s.readyOn)).toBe(day(s.lastBuildDayOn) + 1);
  });

  it('lists the safety cautions, following local rules last', () => {
    expect(plan.safety.cautions.at(-1)).toBe(plan.safety.followLocalRules);
    expect(plan.safety.cautions.some((c) => /qualified person/.test(c))).toBe(true); // TRADE.md: mains wiring
  });

  it('is plain data that survives JSON', () => {
    expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
  });
});

describe('the two-level room plan', () => {
  const plan = computePlan(tenByThirteenTwoLevel);
  const byId = new Map(plan.boards.map((b) => [b.id, b]));

  it('runs the lower boards’ legs up through both levels and gives the upper boards and lift-outs none', () => {
    // 800 mm to the lower top + 350 mm to the upper top − the 9 mm upper top = 1141 mm
    const legs = plan.cuttingList.filter((r) => r.kind === 'leg');
    expect(legs.map((r) => r.lengthMm)).toEqual([1141]);
    const legged = plan.boards.filter((b) => b.frame.support === 'legs');
    expect(legs[0]!.quantity).toBe(4 * legged.length);
    const upper = plan.boards.filter((b) => b.level === 'upper' && b.source !== 'lift-out');
    expect(upper.every((b) => b.frame.support === 'carried')).toBe(true);
    expect(byId.get('wall-4-lift-out')!.frame.support).toBe('ends'); // rests on its neighbours
    expect(byId.get('wall-4-lift-out-upper')!.frame.support).toBe('ends');
  });

  it('cuts each kickboard the floor’s fall taller, to scribe down to the floor', () => {
    const kickboards = plan.cuttingList.filter((r) => r.kind === 'kickboard');
    expect(new Set(kickboards.map((r) => r.widthMm))).toEqual(new Set([150 + 12]));
    // The example is imperial, so its messages are in feet and inches: 12 mm = 0.47 in → 1/2" (nearest 1/16 in).
    expect(plan.warnings.some((w) => w.startsWith('The floor falls up to 1/2":'))).toBe(true);
  });

  it('joins neighbours with pattern-makers’ dowels, two to a join', () => {
    expect(plan.joins).toHaveLength(26); // two closed loops of 13 boards
    expect(plan.fixings.boardJoins).toMatchObject({
      method: 'pattern-makers-dowels',
      joins: 26,
      perJoin: 2,
      total: 52,
    });
  });

  it('feeds each level’s loop from the centre and checks the drop at every board’s far end', () => {
    // IEC 60228: 1.5 mm² class 1/2 at most 12.1 Ω/km; loop drop 2 × L × R × I (TRADE.md); 2 A, 0.5 V (common practice)
    const worst = Math.max(...plan.wiring.boards.map((b) => b.farEnd.distanceM));
    expect(plan.wiring.worstDropV).toBeCloseTo(2 * worst * 0.0121 * 2, 9);
    expect(plan.wiring.passes).toBe(true);
    expect(plan.wiring.boards[0]!.runs.map((r) => r.name)).toEqual(['track feed', 'accessory 1', 'accessory 2']);
  });

  it('has the yard cut the sheets and charges for each cut', () => {
    expect(plan.sheets.every((s) => (s.yardCutList ?? []).length > 0)).toBe(true);
    const sheetLines = plan.cost!.materials!.lines.filter((l) => l.itemKey.startsWith('sheet:'));
    const cuts = plan.sheets.reduce((sum, s) => sum + s.cuts, 0);
    expect(sheetLines.reduce((sum, l) => sum + l.cuttingMinor, 0)).toBe(50 * cuts); // the example merchant's 50p a cut
  });
});
