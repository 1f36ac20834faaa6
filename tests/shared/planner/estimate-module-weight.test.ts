import { describe, expect, it } from 'vitest';
import {
  estimateModuleWeight,
  estimateToKg,
  type ModuleConstruction,
} from '../../../shared/planner/estimate-module-weight';
import { moduleListingSchema } from '../../../shared/schemas/listing-module';
import { moduleBody } from '../../support/listing-bodies';

/*
 * Worked by hand: one 1200 × 600 mm board, frame 44 × 18 mm on edge, cross members at no more than 400 mm, 9 mm
 * birch plywood top.
 *   side rails     2 × 1200 mm
 *   end rails      2 × 564 mm (600 − 2 × 18, between the side rails)
 *   cross members  end-rail centres 1182 mm apart → ⌈1182 / 400⌉ = 3 bays → 2 cross members of 564 mm
 *   timber  4656 mm × 44 × 18 mm = 3 687 552 mm³ = 0.003687552 m³
 *           × 370 kg/m³ (EN 338:2016, Table 1, C16 mean density ρmean)          = 1.36439424 kg
 *   top     1.2 × 0.6 × 0.009 m = 0.00648 m³
 *           × 695 kg/m³ (birch plywood, maker's datasheet, as the planner's sheet-data cites) = 4.5036 kg
 *   board                                                                          = 5.86799424 kg → 5868 g
 */
const bare: ModuleConstruction = {
  boardCount: 2,
  lengthMm: 1200,
  widthMm: 600,
  levels: { type: 'single' },
  construction: {
    frameDepthMm: 44,
    frameThicknessMm: 18,
    crossMemberSpacingMm: 400,
    topMaterial: 'birch-plywood',
    topThicknessMm: 9,
    supports: 'none',
  },
};
const withConstruction = (c: Partial<ModuleConstruction['construction']>): ModuleConstruction => ({
  ...bare,
  construction: { ...bare.construction, ...c },
});

