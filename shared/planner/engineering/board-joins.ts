import { requireNonNegative, requirePositive } from './checks';
import { JOIN_BOLT, JOIN_FIXINGS_PER_END, PVA_SPREAD_G_PER_M2, STOCK_BOLT_LENGTHS_MM } from './fixings-data';

/** How two boards are held together at a join. */
export type JoinMethod = 'bolts' | 'dowels';

/** The fixings for the joins of a layout. */
export interface JoinFixings {
  method: JoinMethod;
  perJoin: number;
  total: number;
  /** For bolts: the coach bolt, its clearance hole, and the washers and wing nuts to go with them. */
  bolt?: { diameterMm: number; lengthMm: number; clearanceHoleMm: number; washers: number; wingNuts: number };
  note: string;
}

/**
 * Fixings for `joins` board-to-board joins through two end rails `endRailThicknessMm` thick: two per join, either M8
 * coach bolts with washers and wing nuts (length: both rails plus room for washer and nut, up to a stock length) or
 * pattern-makers' dowels to line the boards up, held by clamps or catches.
 */
export function boardJoinFixings(joins: number, endRailThicknessMm: number, method: JoinMethod = 'bolts'): JoinFixings {
  requireNonNegative(joins, 'Number of joins', 'joins');
  requirePositive(endRailThicknessMm, 'End rail thickness', 'millimetres');
  const total = JOIN_FIXINGS_PER_END * joins;
  if (method === 'dowels') {
    return {
      method,
      perJoin: JOIN_FIXINGS_PER_END,
      total,
      note: "Fit each pair of pattern-makers' dowels with the boards clamped in line, then hold them with clamps or catches.",
    };
  }
  const neededMm = 2 * endRailThicknessMm + JOIN_BOLT.nutAllowanceDiameters * JOIN_BOLT.diameterMm;
  const lengthMm = STOCK_BOLT_LENGTHS_MM.find((l) => l >= neededMm) ?? Math.ceil(neededMm / 10) * 10;
  return {
    method,
    perJoin: JOIN_FIXINGS_PER_END,
    total,
    bolt: {
      diameterMm: JOIN_BOLT.diameterMm,
      lengthMm,
      clearanceHoleMm: JOIN_BOLT.clearanceHoleMm,
      washers: total,
      wingNuts: total,
    },
    note: 'Drill both end rails together, clamped with the boards in line, so the holes match.',
  };
}

/** PVA for glued joints, g: the glued face's width × joint length × spread on one face. */
export function pvaGrams(joints: readonly { lengthMm: number; faceWidthMm: number }[]): number {
  return joints.reduce((sum, j) => {
    requireNonNegative(j.lengthMm, 'Glued joint length', 'millimetres');
    requireNonNegative(j.faceWidthMm, 'Glued face width', 'millimetres');
    return sum + ((j.lengthMm * j.faceWidthMm) / 1e6) * PVA_SPREAD_G_PER_M2;
  }, 0);
}

/** PVA per metre of glued joint with a face `faceWidthMm` wide, g/m. */
export function pvaGramsPerMetre(faceWidthMm: number): number {
  return pvaGrams([{ lengthMm: 1000, faceWidthMm }]);
}
