import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planSheetCutting } from '../../../../shared/planner/packing/sheet-cutting';
import type { Rect, SheetCuttingInput, SheetCuttingPlan } from '../../../../shared/planner/packing/sheet-types';
import { sheetInput } from './arbitraries';
import { rectKey, replayCuts } from './replay-cuts';

// Sheet sizes 2440 × 1220 and 3050 × 1525 mm: published (TRADE.md). Kerf 0–5 mm: common practice, no source.
const RUNS = { numRuns: 150 };

const apartByKerf = (a: Rect, b: Rect, kerf: number) =>
  a.x + a.width + kerf <= b.x ||
  b.x + b.width + kerf <= a.x ||
  a.y + a.height + kerf <= b.y ||
  b.y + b.height + kerf <= a.y;

function forEveryPlan(check: (plan: SheetCuttingPlan, input: SheetCuttingInput) => void): void {
  fc.assert(
    fc.property(sheetInput, (input) => check(planSheetCutting(input), input)),
    RUNS,
  );
}

describe('planSheetCutting, for any parts list on standard and birch sheets', () => {
  it('places every piece of every part exactly once, on a sheet size on sale', () => {
    forEveryPlan((plan, input) => {
      const wanted = input.parts.flatMap((p) => Array.from({ length: p.quantity }, () => p.id)).sort();
      expect(plan.sheets.flatMap((s) => s.placements.map((p) => p.partId)).sort()).toEqual(wanted);
      for (const s of plan.sheets) {
        expect(input.sheets!.some((k) => k.width === s.sheet.width && k.height === s.sheet.height)).toBe(true);
      }
    });
  });

  it('keeps every part on its sheet and a full kerf away from every other part', () => {
    forEveryPlan((plan, input) => {
      for (const { sheet, placements } of plan.sheets) {
        for (const p of placements) {
          expect(p.x >= 0 && p.y >= 0 && p.x + p.width <= sheet.width && p.y + p.height <= sheet.height).toBe(true);
        }
        placements.forEach((a, i) =>
          placements.slice(i + 1).forEach((b) => expect(apartByKerf(a, b, input.kerf!)).toBe(true)),
        );
      }
    });
  });

  it('turns a part only when turning is allowed, and keeps its size either way round', () => {
    forEveryPlan((plan, input) => {
      const parts = new Map(input.parts.map((p) => [p.id, p]));
      for (const placement of plan.sheets.flatMap((s) => s.placements)) {
        const part = parts.get(placement.partId)!;
        if (placement.rotated) expect(input.allowRotation !== false && part.grain !== 'along').toBe(true);
        const size = placement.rotated ? [part.height, part.width] : [part.width, part.height];
        expect([placement.width, placement.height]).toEqual(size);
      }
    });
  });

  it('gives cuts that, made in order edge to edge, leave exactly the parts and the offcuts', () => {
    forEveryPlan((plan, input) => {
      for (const sheet of plan.sheets) {
        const pieces = replayCuts(sheet, input.kerf!);
        if (typeof pieces === 'string') expect.fail(pieces);
        for (const cut of sheet.cuts) expect(cut.from).toBeLessThan(cut.to);
        const expected = [...sheet.placements, ...sheet.offcuts].map(rectKey).sort();
        expect(pieces.map(rectKey).sort()).toEqual(expected);
      }
    });
  });

  it('never uses fewer sheets than the area bound, and adds up its areas', () => {
    forEveryPlan((plan) => {
      expect(plan.sheetCount).toBeGreaterThanOrEqual(plan.lowerBound.sheets);
      expect(plan.sheetCount).toBe(plan.sheets.length);
      const sheetArea = plan.sheets.reduce((sum, s) => sum + s.sheet.width * s.sheet.height, 0);
      expect(plan.totalSheetArea).toBe(sheetArea);
      expect(plan.usedArea).toBe(plan.lowerBound.area);
      expect(plan.wasteArea).toBe(sheetArea - plan.usedArea);
      for (const s of plan.sheets) {
        expect(s.usedArea).toBe(s.placements.reduce((sum, p) => sum + p.width * p.height, 0));
        expect(s.wasteArea).toBeGreaterThanOrEqual(0);
      }
    });
  });
});
