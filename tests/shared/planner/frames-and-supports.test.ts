import { describe, expect, it } from 'vitest';
import { computePlan } from '../../../shared/planner/compute-plan';
import type { PlanInput } from '../../../shared/planner/schema';

const board = { lengthMm: 1200, widthMm: 600 };
const rows = (input: PlanInput) =>
  computePlan(input).cuttingList.map(
    (r) => `${r.quantity} × ${r.kind} ${r.lengthMm}${r.widthMm ? ` × ${r.widthMm}` : ''}`,
  );

describe('legs, brackets and frames', () => {
  it('adds pairs of legs along the sides so no rail spans more than the longest span asked for', () => {
    const plan = computePlan({
      boards: [board],
      construction: { supports: { kind: 'legs', heightMm: 900, maxSpanMm: 500 } },
    });
    const { frame } = plan.boards[0]!;
    // Leg centres 40 mm in from each end, 1120 mm apart: ⌈1120 / 500⌉ = 3 spans of 373.3 mm.
    expect(frame.legPairCentresMm).toEqual([40, 413.3, 786.7, 1160]);
    expect(frame.railSpanMm).toBe(373.3);
    expect(plan.cuttingList.find((r) => r.kind === 'leg')!.quantity).toBe(8);
    expect(plan.cuttingList.find((r) => r.kind === 'leg-brace')!.quantity).toBe(4);
    expect(frame.drawing.legs).toHaveLength(8);
  });

  it('puts a bracket under each end of a board on wall battens and more between, no further apart than asked', () => {
    const plan = computePlan({
      boards: [{ lengthMm: 2400, widthMm: 600 }],
      construction: { supports: { kind: 'wall-battens', bracketSpacingMm: 700 } },
    });
    expect(plan.boards[0]!.frame.bracketCentresMm).toEqual([0, 600, 1200, 1800, 2400]);
    expect(plan.boards[0]!.frame.railSpanMm).toBe(600);
    expect(plan.fixings.brackets).toBe(5);
    expect(plan.shoppingList.find((i) => i.itemKey === 'bracket:shelf')!.quantity).toBe(5);
    expect(plan.safety.cautions).toContain('Check walls for hidden pipes and cables before drilling.');
  });

  it('runs the side rails along the longer side of a board wider than it is long', () => {
    expect(
      rows({ boards: [{ lengthMm: 450, widthMm: 900 }], construction: { supports: { kind: 'wall-battens' } } }),
    ).toEqual([
      '2 × side-rail 900',
      '2 × end-rail 414',
      '2 × cross-member 414',
      '1 × wall-batten 450',
      '1 × top 450 × 900',
    ]);
  });

  it('adds shelf bearers, a lower shelf notched round the legs and a kickboard under a board on legs', () => {
    const parts = rows({
      boards: [board],
      lowerShelf: { heightMm: 200 },
      kickboards: { heightMm: 100, floorFallMm: 8 },
    });
    expect(parts).toContain('2 × shelf-bearer 1164');
    expect(parts).toContain('1 × lower-shelf 1164 × 564');
    expect(parts).toContain('1 × kickboard 1200 × 108');
  });

  it('stands an upper board given by size on its own legs, up to its own height', () => {
    const plan = computePlan({
      boards: [{ ...board, level: 'upper' }],
      secondLevel: { heightAboveMm: 400 },
    });
    // 900 mm to the lower level + 400 mm − the 9 mm top
    expect(plan.cuttingList.find((r) => r.kind === 'leg')!.lengthMm).toBe(1291);
    expect(plan.boards[0]).toMatchObject({ level: 'upper', role: 'scenic', elevationMm: 400 });
  });

  it('builds a second level over the chosen boards only', () => {
    const plan = computePlan({
      boards: [
        { id: 'a', ...board },
        { id: 'b', ...board },
        { id: 'c', ...board },
      ],
      secondLevel: { heightAboveMm: 300, which: 'selected', boardIds: ['a', 'c'], role: 'storage' },
    });
    expect(plan.boards.filter((b) => b.level === 'upper').map((b) => b.id)).toEqual(['a-upper', 'c-upper']);
    expect(plan.joins.filter((j) => j.level === 'upper')).toEqual([]); // a and c are not neighbours
    expect(plan.boards.find((b) => b.id === 'b')!.role).toBe('scenic');
  });

  it('warns that a foam top is not to span between cross members, and does not check its sag', () => {
    const plan = computePlan({
      boards: [board],
      construction: { topSheet: { material: 'extruded-foam', thicknessMm: 50 } },
    });
    expect(plan.sag[0]!.sheet).toBeNull();
    expect(plan.warnings).toContain(
      'Foam board is not for spanning between cross members: lay it on a sheet top, and check that sheet.',
    );
  });
});

describe('the bus along a run of boards', () => {
  const fiveBoards = Array.from({ length: 5 }, () => ({ lengthMm: 2000, widthMm: 600 }));

  it('loses 0.484 V over 10 m of 1.5 mm² at 2 A, fed from one end', () => {
    // TRADE.md worked example: 2 × 10 m × 12.1 Ω/km × 2 A = 0.484 V (IEC 60228 maximum, class 1/2)
    const plan = computePlan({ boards: fiveBoards, wiring: { feedFrom: 'one-end', currentA: 2 } });
    expect(plan.wiring.boards.map((b) => b.farEnd.distanceM)).toEqual([2, 4, 6, 8, 10]);
    expect(plan.wiring.worstDropV).toBeCloseTo(0.484, 12);
    expect(plan.wiring.passes).toBe(true);
  });

  it('halves the longest distance when fed from the centre', () => {
    const plan = computePlan({ boards: fiveBoards, wiring: { feedFrom: 'centre' } });
    expect(plan.wiring.boards.map((b) => b.farEnd.distanceM)).toEqual([5, 3, 1, 3, 5]);
  });

  it('flags a board whose far end drops too much with the smallest conductor that passes', () => {
    // IEC 60228 class 1/2: 1.5 mm² 12.1 Ω/km → 0.726 V; 2.5 mm² 7.41 Ω/km → 0.4446 V over 10 m at 3 A
    const plan = computePlan({ boards: fiveBoards, wiring: { feedFrom: 'one-end', currentA: 3 } });
    const last = plan.wiring.boards.at(-1)!.farEnd;
    expect(last.dropV).toBeCloseTo(0.726, 12);
    expect(last.passes).toBe(false);
    expect(last.passingConductor).toMatchObject({
      conductor: { kind: 'iec', areaMm2: 2.5 },
      name: '2.5 mm² (class 1/2)',
    });
    expect(last.passingConductor!.dropV).toBeCloseTo(0.4446, 12);
    expect(plan.warnings.some((w) => w.includes('use 2.5 mm² (class 1/2) bus wire'))).toBe(true);
  });

  it('drills the same holes in every cross member of a board, one per wire pair', () => {
    const plan = computePlan({ boards: [board], wiring: { accessoryPairs: 2 } });
    const wiring = plan.wiring.boards[0]!;
    // Track feed mid-width; accessory pairs 50 mm behind and in front (common practice, no source)
    expect(wiring.holes.acrossMm).toEqual([300, 350, 250]);
    expect(wiring.crossMembersAtMm).toEqual([403, 797]);
    expect(wiring.warnings).toEqual([]);
  });
});