describe('estimating a module board’s weight from its construction', () => {
  it('weighs a 1200 × 600 board of 44 × 18 frame and 9 mm birch ply as worked by hand', () => {
    const estimate = estimateModuleWeight(bare);

    expect(estimate).toMatchObject({ ok: true, timberG: 1364, sheetG: 4504, boardG: 5868, legs: null });
    // Two boards listed, each taken as large as the largest: 2 × 5868 g.
    expect(estimate.ok && estimate.allBoardsG).toBe(11_736);
    expect(estimate.ok && estimate.topDensityKgM3).toBe(695);
    expect(estimateToKg(5868)).toBe(5.9);
  });

  it('adds four 2x2 legs and their braces, as tall as the rail top measured from the floor', () => {
    /*
     * Rail top 900 mm above the floor, taken as the top's height; legs from the floor to the top's underside:
     * 4 × (900 − 9) = 4 × 891 mm of 44 × 44 mm (the planner's default 2x2; common practice, no source).
     * Leg centres 18 + 22 = 40 mm in from each end, 1120 mm apart: one 564 mm brace across each pair, and a
     * diagonal on each side: rise 900 − 9 − 44 − 150 = 697 mm, run 1120 mm → √(1120² + 697²) = 1319.17 → 1319 mm.
     *   2x1   4656 + 2 × 564 + 2 × 1319 = 8422 mm × 792 mm² × 370 kg/m³ = 2.46798288 kg
     *   2x2   3564 mm × 1936 mm² × 370 kg/m³                          = 2.55296448 kg
     *   board with the 4.5036 kg top                                   = 9.52454736 kg → 9525 g
     */
    const estimate = estimateModuleWeight({
      ...withConstruction({ supports: 'legs' }),
      endProfiles: {
        a: { railTopHeightMm: 900, railTopFrom: 'floor' },
        b: { railTopHeightMm: 120, railTopFrom: 'frame' },
      },
    });

    expect(estimate).toMatchObject({ ok: true, boardG: 9525, timberG: 5021, sheetG: 4504 });
    expect(estimate.ok && estimate.legs).toEqual({
      count: 4,
      lengthMm: 891,
      section: { nominal: '2x2', widthMm: 44, thicknessMm: 44 },
      heightFrom: 'rail-top',
      topHeightMm: 900,
    });
  });

  it('takes legs to the usual 900 mm when no end is measured from the floor', () => {
    const estimate = estimateModuleWeight(withConstruction({ supports: 'legs' }));

    // The same board as above: the planner's default top height is 900 mm (common practice, no source).
    expect(estimate).toMatchObject({ ok: true, boardG: 9525, legs: { heightFrom: 'default', topHeightMm: 900 } });
  });

  it('leaves wall brackets on the wall, and weighs a frame with no top as its timber alone', () => {
    expect(estimateModuleWeight(withConstruction({ supports: 'wall-brackets' }))).toMatchObject({ boardG: 5868 });
    // 1.36439424 kg of frame timber, as above.
    expect(estimateModuleWeight(withConstruction({ topMaterial: 'none', topThicknessMm: null }))).toMatchObject({
      ok: true,
      boardG: 1364,
      sheetG: 0,
      topDensityKgM3: null,
    });
  });

  it('weighs both decks of a two-level board, its legs running up to the upper deck', () => {
    /*
     * Two frames and tops as above (2 × 5.86799424 kg), and the lower deck's legs run 300 mm further up to carry the
     * upper: 4 × (900 + 300 − 9) = 4 × 1191 mm of 2x2 = 4764 mm × 1936 mm² × 370 kg/m³ = 3.41251488 kg, with the
     * same braces (2 × 564 + 2 × 1319 = 3766 mm × 792 mm² × 370 kg/m³ = 1.10358864 kg), the diagonal's rise being
     * measured to the lower deck.
     *   11.73598848 + 3.41251488 + 1.10358864 = 16.252092 kg → 16252 g
     */
    const estimate = estimateModuleWeight({
      ...withConstruction({ supports: 'legs' }),
      levels: { type: 'two-level', deckGapMm: 300 },
    });

    expect(estimate).toMatchObject({ ok: true, boardG: 16_252, legs: { count: 4, lengthMm: 1191 } });
  });

  it('uses the planner’s density for each top it knows, and says when it has none', () => {
    // Spruce plywood 460 kg/m³ (maker's datasheet, as sheet-data cites): 0.00648 m³ × 460 = 2.9808 kg.
    expect(estimateModuleWeight(withConstruction({ topMaterial: 'softwood-plywood' }))).toMatchObject({
      sheetG: 2981,
    });
    const softboard = estimateModuleWeight(withConstruction({ topMaterial: 'softboard' }));
    expect(softboard).toEqual({
      ok: false,
      reason: 'The planner has no density for fibre softboard, so weigh the board instead.',
    });
  });
});

describe('a listing whose weight is said to be estimated', () => {
  // moduleBody: 1200 × 450 mm, 44 × 18 frame at 400 mm, 9 mm birch top, on legs, rail tops 1050 mm from the floor.
  const body = moduleBody();
  const estimate = estimateModuleWeight(moduleListingSchema.parse(body));
  const kg = estimate.ok ? estimateToKg(estimate.boardG) : 0;

  it('is taken as entered by the seller unless it says otherwise', () => {
    expect(moduleListingSchema.parse(body).weightSource).toBe('entered');
  });

  it('is accepted when the weight is the estimate from the construction as listed', () => {
    expect(moduleListingSchema.safeParse({ ...body, weightKg: kg, weightSource: 'estimated' }).success).toBe(true);
  });

  it('is refused, naming the estimate, when the weight differs from it', () => {
    const result = moduleListingSchema.safeParse({ ...body, weightKg: kg + 1, weightSource: 'estimated' });

    expect(result.success).toBe(false);
    expect(result.error?.issues[0]).toMatchObject({
      path: ['weightKg'],
      message: expect.stringContaining(`now comes to an estimated ${kg} kg`),
    });
  });
});
