import { EngineeringInputError, requirePositive } from './checks';
import { PLYWOOD_THICKNESSES_MM, SHEET_MATERIALS, type SheetMaterial, type SheetMaterialId } from './sheet-data';
import {
  STANDARD_SECTIONS,
  TIMBER_CLASSES,
  type TimberClass,
  type TimberClassId,
  type TimberSection,
  UK_PLANING_ALLOWANCE,
} from './timber-data';

/** The width and thickness of a piece, in millimetres; a standard section or the user's own. */
export interface SectionSize {
  widthMm: number;
  thicknessMm: number;
}

/** A timber strength class by id (C16, C24). */
export function timberClass(id: TimberClassId): TimberClass {
  return TIMBER_CLASSES[id];
}

/** A sheet material's defaults by id. */
export function sheetMaterial(id: SheetMaterialId): SheetMaterial {
  return SHEET_MATERIALS[id];
}

/** Stiffness and density for sag from a timber class: E0,mean and ρmean. */
export function timberForSag(id: TimberClassId): { eNmm2: number; densityKgM3: number } {
  const c = TIMBER_CLASSES[id];
  return { eNmm2: c.eMeanNmm2, densityKgM3: c.densityMeanKgM3 };
}

/** Stiffness and density for sag from a sheet material; throws for one not to be left spanning (foam board). */
export function sheetForSag(id: SheetMaterialId): { eNmm2: number; densityKgM3: number } {
  const m = SHEET_MATERIALS[id];
  if (m.bendingENmm2 === null) {
    throw new EngineeringInputError(
      `${m.name} is not for spanning between cross members; lay it on a sheet that is, and check that sheet.`,
      'sheet material',
    );
  }
  return { eNmm2: m.bendingENmm2, densityKgM3: m.densityKgM3 };
}

/** A standard section by id (e.g. "uk-2x1"); throws for an id not offered. */
export function standardSection(id: string): TimberSection {
  const section = STANDARD_SECTIONS.find((s) => s.id === id);
  if (section === undefined) {
    const ids = STANDARD_SECTIONS.map((s) => s.id).join(', ');
    throw new EngineeringInputError(`"${id}" is not a standard section; choose one of ${ids}.`, 'section');
  }
  return section;
}

/** Standard sections of one region, shallowest first (by width, then thickness). */
export function standardSections(region: TimberSection['region']): TimberSection[] {
  return STANDARD_SECTIONS.filter((s) => s.region === region).sort(
    (a, b) => a.widthMm - b.widthMm || a.thicknessMm - b.thicknessMm,
  );
}

/** A standard section with the user's own measured sizes, keeping its name. */
export function withMeasuredSize(section: TimberSection, size: Partial<SectionSize>): TimberSection {
  const measured = { ...section, ...size };
  requirePositive(measured.widthMm, 'Section width', 'millimetres');
  requirePositive(measured.thicknessMm, 'Section thickness', 'millimetres');
  return measured;
}

/**
 * Planed size from a sawn ("ex") dimension by the UK planing allowance: 3 mm off up to 150 mm, 5 mm off above.
 * Merchants often plane more than this (2x1 ex 50 × 22 is sold as 44 × 18), so measure stock where it matters.
 */
export function planedFromSawn(sawnMm: number): number {
  requirePositive(sawnMm, 'Sawn size', 'millimetres');
  const { upToMm, smallMm, largeMm } = UK_PLANING_ALLOWANCE;
  const allowance = sawnMm <= upToMm ? smallMm : largeMm;
  if (sawnMm <= allowance) {
    throw new EngineeringInputError(`A sawn size of ${sawnMm} mm is too small to plane.`, 'sawn size');
  }
  return sawnMm - allowance;
}

/** Plywood thicknesses thicker than `thicknessMm`, thinnest first. */
export function thickerSheets(thicknessMm: number): number[] {
  return PLYWOOD_THICKNESSES_MM.filter((t) => t > thicknessMm);
}

/** Sections from `candidates` deeper (wider on edge) than `section`, shallowest first. */
export function deeperSections<T extends SectionSize>(section: SectionSize, candidates: readonly T[]): T[] {
  return candidates
    .filter((c) => c.widthMm > section.widthMm)
    .sort((a, b) => a.widthMm - b.widthMm || a.thicknessMm - b.thicknessMm);
}
