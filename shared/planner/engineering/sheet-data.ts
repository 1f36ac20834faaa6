import type { SourceStatus } from './timber-data';
import { inchesToMm } from './units-data';

/** The sheet materials offered for a baseboard's top. */
export type SheetMaterialId = 'birch-ply' | 'softwood-ply' | 'poplar-ply' | 'mdf' | 'extruded-foam';

/** A sheet material's defaults, each one editable. */
export interface SheetMaterial {
  id: SheetMaterialId;
  name: string;
  /** Density used for weight, kg/m³. */
  densityKgM3: number;
  /** The range makers give, where the density varies. */
  densityRangeKgM3?: { min: number; max: number };
  densityStatus: SourceStatus;
  /**
   * Bending modulus used for sag, N/mm² (along the face grain for plywood). `null` for a material not to be left
   * spanning between supports: lay it on a supported sheet. Each maker declares its own; replace the default with it.
   */
  bendingENmm2: number | null;
  bendingStatus: SourceStatus;
}

/** Sheet materials and their defaults. */
export const SHEET_MATERIALS: Readonly<Record<SheetMaterialId, SheetMaterial>> = {
  'birch-ply': {
    id: 'birch-ply',
    name: 'Birch plywood',
    densityKgM3: 695, // published (maker's datasheet), 12 mm
    densityRangeKgM3: { min: 680, max: 710 }, // published (maker's datasheet)
    densityStatus: 'published',
    bendingENmm2: 11000, // from memory (a maker's declaration of performance gives the real figure)
    bendingStatus: 'memory',
  },
  'softwood-ply': {
    id: 'softwood-ply',
    name: 'Spruce (softwood) plywood',
    densityKgM3: 460, // published (maker's datasheet)
    densityRangeKgM3: { min: 410, max: 510 }, // published (maker's datasheet): 460 ± 50
    densityStatus: 'published',
    bendingENmm2: 8000, // from memory (a maker's declaration of performance gives the real figure)
    bendingStatus: 'memory',
  },
  'poplar-ply': {
    id: 'poplar-ply',
    name: 'Pine or poplar (shuttering) plywood',
    densityKgM3: 575, // published (range): middle of 500–650
    densityRangeKgM3: { min: 500, max: 650 }, // published (range)
    densityStatus: 'published',
    bendingENmm2: 8000, // from memory (the softwood plywood figure; no figure of its own)
    bendingStatus: 'memory',
  },
  mdf: {
    id: 'mdf',
    name: 'MDF',
    densityKgM3: 750, // from memory
    densityStatus: 'memory',
    bendingENmm2: 2500, // from memory (low end of what makers declare)
    bendingStatus: 'memory',
  },
  'extruded-foam': {
    id: 'extruded-foam',
    name: 'Extruded foam board',
    densityKgM3: 35, // from memory
    densityStatus: 'memory',
    bendingENmm2: null, // not a spanning material
    bendingStatus: 'practice',
  },
};

/** Plywood thicknesses made, thinnest first, in millimetres. */
export const PLYWOOD_THICKNESSES_MM: readonly number[] = [3, 4, 6, 9, 12, 15, 18, 21, 24]; // published (makers' datasheets)

/** US plywood: what is sold as a nominal thickness is a little thinner. */
export const US_PLYWOOD_THICKNESSES: readonly { nominalIn: number; actualMm: number }[] = [
  { nominalIn: 0.5, actualMm: inchesToMm(15, 32) }, // published: ½ in sold as 15/32 in
  { nominalIn: 0.75, actualMm: inchesToMm(23, 32) }, // published: ¾ in sold as 23/32 in
];

/** Standard full sheet sizes, long side first, in millimetres. */
export const STANDARD_SHEET_SIZES_MM: readonly { lengthMm: number; widthMm: number; name: string }[] = [
  { lengthMm: 2440, widthMm: 1220, name: '2440 × 1220 (8 × 4 ft)' }, // published
  { lengthMm: 3050, widthMm: 1525, name: '3050 × 1525 (birch)' }, // published
];

/** An imperial 8 × 4 ft sheet, exactly, in millimetres. */
export const IMPERIAL_SHEET_MM = { lengthMm: inchesToMm(96), widthMm: inchesToMm(48) }; // published: 2438 × 1219 mm
