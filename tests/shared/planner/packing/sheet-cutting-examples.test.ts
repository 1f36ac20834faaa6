import { describe, expect, it } from 'vitest';
import { PlannerInputError } from '../../../../shared/planner/packing/errors';
import { planSheetCutting } from '../../../../shared/planner/packing/sheet-cutting';
import { replayCuts } from './replay-cuts';

// Standard sheet 2440 × 1220 mm (8 × 4 ft); birch also 1525 × 3050 mm: sheet sizes, published (TRADE.md).
const STANDARD = { width: 2440, height: 1220 };
const BIRCH = { width: 3050, height: 1525 };
// Kerf 3 mm: common practice, no source.
const KERF = 3;

describe('planSheetCutting, worked by hand', () => {
  it('gets four 1200 × 600 mm baseboard tops from one standard sheet', () => {
    // Across: 1200 + 3 + 1200 = 2403 ≤ 2440; up: 600 + 3 + 600 = 1203 ≤ 1220. Used 4 × 720 000 mm².
    const plan = planSheetCutting({ parts: [{ id: 'top', width: 1200, height: 600, quantity: 4 }], kerf: KERF });

    expect(plan.sheetCount).toBe(1);
    expect(plan.usedArea).toBe(2_880_000);
    expect(plan.wasteArea).toBe(2440 * 1220 - 2_880_000);
    expect(plan.lowerBound).toEqual({ sheets: 1, area: 2_880_000 });
    expect(plan.sheets[0]!.placements).toHaveLength(4);
  });

  it('needs two sheets for eight tops, as the area bound says', () => {
    // 8 × 720 000 = 5 760 000 mm² over 2 976 800 mm² a sheet = 1.93 → at least 2 sheets; 4 fit on each.
    const plan = planSheetCutting({ parts: [{ id: 'top', width: 1200, height: 600, quantity: 8 }], kerf: KERF });
    expect(plan.lowerBound.sheets).toBe(2);
    expect(plan.sheetCount).toBe(2);
  });

  it('leaves a kerf between neighbouring parts', () => {
    // Two 1220 × 1220 squares: 1220 + 3 + 1220 = 2443 > 2440, so one each; with no kerf, 2440 fits exactly.
    const parts = [{ id: 'square', width: 1220, height: 1220, quantity: 2 }];
    expect(planSheetCutting({ parts, kerf: KERF }).sheetCount).toBe(2);

    const noKerf = planSheetCutting({ parts, kerf: 0 });
    expect(noKerf.sheetCount).toBe(1);
    expect(noKerf.sheets[0]!.cuts).toEqual([
      { orientation: 'vertical', position: 1220, from: 0, to: 1220, order: 1, piece: { x: 0, y: 0, ...STANDARD } },
    ]);
    expect(noKerf.wasteArea).toBe(0);
  });

  it('turns a long part to fit unless its grain must run along the sheet', () => {
    // 300 × 1500 mm is taller than the 1220 mm sheet, so it only fits turned: 1500 × 300.
    const parts = [{ id: 'fascia', width: 300, height: 1500, quantity: 1 }];
    const turned = planSheetCutting({ parts });
    expect(turned.sheets[0]!.placements[0]).toMatchObject({ width: 1500, height: 300, rotated: true });

    expect(() => planSheetCutting({ parts: [{ ...parts[0]!, grain: 'along' }] })).toThrow(PlannerInputError);
    expect(() => planSheetCutting({ parts, allowRotation: false })).toThrow(
      /"fascia" \(300 mm × 1500 mm\) does not fit/,
    );
  });

  it('names a part too large for every sheet, and plans it on the larger birch sheet', () => {
    const parts = [{ id: 'big-top', width: 2500, height: 1300, quantity: 1 }];
    try {
      planSheetCutting({ parts });
      expect.unreachable();
    } catch (error) {
      expect(error).toMatchObject({ code: 'part-too-large', partId: 'big-top' });
    }
    expect(planSheetCutting({ parts, sheets: [BIRCH] }).sheets[0]!.sheet).toEqual(BIRCH);
  });

  it('uses the smaller sheet when the parts fit it and it costs less', () => {
    const plan = planSheetCutting({
      parts: [{ id: 'shelf', width: 1000, height: 300, quantity: 3 }],
      sheets: [
        { ...BIRCH, priceMinor: 9000 },
        { ...STANDARD, priceMinor: 4500 },
      ],
    });
    expect(plan.sheets.map((s) => s.sheet)).toEqual([STANDARD]);
    expect(plan.costMinor).toBe(4500);
  });

  it('gives a cut list that produces each part when replayed', () => {
    const plan = planSheetCutting({
      parts: [
        { id: 'top', width: 1200, height: 600, quantity: 3 },
        { id: 'kick', width: 1200, height: 100, quantity: 4, grain: 'along' },
      ],
      kerf: KERF,
    });
    for (const sheet of plan.sheets) {
      const pieces = replayCuts(sheet, KERF);
      expect(Array.isArray(pieces)).toBe(true);
    }
  });

  it('plans nothing for no parts', () => {
    expect(planSheetCutting({ parts: [] })).toMatchObject({ sheets: [], sheetCount: 0, wastePercent: 0 });
  });
});
