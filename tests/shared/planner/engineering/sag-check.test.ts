import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { standardSection, standardSections } from '../../../../shared/planner/engineering/materials';
import { sagCheck, type SagCheckInput } from '../../../../shared/planner/engineering/sag-check';
import type { SagSuggestion } from '../../../../shared/planner/engineering/sag-suggestions';
import { PLYWOOD_THICKNESSES_MM } from '../../../../shared/planner/engineering/sheet-data';

const G = 9.80665; // standard gravity, exact by definition — from memory

/** A 1200 × 600 mm board on four corner legs: each 2x1 side rail (C16) carries half the width. */
const sideRail = {
  member: 'rail' as const,
  spanMm: 1200,
  section: { widthMm: 44, thicknessMm: 18 }, // merchants' size tables
  eNmm2: 8000, // EN 338:2016, Table 1 (C16 E0,mean)
  densityKgM3: 370, // EN 338:2016, Table 1 (C16 ρmean)
  loadKgM2: 20,
  tributaryWidthMm: 300,
};

/** 9 mm birch ply over cross members at 400 mm centres. */
const topSheet = {
  member: 'sheet' as const,
  spacingMm: 400, // common practice, no source
  thicknessMm: 9,
  eNmm2: 11_000, // from memory
  densityKgM3: 695, // published (maker's datasheet)
  loadKgM2: 20,
};

function apply(input: SagCheckInput, s: SagSuggestion): SagCheckInput {
  if (input.member === 'rail' && s.kind === 'more-legs') return { ...input, spanMm: s.spanMm };
  if (input.member === 'rail' && s.kind === 'deeper-section') return { ...input, section: s.section };
  if (input.member === 'sheet' && s.kind === 'closer-cross-members') return { ...input, spacingMm: s.spacingMm };
  if (input.member === 'sheet' && s.kind === 'thicker-sheet') return { ...input, thicknessMm: s.thicknessMm };
  throw new Error(`A ${s.kind} suggestion does not apply to a ${input.member}`);
}

describe('sagCheck for a frame rail', () => {
  it('works out the sag of a 2x1 side rail on edge under its share of the load and its own weight', () => {
    // published (any structures handbook): 5wL⁴/(384EI) with I = bh³/12
    const w = (20 * G * 300) / 1e6 + 370 * 18 * 44 * 1e-9 * G;
    const expected = (5 * w * 1200 ** 4) / (384 * 8000 * ((18 * 44 ** 3) / 12));
    const result = sagCheck(sideRail);
    expect(result.deflectionMm).toBeCloseTo(expected, 12);
    expect(result.deflectionMm).toBeCloseTo(1.63, 2);
  });

  it('passes it against L/300 with no suggestions', () => {
    const result = sagCheck(sideRail);
    expect(result.limitMm).toBe(4); // EN 1995-1-1 Table 7.2: L/300 for w_inst
    expect(result).toMatchObject({ passes: true, suggestions: [] });
    expect(result.utilisation).toBeCloseTo(result.deflectionMm / 4, 12);
  });

  it('adds a point load at mid-span to the uniform load', () => {
    // published (any structures handbook): PL³/(48EI), by superposition
    const pointOnly = (500 * 1200 ** 3) / (48 * 8000 * 127_776);
    const result = sagCheck({ ...sideRail, pointLoadN: 500 });
    expect(result.deflectionMm).toBeCloseTo(sagCheck(sideRail).deflectionMm + pointOnly, 9);
    expect(result.passes).toBe(false);
  });

  it('holds the rail to a stricter limit when asked', () => {
    const result = sagCheck({ ...sideRail, limitRatio: 500 }); // EN 1995-1-1 Table 7.2: L/500 for w_inst
    expect(result.limitMm).toBe(2.4);
  });

  it('suggests more legs and the shallowest deeper section that pass, when someone leans on the rail', () => {
    const result = sagCheck({ ...sideRail, pointLoadN: 500 });
    const legs = result.suggestions.find((s) => s.kind === 'more-legs');
    const deeper = result.suggestions.find((s) => s.kind === 'deeper-section');
    expect(legs).toMatchObject({ extraLegs: 2, spanMm: 400 });
    expect(legs?.message).toMatch(/Add 2 more legs .* 3 equal spans of 400 mm/);
    expect(deeper && 'section' in deeper && deeper.section).toMatchObject({ nominal: '4x1' });
    // 3x1 is deeper than 2x1 but does not pass, so it is passed over
    expect(sagCheck({ ...sideRail, pointLoadN: 500, section: standardSection('uk-3x1') }).passes).toBe(false);
  });

  it('refuses a negative load with a message naming it', () => {
    expect(() => sagCheck({ ...sideRail, loadKgM2: -1 })).toThrow(/Load on the board/);
  });
});

