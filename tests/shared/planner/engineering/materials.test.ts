import { describe, expect, it } from 'vitest';
import { EngineeringInputError } from '../../../../shared/planner/engineering/checks';
import {
  deeperSections,
  planedFromSawn,
  sheetForSag,
  sheetMaterial,
  standardSection,
  standardSections,
  thickerSheets,
  timberClass,
  timberForSag,
  withMeasuredSize,
} from '../../../../shared/planner/engineering/materials';
import {
  IMPERIAL_SHEET_MM,
  PLYWOOD_THICKNESSES_MM,
  STANDARD_SHEET_SIZES_MM,
  US_PLYWOOD_THICKNESSES,
} from '../../../../shared/planner/engineering/sheet-data';
import { UK_STOCK_LENGTHS_MM } from '../../../../shared/planner/engineering/timber-data';

describe('timber strength classes', () => {
  it('gives C16 and C24 the properties of the standard', () => {
    expect(timberClass('C16')).toMatchObject({
      eMeanNmm2: 8000, // EN 338:2016, Table 1
      e05Nmm2: 5400, // EN 338:2016, Table 1
      fmkNmm2: 16, // EN 338:2016, Table 1
      densityCharacteristicKgM3: 310, // EN 338:2016, Table 1
      densityMeanKgM3: 370, // EN 338:2016, Table 1
      gMeanNmm2: 500, // EN 338:2016, Table 1
    });
    expect(timberClass('C24')).toMatchObject({
      eMeanNmm2: 11000, // EN 338:2016, Table 1
      e05Nmm2: 7400, // EN 338:2016, Table 1
      fmkNmm2: 24, // EN 338:2016, Table 1
      densityCharacteristicKgM3: 350, // EN 338:2016, Table 1
      densityMeanKgM3: 420, // EN 338:2016, Table 1
      gMeanNmm2: 690, // EN 338:2016, Table 1
    });
  });
});

describe('properties for a sag check', () => {
  it('takes E0,mean and ρmean from the timber class', () => {
    expect(timberForSag('C24')).toEqual({ eNmm2: 11000, densityKgM3: 420 }); // EN 338:2016, Table 1
  });

  it('takes a sheet’s stiffness and density, and refuses foam board as a spanning top', () => {
    expect(sheetForSag('birch-ply')).toEqual({ eNmm2: 11000, densityKgM3: 695 }); // from memory; published (maker's datasheet)
    expect(() => sheetForSag('extruded-foam')).toThrow(/not for spanning between cross members/);
  });
});

describe('standard sections', () => {
  it('offers UK 2x1 as 44 × 18 mm planed from ex 50 × 22', () => {
    const twoByOne = standardSection('uk-2x1');
    expect([twoByOne.widthMm, twoByOne.thicknessMm]).toEqual([44, 18]); // merchants' size tables
    expect(twoByOne.sawn).toEqual({ widthMm: 50, thicknessMm: 22 }); // merchants' size tables
  });

  it('offers UK 2x2 as 44 × 44 mm and marks it the trade’s habit', () => {
    expect(standardSection('uk-2x2')).toMatchObject({ widthMm: 44, thicknessMm: 44, status: 'practice' }); // common practice, no source
  });

  it('derives UK 3x1 and 4x1 by planing as much off as 2x1 loses', () => {
    const twoByOne = standardSection('uk-2x1');
    for (const id of ['uk-3x1', 'uk-4x1']) {
      const s = standardSection(id);
      // common practice, no source: the same 6 mm and 4 mm off as the merchants' 2x1
      expect(s.sawn!.widthMm - s.widthMm).toBe(twoByOne.sawn!.widthMm - twoByOne.widthMm);
      expect(s.sawn!.thicknessMm - s.thicknessMm).toBe(twoByOne.sawn!.thicknessMm - twoByOne.thicknessMm);
    }
    expect(standardSection('uk-3x1')).toMatchObject({ widthMm: 69, thicknessMm: 18 });
  });

  it('gives US dressed sizes exactly in millimetres', () => {
    const size = (id: string) => [standardSection(id).thicknessMm, standardSection(id).widthMm];
    expect(size('us-1x2')).toEqual([19.05, 38.1]); // American Softwood Lumber Standard PS 20: ¾ × 1½ in
    expect(size('us-1x4')).toEqual([19.05, 88.9]); // American Softwood Lumber Standard PS 20: ¾ × 3½ in
    expect(size('us-2x4')).toEqual([38.1, 88.9]); // American Softwood Lumber Standard PS 20: 1½ × 3½ in
    expect(size('us-2x2')).toEqual([38.1, 38.1]); // American Softwood Lumber Standard PS 20, from memory
  });

  it('lists each region shallowest first and picks deeper ones in that order', () => {
    const uk = standardSections('UK');
    expect(uk.map((s) => s.nominal)).toEqual(['2x1', '2x2', '3x1', '4x1']);
    expect(deeperSections(standardSection('uk-2x1'), uk).map((s) => s.nominal)).toEqual(['3x1', '4x1']);
  });

  it('keeps a standard section’s name when the user enters measured sizes', () => {
    expect(withMeasuredSize(standardSection('uk-2x1'), { widthMm: 38, thicknessMm: 19 })).toMatchObject({
      nominal: '2x1',
      widthMm: 38,
      thicknessMm: 19,
    });
    expect(() => withMeasuredSize(standardSection('uk-2x1'), { widthMm: 0 })).toThrow(EngineeringInputError);
  });

  it('names the sections on offer when asked for one that is not', () => {
    expect(() => standardSection('uk-9x9')).toThrow(/uk-2x1/);
  });

  it('sells UK timber in multiples of 0.3 m from 1.8 m to 5.4 m', () => {
    expect(UK_STOCK_LENGTHS_MM).toEqual([1800, 2400, 3000, 3600, 4200, 4800, 5400]); // published
  });
});

