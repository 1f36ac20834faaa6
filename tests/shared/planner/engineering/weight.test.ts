import { describe, expect, it } from 'vitest';
import {
  boardMass,
  layoutMass,
  sheetMassKg,
  sheetMassPerAreaKgM2,
  timberMassKg,
} from '../../../../shared/planner/engineering/weight';

/** A 1200 × 600 mm board: 2x1 frame with two cross members, 9 mm birch top. */
const board = {
  name: 'Station A',
  timber: [
    { lengthMm: 1200, widthMm: 44, thicknessMm: 18, quantity: 2 }, // side rails
    { lengthMm: 564, widthMm: 44, thicknessMm: 18, quantity: 4 }, // end rails and cross members
  ],
  sheets: [{ lengthMm: 1200, widthMm: 600, thicknessMm: 9, densityKgM3: 695 }], // published (maker's datasheet)
};

describe('timber and sheet mass', () => {
  it('weighs timber at the C16 mean density unless told otherwise', () => {
    // EN 338:2016, Table 1: ρmean 370 kg/m³ (C16), 420 kg/m³ (C24); 1 m of 44 × 18 mm is 0.000792 m³
    expect(timberMassKg({ lengthMm: 1000, widthMm: 44, thicknessMm: 18 })).toBeCloseTo(0.29304, 12);
    expect(timberMassKg({ lengthMm: 1000, widthMm: 44, thicknessMm: 18, densityKgM3: 420 })).toBeCloseTo(0.33264, 12);
  });

  it('weighs a full 2440 × 1220 sheet of 12 mm birch ply at just under 25 kg', () => {
    // published (maker's datasheet): 695 kg/m³ at 12 mm; 2.44 × 1.22 × 0.012 × 695
    expect(sheetMassKg({ lengthMm: 2440, widthMm: 1220, thicknessMm: 12, densityKgM3: 695 })).toBeCloseTo(24.826512, 9);
  });

  it('gives a sheet’s mass per square metre for the load on a frame', () => {
    expect(sheetMassPerAreaKgM2(12, 695)).toBeCloseTo(8.34, 12); // published (maker's datasheet)
  });

  it('counts each alike piece', () => {
    const one = timberMassKg({ lengthMm: 564, widthMm: 44, thicknessMm: 18 });
    expect(timberMassKg({ lengthMm: 564, widthMm: 44, thicknessMm: 18, quantity: 4 })).toBeCloseTo(4 * one, 12);
  });

  it('refuses a piece with no length', () => {
    expect(() => timberMassKg({ lengthMm: 0, widthMm: 44, thicknessMm: 18 })).toThrow(/Length/);
  });
});

describe('board and layout mass', () => {
  it('adds up a board’s frame and top', () => {
    const mass = boardMass(board);
    // EN 338:2016, Table 1 (C16 ρmean 370); published (maker's datasheet) birch 695 kg/m³
    expect(mass.timberKg).toBeCloseTo(4656 * 44 * 18 * 1e-9 * 370, 12);
    expect(mass.sheetKg).toBeCloseTo(1.2 * 0.6 * 0.009 * 695, 12);
    expect(mass.totalKg).toBeCloseTo(mass.timberKg + mass.sheetKg, 12);
    expect(mass.name).toBe('Station A');
  });

  it('totals every board of a layout', () => {
    const layout = layoutMass([board, { ...board, name: 'Station B' }]);
    expect(layout.boards).toHaveLength(2);
    expect(layout.totalKg).toBeCloseTo(2 * boardMass(board).totalKg, 12);
  });
});
