import { describe, expect, it } from 'vitest';
import { planSheetCutting } from '../../../../shared/planner/packing/sheet-cutting';
import { yardCutList } from '../../../../shared/planner/packing/yard-cut-list';

describe('yardCutList', () => {
  it('tells the yard to rip the standard sheet into strips and cross-cut the tops from them', () => {
    // Standard sheet 2440 × 1220 mm: published (TRADE.md). Kerf 3 mm: common practice, no source.
    // Rip at 600 → 2440 × 600 and 1220 − 603 = 617; rip the 617 strip at 600 → 600 and 617 − 603 = 14.
    // Cross-cut each 600 strip at 1200 → 1200 and 2440 − 1203 = 1237, then the 1237 at 1200 → 1200 and 34.
    const plan = planSheetCutting({
      parts: [{ id: 'top', label: 'Baseboard top', width: 1200, height: 600, quantity: 4, grain: 'along' }],
      kerf: 3,
    });

    expect(yardCutList(plan)).toEqual([
      'Sheet 1 of 1 (2440 × 1220 mm):',
      '  1. Rip the 2440 × 1220 mm sheet at 600 mm (a full 2440 mm cut), giving 2440 × 600 and 2440 × 617 mm.',
      '  2. Rip the 2440 × 617 mm strip at 600 mm (a full 2440 mm cut), giving 2440 × 600 and 2440 × 14 mm.',
      '  3. Cross-cut the 2440 × 600 mm strip at 1200 mm (a full 600 mm cut), giving 1200 × 600 and 1237 × 600 mm.',
      '  4. Cross-cut the 1237 × 600 mm piece at 1200 mm (a full 600 mm cut), giving 1200 × 600 and 34 × 600 mm.',
      '  5. Cross-cut the 2440 × 600 mm strip at 1200 mm (a full 600 mm cut), giving 1200 × 600 and 1237 × 600 mm.',
      '  6. Cross-cut the 1237 × 600 mm piece at 1200 mm (a full 600 mm cut), giving 1200 × 600 and 34 × 600 mm.',
      '  Gives: 4 × Baseboard top (1200 × 600 mm).',
      '  Offcuts: 34 × 600, 34 × 600, 2440 × 14 mm.',
    ]);
  });

  it('says when a cut leaves less than a blade width', () => {
    // 2440 − 2438 = 2 mm is under the 3 mm kerf: the cut takes it all.
    const plan = planSheetCutting({ parts: [{ id: 'p', width: 2438, height: 1220, quantity: 1 }], kerf: 3 });
    expect(yardCutList(plan)[1]).toBe(
      '  1. Cross-cut the 2440 × 1220 mm sheet at 2438 mm (a full 1220 mm cut), giving 2438 × 1220 mm; the rest goes to dust.',
    );
  });

  it('says when a part is the whole sheet', () => {
    const plan = planSheetCutting({ parts: [{ id: 'p', width: 2440, height: 1220, quantity: 1 }] });
    expect(yardCutList(plan).slice(1, 3)).toEqual(['  No cuts: use the whole sheet.', '  Gives: p (2440 × 1220 mm).']);
  });
});