describe('planedFromSawn', () => {
  it('takes 3 mm off up to 150 mm and 5 mm above', () => {
    expect(planedFromSawn(22)).toBe(19); // published (UK design & technology reference)
    expect(planedFromSawn(150)).toBe(147); // published (UK design & technology reference)
    expect(planedFromSawn(200)).toBe(195); // published (UK design & technology reference)
  });

  it('refuses a size too small to plane', () => {
    expect(() => planedFromSawn(3)).toThrow(/too small/);
  });
});

describe('sheet materials', () => {
  it('gives each sheet its density and bending stiffness', () => {
    expect(sheetMaterial('birch-ply').densityKgM3).toBe(695); // published (maker's datasheet), 12 mm
    expect(sheetMaterial('softwood-ply').densityKgM3).toBe(460); // published (maker's datasheet)
    expect(sheetMaterial('poplar-ply').densityRangeKgM3).toEqual({ min: 500, max: 650 }); // published (range)
    expect(sheetMaterial('birch-ply').bendingENmm2).toBe(11000); // from memory
    expect(sheetMaterial('softwood-ply').bendingENmm2).toBe(8000); // from memory
    expect(sheetMaterial('mdf')).toMatchObject({ densityKgM3: 750, densityStatus: 'memory' }); // from memory
    expect(sheetMaterial('extruded-foam')).toMatchObject({ densityKgM3: 35, bendingENmm2: null }); // from memory
  });

  it('lists the plywood thicknesses made and the thicker ones after a given sheet', () => {
    expect(PLYWOOD_THICKNESSES_MM).toEqual([3, 4, 6, 9, 12, 15, 18, 21, 24]); // published (makers' datasheets)
    expect(thickerSheets(9)).toEqual([12, 15, 18, 21, 24]);
    expect(thickerSheets(24)).toEqual([]);
  });

  it('lists the standard sheet sizes and an 8 × 4 ft sheet exactly', () => {
    expect(STANDARD_SHEET_SIZES_MM.map((s) => [s.lengthMm, s.widthMm])).toEqual([
      [2440, 1220], // published
      [3050, 1525], // published
    ]);
    expect(IMPERIAL_SHEET_MM).toEqual({ lengthMm: 2438.4, widthMm: 1219.2 }); // published: 2438 × 1219 mm
  });

  it('gives US plywood its actual thickness', () => {
    expect(US_PLYWOOD_THICKNESSES.map((t) => t.actualMm)).toEqual([11.90625, 18.25625]); // published: 15/32 and 23/32 in
  });
});
