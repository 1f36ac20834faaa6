import { requireNonNegative, requirePositive } from './checks';
import { TIMBER_CLASSES } from './timber-data';

const MM3_PER_M3 = 1e9;

/** A length of timber in a frame: rail, cross member, leg, batten. */
export interface TimberPart {
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  /** How many alike; default 1. */
  quantity?: number;
  /** kg/m³; default ρmean of C16, 370 kg/m³ (EN 338:2016, Table 1). */
  densityKgM3?: number;
}

/** A piece of sheet: the top, a fascia, a backscene. */
export interface SheetPart {
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  densityKgM3: number;
  /** How many alike; default 1. */
  quantity?: number;
}

/** The parts of one board. */
export interface BoardParts {
  name?: string;
  timber: readonly TimberPart[];
  sheets: readonly SheetPart[];
}

/** A board's mass, split into frame and sheet. */
export interface BoardMass {
  name?: string;
  timberKg: number;
  sheetKg: number;
  totalKg: number;
}

function blockMassKg(lengthMm: number, widthMm: number, thicknessMm: number, densityKgM3: number): number {
  requirePositive(lengthMm, 'Length', 'millimetres');
  requirePositive(widthMm, 'Width', 'millimetres');
  requirePositive(thicknessMm, 'Thickness', 'millimetres');
  requireNonNegative(densityKgM3, 'Density', 'kg/m³');
  return ((lengthMm * widthMm * thicknessMm) / MM3_PER_M3) * densityKgM3;
}

function quantityOf(part: { quantity?: number }): number {
  const quantity = part.quantity ?? 1;
  requireNonNegative(quantity, 'Quantity', 'pieces');
  return quantity;
}

/** Mass of timber parts, kg: volume × density (ρmean of C16 unless given). */
export function timberMassKg(part: TimberPart): number {
  const density = part.densityKgM3 ?? TIMBER_CLASSES.C16.densityMeanKgM3;
  return blockMassKg(part.lengthMm, part.widthMm, part.thicknessMm, density) * quantityOf(part);
}

/** Mass of sheet parts, kg: area × thickness × density. */
export function sheetMassKg(part: SheetPart): number {
  return blockMassKg(part.lengthMm, part.widthMm, part.thicknessMm, part.densityKgM3) * quantityOf(part);
}

/** Mass of one square metre of sheet, kg/m²: the sheet's share of a board's load. */
export function sheetMassPerAreaKgM2(thicknessMm: number, densityKgM3: number): number {
  requirePositive(thicknessMm, 'Thickness', 'millimetres');
  requireNonNegative(densityKgM3, 'Density', 'kg/m³');
  return (thicknessMm / 1000) * densityKgM3;
}

/** A board's mass: frame timber, sheets and the two together, kg. */
export function boardMass(board: BoardParts): BoardMass {
  const timberKg = board.timber.reduce((sum, part) => sum + timberMassKg(part), 0);
  const sheetKg = board.sheets.reduce((sum, part) => sum + sheetMassKg(part), 0);
  return { name: board.name, timberKg, sheetKg, totalKg: timberKg + sheetKg };
}

/** Each board's mass and the whole layout's, kg. */
export function layoutMass(boards: readonly BoardParts[]): { boards: BoardMass[]; totalKg: number } {
  const masses = boards.map(boardMass);
  return { boards: masses, totalKg: masses.reduce((sum, b) => sum + b.totalKg, 0) };
}
