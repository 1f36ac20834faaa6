import { rectangleSecondMoment, simplySupportedPointDeflection, simplySupportedUniformDeflection } from './beams';
import { DEFAULT_SPAN_LIMIT_RATIO, SHEET_STRIP_WIDTH_MM, STANDARD_GRAVITY } from './beams-data';
import { requireNonNegative, requirePositive } from './checks';
import type { SectionSize } from './materials';

/** A frame rail (a side rail between legs) standing on edge, as a simply supported beam. */
export interface RailSagInput {
  /** Longest unsupported length of the rail, between legs or other supports, mm. */
  spanMm: number;
  /** The rail's section; it stands on edge, so `widthMm` is its depth. */
  section: SectionSize;
  /** Modulus of elasticity, N/mm²: the timber class's E0,mean. */
  eNmm2: number;
  /** Density for the rail's own weight, kg/m³: the timber class's ρmean. */
  densityKgM3: number;
  /** Everything the rail carries on the board's top (sheet, track, scenery), kg per m² of board area. */
  loadKgM2: number;
  /** Width of board whose load the rail carries, mm: half the board's width for each side rail of a ladder frame. */
  tributaryWidthMm: number;
  /** A point load at mid-span, N: someone leaning on the edge. */
  pointLoadN?: number;
  /** Allowed sag is span / `limitRatio`; default 300. */
  limitRatio?: number;
}

/**
 * A 1 m wide strip of top sheet spanning between two cross members as a simply supported beam. This simplifies: a
 * sheet running on over many cross members is continuous and sags less, so the answer errs on the safe side.
 */
export interface SheetSagInput {
  /** Centres of the cross members the sheet spans between, mm. */
  spacingMm: number;
  thicknessMm: number;
  /** Bending modulus of the sheet, N/mm² (the maker's declared figure where known). */
  eNmm2: number;
  /** Sheet density for its own weight, kg/m³. */
  densityKgM3: number;
  /** What lies on the sheet (track, ballast, scenery), kg per m²; the sheet's own weight is added. */
  loadKgM2: number;
  /** Allowed sag is span / `limitRatio`; default 300. */
  limitRatio?: number;
}

/** Sag against its limit. */
export interface SagFigures {
  deflectionMm: number;
  limitMm: number;
  passes: boolean;
  /** deflection / limit: at most 1 passes. */
  utilisation: number;
}

function figures(deflectionMm: number, spanMm: number, limitRatio = DEFAULT_SPAN_LIMIT_RATIO): SagFigures {
  requirePositive(limitRatio, 'Span limit ratio', 'span divisions');
  const limitMm = spanMm / limitRatio;
  return { deflectionMm, limitMm, passes: deflectionMm <= limitMm, utilisation: deflectionMm / limitMm };
}

/** Load per mm of length, N/mm, from kg/m² over a width in mm. */
function lineLoad(kgPerM2: number, widthMm: number): number {
  return (kgPerM2 * STANDARD_GRAVITY * widthMm) / 1e6;
}

/** Mid-span sag of a rail on edge under its share of the board's load, its own weight and any point load. */
export function railSag(input: RailSagInput): SagFigures {
  const { spanMm, section, eNmm2, densityKgM3, loadKgM2, tributaryWidthMm, pointLoadN = 0 } = input;
  requirePositive(section.widthMm, 'Rail depth', 'millimetres');
  requirePositive(section.thicknessMm, 'Rail thickness', 'millimetres');
  requireNonNegative(densityKgM3, 'Timber density', 'kg/m³');
  requireNonNegative(loadKgM2, 'Load on the board', 'kg/m²');
  requireNonNegative(tributaryWidthMm, 'Width of board carried', 'millimetres');
  const iMm4 = rectangleSecondMoment(section.thicknessMm, section.widthMm);
  const ownWeight = densityKgM3 * section.thicknessMm * section.widthMm * 1e-9 * STANDARD_GRAVITY;
  const w = lineLoad(loadKgM2, tributaryWidthMm) + ownWeight;
  const deflection =
    simplySupportedUniformDeflection(w, spanMm, eNmm2, iMm4) +
    simplySupportedPointDeflection(pointLoadN, spanMm, eNmm2, iMm4);
  return figures(deflection, spanMm, input.limitRatio);
}

/** Mid-span sag of a 1 m strip of top sheet between cross members, under its load and its own weight. */
export function sheetSag(input: SheetSagInput): SagFigures {
  const { spacingMm, thicknessMm, eNmm2, densityKgM3, loadKgM2 } = input;
  requirePositive(thicknessMm, 'Sheet thickness', 'millimetres');
  requireNonNegative(densityKgM3, 'Sheet density', 'kg/m³');
  requireNonNegative(loadKgM2, 'Load on the sheet', 'kg/m²');
  const ownKgM2 = (densityKgM3 * thicknessMm) / 1000;
  const w = lineLoad(loadKgM2 + ownKgM2, SHEET_STRIP_WIDTH_MM);
  const iMm4 = rectangleSecondMoment(SHEET_STRIP_WIDTH_MM, thicknessMm);
  return figures(simplySupportedUniformDeflection(w, spacingMm, eNmm2, iMm4), spacingMm, input.limitRatio);
}
