import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { STOCK_SCREW_LENGTHS_MM } from '../../../../shared/planner/engineering/fixings-data';
import { minimumScrewLengthMm, screwFor, screwGauge } from '../../../../shared/planner/engineering/screws';

function chosen(fixedThicknessMm: number, baseDepthMm: number, gaugeMm?: number) {
  const choice = screwFor({ fixedThicknessMm, baseDepthMm, gaugeMm });
  if (!choice.ok) throw new Error(choice.reason);
  return choice.screw;
}

describe('screwFor', () => {
  it('fixes 9 mm ply onto a 2x1 rail with a 30 mm screw, two-thirds of it in the rail', () => {
    // published (trade guides): 2.5 × 9 = 22.5 mm, raised to 27 mm for two-thirds in the base; next stock length 30 mm
    expect(chosen(9, 44)).toMatchObject({ lengthMm: 30, inBaseMm: 21, leftBeyondTipMm: 23 });
  });

  it('fixes 12 mm ply with a 4 × 40 mm screw and gives its drill sizes', () => {
    expect(chosen(12, 44)).toMatchObject({
      lengthMm: 40, // published (trade guides): at least 3 × 12 mm
      gaugeMm: 4, // common practice, no source
      pilotMm: 3, // common practice, no source: 3 mm pilot for a 4 mm screw
      pilotRangeMm: { min: 2.5, max: 3 }, // published (woodworking charts)
      clearanceMm: 4.2, // published (woodworking charts)
      countersinkMm: 8, // from memory / common practice, no source: about 2 × nominal
    });
  });

  it('fixes through an 18 mm rail into end grain with a 5 × 60 mm screw', () => {
    expect(chosen(18, 564)).toMatchObject({
      lengthMm: 60, // published (trade guides): at least 54 mm
      gaugeMm: 5, // common practice, no source
      pilotMm: 3, // published (woodworking charts)
      clearanceMm: 5.2, // published (woodworking charts)
    });
  });

  it('gives the drill sizes of a 3 mm screw when asked for one', () => {
    expect(chosen(6, 44, 3)).toMatchObject({ pilotMm: 2, clearanceMm: 3.2 }); // published (woodworking charts)
  });

  it('refuses a screw that would come through the far face, and says what to do', () => {
    const choice = screwFor({ fixedThicknessMm: 18, baseDepthMm: 38 });
    expect(choice.ok).toBe(false);
    expect(!choice.ok && choice.reason).toMatch(/18 mm thick needs a 60 mm screw.*only 38 mm deep.*come through/);
  });

  it('refuses a piece too thick for any stock screw', () => {
    const choice = screwFor({ fixedThicknessMm: 30, baseDepthMm: 200 });
    expect(!choice.ok && choice.reason).toMatch(/over 80 mm; bolt it/);
  });

  it('refuses a gauge not offered, naming those that are', () => {
    expect(() => screwGauge(6)).toThrow(/3, 3.5, 4, 5 mm/);
  });

  it('never chooses a screw longer than both pieces together, and puts two-thirds of it in the base', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 40, noNaN: true }),
        fc.double({ min: 1, max: 300, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (fixed, base, cover) => {
          const choice = screwFor({ fixedThicknessMm: fixed, baseDepthMm: base, farFaceCoverMm: cover });
          // published (trade guides): about 2.5 × the fixed piece, at least two-thirds in the base
          const allowed = (l: number) =>
            l >= 2.5 * fixed && l - fixed >= (2 * l) / 3 - 1e-9 && l <= fixed + base - cover;
          if (choice.ok) {
            const { lengthMm, inBaseMm } = choice.screw;
            expect(lengthMm).toBeLessThan(fixed + base);
            expect(lengthMm).toBeLessThanOrEqual(fixed + base - cover);
            expect(inBaseMm).toBeGreaterThanOrEqual((2 * lengthMm) / 3 - 1e-9);
            expect(STOCK_SCREW_LENGTHS_MM).toContain(lengthMm);
            // the shortest stock length that keeps the rules
            expect(STOCK_SCREW_LENGTHS_MM.find(allowed)).toBe(lengthMm);
          } else {
            expect(STOCK_SCREW_LENGTHS_MM.some(allowed)).toBe(false);
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it('asks for at least three times the piece being fixed', () => {
    expect(minimumScrewLengthMm(9)).toBeCloseTo(27, 9); // published (trade guides): two-thirds in the base
  });
});