describe('sagCheck for the top sheet', () => {
  it('checks a 1 m strip as a simply supported beam, its own weight included', () => {
    // published (any structures handbook); the 1 m strip is a simplification that errs on the safe side
    const w = ((20 + (695 * 9) / 1000) * G) / 1000;
    const expected = (5 * w * 400 ** 4) / (384 * 11_000 * ((1000 * 9 ** 3) / 12));
    const result = sagCheck(topSheet);
    expect(result.deflectionMm).toBeCloseTo(expected, 12);
    expect(result.passes).toBe(true);
  });

  it('suggests closer cross members and the thinnest thicker sheet that pass', () => {
    const thin = { ...topSheet, spacingMm: 900, thicknessMm: 6, eNmm2: 8000, densityKgM3: 460, loadKgM2: 30 };
    const result = sagCheck(thin);
    expect(result.passes).toBe(false);
    const spacing = result.suggestions.find((s) => s.kind === 'closer-cross-members');
    const thicker = result.suggestions.find((s) => s.kind === 'thicker-sheet');
    expect(spacing && 'spacingMm' in spacing && spacing.spacingMm).toBe(485);
    expect(sagCheck({ ...thin, spacingMm: 486 }).passes).toBe(false); // one millimetre more fails
    expect(thicker && 'thicknessMm' in thicker && thicker.thicknessMm).toBe(12);
    expect(sagCheck({ ...thin, thicknessMm: 9 }).passes).toBe(false); // the next thinner does not pass
  });
});

describe('sag suggestions', () => {
  const sections = standardSections('UK');

  it('make a failing rail pass when applied', () => {
    const rail = fc.record({
      member: fc.constant('rail' as const),
      spanMm: fc.double({ min: 300, max: 4000, noNaN: true }),
      section: fc.constantFrom(...sections),
      eNmm2: fc.constantFrom(8000, 11_000), // EN 338:2016, Table 1 (C16, C24)
      densityKgM3: fc.constantFrom(370, 420), // EN 338:2016, Table 1 (C16, C24)
      loadKgM2: fc.double({ min: 0, max: 80, noNaN: true }),
      tributaryWidthMm: fc.double({ min: 100, max: 800, noNaN: true }),
      pointLoadN: fc.double({ min: 0, max: 1500, noNaN: true }),
      limitRatio: fc.double({ min: 300, max: 500, noNaN: true }), // EN 1995-1-1 Table 7.2 (w_inst)
    });
    fc.assert(
      fc.property(rail, (input) => {
        const result = sagCheck(input);
        if (!result.passes) expect(result.suggestions.some((s) => s.kind === 'more-legs')).toBe(true);
        for (const s of result.suggestions) expect(sagCheck(apply(input, s)).passes).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('make a failing top sheet pass when applied', () => {
    const sheet = fc.record({
      member: fc.constant('sheet' as const),
      spacingMm: fc.double({ min: 150, max: 2500, noNaN: true }),
      thicknessMm: fc.constantFrom(...PLYWOOD_THICKNESSES_MM),
      eNmm2: fc.double({ min: 2500, max: 11_000, noNaN: true }),
      densityKgM3: fc.double({ min: 35, max: 750, noNaN: true }),
      loadKgM2: fc.double({ min: 0, max: 150, noNaN: true }),
      limitRatio: fc.double({ min: 300, max: 500, noNaN: true }), // EN 1995-1-1 Table 7.2 (w_inst)
    });
    fc.assert(
      fc.property(sheet, (input) => {
        const result = sagCheck(input);
        if (!result.passes) expect(result.suggestions.some((s) => s.kind === 'closer-cross-members')).toBe(true);
        for (const s of result.suggestions) expect(sagCheck(apply(input, s)).passes).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
