import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import type { PlanInput } from '../../../shared/planner/schema';

/*
 * Worked by hand: one 1200 × 600 mm board, UK 2x1 planed 44 × 18 mm on edge (TRADE.md: "44 × 18 mm common"),
 * cross members at no more than 400 mm centres (TRADE.md: "about 400 mm centres", practice).
 *
 *   side rails     2 × 1200 mm, full length
 *   end rails      2 × 564 mm  = 600 − 2 × 18, between the side rails
 *   cross members  the end rails' centres are 9 mm in from each end, so 1200 − 18 = 1182 mm apart;
 *                  count rule: the fewest equal bays no wider than 400 mm → ⌈1182 / 400⌉ = 3 bays of 394 mm,
 *                  so 2 cross members, at 9 + 394 = 403 and 797 mm, each 564 mm long (they run across the
 *                  board between the side rails; running the other way they would be 1200 − 2 × 18 = 1164 mm)
 *   top            1200 × 600 mm, one from a 2440 × 1220 mm sheet
 *
 * On wall battens (no legs) the board as lifted is its frame and top:
 *   timber  (2 × 1200 + 4 × 564) mm × 44 × 18 mm = 4656 × 792 mm³ = 0.003687552 m³
 *           × 370 kg/m³ (EN 338:2016, Table 1, C16 ρmean)                  = 1.36439424 kg
 *   ply     1.2 × 0.6 × 0.009 m × 695 kg/m³ (maker's datasheet, 12 mm birch) = 4.5036 kg
 *   total                                                                    = 5.86799424 kg
 *
 * On 900 mm legs of 2x2 (44 × 44, TRADE.md: "about 44 × 44 mm", practice), one inside each corner, from the floor
 * to the underside of the 9 mm top: 4 × 891 mm. Leg centres are 18 + 22 = 40 mm in from each end, 1120 mm apart.
 * Each pair is braced across by a 564 mm 2x1 brace, and each long side by a diagonal from 150 mm up the first leg
 * to the rail over the last: rise 900 − 9 − 44 − 150 = 697 mm, run 1120 mm, √(1120² + 697²) = 1319.17 → 1319 mm.
 *   2x1     4656 + 2 × 564 + 2 × 1319 = 8422 mm × 792 mm² × 370 kg/m³ = 2.46798288 kg
 *   2x2     4 × 891 = 3564 mm × 1936 mm² × 370 kg/m³                 = 2.55296448 kg
 *   total with the top                                                = 9.52454736 kg
 */
const onLegs: PlanInput = { boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }] };
const leanedOn: PlanInput = { ...onLegs, loads: { pointLoadN: 500 } };
const onBattens: PlanInput = { ...onLegs, construction: { supports: { kind: 'wall-battens', bracketSpacingMm: 600 } } };

const rowsOf = (input: PlanInput) =>
  computePlan(input).cuttingList.map(
    (r) => `${r.quantity} × ${r.kind} ${r.lengthMm}${r.widthMm ? ` × ${r.widthMm}` : ''}`,
  );

