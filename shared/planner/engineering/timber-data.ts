import { inchesToMm } from './units-data';

/** How sure a default is: a published table, recalled but not confirmed, or the trade's habit. */
export type SourceStatus = 'published' | 'memory' | 'practice';

/** A strength class's properties (20 °C, 65 % relative humidity). Stresses and moduli in N/mm², densities in kg/m³. */
export interface TimberClass {
  id: TimberClassId;
  /** E0,mean: mean modulus of elasticity parallel to the grain; use it for deflection. */
  eMeanNmm2: number;
  /** E0,05: 5-percentile modulus of elasticity. */
  e05Nmm2: number;
  /** fm,k: characteristic bending strength. */
  fmkNmm2: number;
  /** ρk: characteristic density. */
  densityCharacteristicKgM3: number;
  /** ρmean: mean density; use it for weight. */
  densityMeanKgM3: number;
  /** Gmean: mean shear modulus. */
  gMeanNmm2: number;
}

/** The strength classes offered. */
export type TimberClassId = 'C16' | 'C24';

/** Softwood strength classes. */
export const TIMBER_CLASSES: Readonly<Record<TimberClassId, TimberClass>> = {
  C16: {
    id: 'C16',
    eMeanNmm2: 8000, // EN 338:2016, Table 1
    e05Nmm2: 5400, // EN 338:2016, Table 1
    fmkNmm2: 16, // EN 338:2016, Table 1
    densityCharacteristicKgM3: 310, // EN 338:2016, Table 1
    densityMeanKgM3: 370, // EN 338:2016, Table 1
    gMeanNmm2: 500, // EN 338:2016, Table 1
  },
  C24: {
    id: 'C24',
    eMeanNmm2: 11000, // EN 338:2016, Table 1
    e05Nmm2: 7400, // EN 338:2016, Table 1
    fmkNmm2: 24, // EN 338:2016, Table 1
    densityCharacteristicKgM3: 350, // EN 338:2016, Table 1
    densityMeanKgM3: 420, // EN 338:2016, Table 1
    gMeanNmm2: 690, // EN 338:2016, Table 1
  },
};

/** The class assumed for unmarked merchant's timber: the lower of the two. */
export const DEFAULT_TIMBER_CLASS: TimberClassId = 'C16'; // common practice, no source

/**
 * A standard section as sold, planed. `widthMm` is the wider face, `thicknessMm` the narrower; a rail "on edge" has
 * the width vertical. Every size is a default the user may change to what their merchant sells.
 */
export interface TimberSection {
  id: string;
  /** What the trade calls it, e.g. "2x1". */
  nominal: string;
  region: 'UK' | 'US';
  widthMm: number;
  thicknessMm: number;
  /** Sawn ("ex") size the planed size comes from, where known. */
  sawn?: { widthMm: number; thicknessMm: number };
  status: SourceStatus;
}

/**
 * Planed sections offered by default, shallowest first within each region. UK 3x1 and 4x1 take 6 mm off the sawn
 * width and 4 mm off the thickness, as the merchants' tables do for 2x1 (ex 50 × 22 → 44 × 18); the published
 * allowance ({@link UK_PLANING_ALLOWANCE}) would leave them 3 mm larger each way.
 */
export const STANDARD_SECTIONS: readonly TimberSection[] = [
  {
    id: 'uk-2x1',
    nominal: '2x1',
    region: 'UK',
    widthMm: 44, // merchants' size tables (varies; some about 38 × 19)
    thicknessMm: 18, // merchants' size tables (varies)
    sawn: { widthMm: 50, thicknessMm: 22 }, // merchants' size tables
    status: 'published',
  },
  {
    id: 'uk-2x2',
    nominal: '2x2',
    region: 'UK',
    widthMm: 44, // common practice, no source (38 × 38 is the published size)
    thicknessMm: 44, // common practice, no source
    status: 'practice',
  },
  {
    id: 'uk-3x1',
    nominal: '3x1',
    region: 'UK',
    widthMm: 69, // common practice, no source (ex 75 planed as 2x1 is)
    thicknessMm: 18, // common practice, no source (ex 22 planed as 2x1 is)
    sawn: { widthMm: 75, thicknessMm: 22 }, // common practice, no source
    status: 'practice',
  },
  {
    id: 'uk-4x1',
    nominal: '4x1',
    region: 'UK',
    widthMm: 94, // common practice, no source (ex 100 planed as 2x1 is)
    thicknessMm: 18, // common practice, no source
    sawn: { widthMm: 100, thicknessMm: 22 }, // common practice, no source
    status: 'practice',
  },
  {
    id: 'us-2x2',
    nominal: '2x2',
    region: 'US',
    widthMm: inchesToMm(3, 2), // American Softwood Lumber Standard PS 20 (1½ in), from memory
    thicknessMm: inchesToMm(3, 2), // American Softwood Lumber Standard PS 20 (1½ in), from memory
    status: 'memory',
  },
  {
    id: 'us-1x2',
    nominal: '1x2',
    region: 'US',
    widthMm: inchesToMm(3, 2), // American Softwood Lumber Standard PS 20 (1½ in)
    thicknessMm: inchesToMm(3, 4), // American Softwood Lumber Standard PS 20 (¾ in)
    status: 'published',
  },
  {
    id: 'us-1x4',
    nominal: '1x4',
    region: 'US',
    widthMm: inchesToMm(7, 2), // American Softwood Lumber Standard PS 20 (3½ in)
    thicknessMm: inchesToMm(3, 4), // American Softwood Lumber Standard PS 20 (¾ in)
    status: 'published',
  },
  {
    id: 'us-2x4',
    nominal: '2x4',
    region: 'US',
    widthMm: inchesToMm(7, 2), // American Softwood Lumber Standard PS 20 (3½ in)
    thicknessMm: inchesToMm(3, 2), // American Softwood Lumber Standard PS 20 (1½ in)
    status: 'published',
  },
];

/** The UK 2x2 size some merchants sell instead of 44 × 44. */
export const UK_2X2_SMALL_MM = { widthMm: 38, thicknessMm: 38 }; // published

/** UK planing allowance: how much planing all round takes off a sawn dimension. */
export const UK_PLANING_ALLOWANCE = {
  upToMm: 150, // published (UK design & technology reference)
  smallMm: 3, // published (UK design & technology reference): sawn − 3 mm up to 150 mm
  largeMm: 5, // published (UK design & technology reference): sawn − 5 mm above 150 mm
};

/** UK stock lengths of planed timber, in millimetres (multiples of 0.3 m). */
export const UK_STOCK_LENGTHS_MM: readonly number[] = [1800, 2400, 3000, 3600, 4200, 4800, 5400]; // published

/** Centres of cross members under a baseboard's top: about 400 mm (16 in). */
export const DEFAULT_CROSS_MEMBER_SPACING_MM = 400; // common practice, no source