describe('a 1200 × 600 board worked by hand', () => {
  it('has two side rails, two end rails and two cross members of 2x1, and one top', () => {
    expect(rowsOf(onBattens)).toEqual([
      '2 × side-rail 1200',
      '2 × end-rail 564',
      '2 × cross-member 564',
      '1 × wall-batten 1200',
      '1 × top 1200 × 600',
    ]);
  });

  it('puts the cross members at 403 and 797 mm, three equal bays of 394 mm', () => {
    const { frame } = computePlan(onBattens).boards[0]!;
    expect(frame.crossMemberCentresMm).toEqual([403, 797]);
    expect(frame.bayMm).toBe(394);
    expect(frame.innerLengthMm).toBe(564);
  });

  it('cuts its top from one standard sheet', () => {
    const [sheet] = computePlan(onBattens).sheets;
    expect(sheet!.plan.sheetCount).toBe(1);
    expect(sheet!.plan.sheets[0]!.placements).toMatchObject([
      { partId: 'top:birch-ply-9:1200x600', width: 1200, height: 600 },
    ]);
  });

  it('weighs 5.868 kg as frame and top: timber at 370 kg/m³, birch ply at 695 kg/m³', () => {
    // EN 338:2016, Table 1 (C16 ρmean 370 kg/m³); maker's datasheet (birch ply 695 kg/m³); the batten stays on the wall
    const [board] = computePlan(onBattens).weight.boards;
    expect(board!.timberKg).toBeCloseTo(1.36439424, 9);
    expect(board!.sheetKg).toBeCloseTo(4.5036, 9);
    expect(board!.totalKg).toBeCloseTo(5.86799424, 9);
  });

  it('stands on four 891 mm legs, braced, and weighs 9.525 kg with them', () => {
    const plan = computePlan(onLegs);
    expect(rowsOf(onLegs)).toEqual([
      '2 × side-rail 1200',
      '2 × end-rail 564',
      '2 × cross-member 564',
      '2 × leg-brace 564',
      '2 × diagonal-brace 1319',
      '4 × leg 891',
      '1 × top 1200 × 600',
    ]);
    expect(plan.boards[0]!.frame.legPairCentresMm).toEqual([40, 1160]);
    // EN 338:2016, Table 1 (C16 ρmean 370 kg/m³); maker's datasheet (birch ply 695 kg/m³)
    expect(plan.weight.boards[0]!.timberKg).toBeCloseTo(2.46798288 + 2.55296448, 9);
    expect(plan.weight.totalKg).toBeCloseTo(9.52454736, 9);
    // HSE manual handling guideline (L23 / INDG143): 25 kg for one person
    expect(plan.weight.boards[0]!.handling.liftBy).toBe('one-person');
  });

  it('finds a 2x1 side rail over 1120 mm between legs too springy for someone leaning on it', () => {
    // I = 18 × 44³ / 12 = 127 776 mm⁴; E = 8000 N/mm² (EN 338:2016, Table 1, C16 E0,mean).
    // Point: 500 N × 1120³ / (48 × 8000 × 127 776) = 14.317 mm (PL³/48EI, TRADE.md; 500 N common practice, no source).
    // Uniform: (50 + 6.255) kg/m² × 9.80665 × 0.3 m + own weight 0.00287 N/mm = 0.16838 N/mm;
    //          5 × 0.16838 × 1120⁴ / (384 × 8000 × 127 776) = 3.375 mm (5wL⁴/384EI, TRADE.md).
    // Limit 1120 / 300 = 3.73 mm (EN 1995-1-1 Table 7.2, L/300).
    const [sag] = computePlan(leanedOn).sag;
    expect(sag!.rail.spanMm).toBe(1120);
    expect(sag!.rail.deflectionMm).toBeCloseTo(14.317 + 3.375, 2);
    expect(sag!.rail.limitMm).toBeCloseTo(3.733, 3);
    expect(sag!.rail.passes).toBe(false);
    expect(sag!.rail.suggestions.map((s) => s.kind)).toEqual(['more-legs', 'deeper-section']);
  });

  it('finds the same rail stiff enough for the layout alone, with no one leaning on it', () => {
    // Uniform only: 3.375 mm (worked above) against the 3.733 mm limit (EN 1995-1-1 Table 7.2, L/300).
    const [sag] = computePlan(onLegs).sag;
    expect(sag!.rail.deflectionMm).toBeCloseTo(3.375, 2);
    expect(sag!.rail.passes).toBe(true);
    expect(sag!.rail.suggestions).toEqual([]);
  });

  it('finds a 9 mm birch top between cross members 394 mm apart stiff enough', () => {
    // 1 m strip: I = 1000 × 9³ / 12 = 60 750 mm⁴; E = 11 000 N/mm² (from memory, maker's declaration gives the real one)
    // w = (50 + 6.255) × 9.80665 / 1000 = 0.5517 N/mm; 5 × 0.5517 × 394⁴ / (384 × 11 000 × 60 750) = 0.259 mm
    // limit 394 / 300 = 1.313 mm (EN 1995-1-1 Table 7.2, L/300)
    const [sag] = computePlan(onLegs).sag;
    expect(sag!.sheet!.spacingMm).toBe(394);
    expect(sag!.sheet!.deflectionMm).toBeCloseTo(0.259, 2);
    expect(sag!.sheet!.passes).toBe(true);
  });
});
