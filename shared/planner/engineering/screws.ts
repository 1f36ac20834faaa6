import { lengthText as len } from '../text/lengths';
import { EngineeringInputError, requirePositive } from './checks';
import {
  COUNTERSINK_FACTOR,
  FAR_FACE_COVER_MM,
  GAUGE_BY_LENGTH,
  MIN_SHARE_IN_BASE,
  SCREW_GAUGES,
  SCREW_LENGTH_FACTOR,
  type ScrewGauge,
  STOCK_SCREW_LENGTHS_MM,
} from './fixings-data';

/** A screwed joint: a piece fixed onto a base piece. */
export interface ScrewJoint {
  /** Thickness of the piece being fixed (the screw passes through it), mm. */
  fixedThicknessMm: number;
  /** Depth of wood in the base piece along the screw's line, mm. */
  baseDepthMm: number;
  /** A screw gauge to use, mm (3, 3.5, 4 or 5); default chosen by length. */
  gaugeMm?: number;
  /** Wood to leave past the tip, mm; default 2. */
  farFaceCoverMm?: number;
}

/** A screw that suits the joint, with its drill sizes. */
export interface Screw {
  lengthMm: number;
  gaugeMm: number;
  /** Pilot hole in the base piece, mm, and the range the charts allow. */
  pilotMm: number;
  pilotRangeMm: { min: number; max: number };
  /** Clearance hole through the piece being fixed, mm. */
  clearanceMm: number;
  /** Countersink diameter so the head sits flush, mm. */
  countersinkMm: number;
  /** Length of screw in the base piece, mm. */
  inBaseMm: number;
  /** Wood left between the tip and the base's far face, mm. */
  leftBeyondTipMm: number;
}

/** A screw for the joint, or why none of the stock lengths will do. */
export type ScrewChoice = { ok: true; screw: Screw } | { ok: false; reason: string };

/** The screw gauge's drill sizes; throws for a gauge not offered. */
export function screwGauge(gaugeMm: number): ScrewGauge {
  const gauge = SCREW_GAUGES.find((g) => g.nominalMm === gaugeMm);
  if (gauge === undefined) {
    const offered = SCREW_GAUGES.map((g) => g.nominalMm).join(', ');
    throw new EngineeringInputError(`A ${gaugeMm} mm screw is not offered; choose ${offered} mm.`, 'gauge');
  }
  return gauge;
}

/** The shortest screw the rules allow for a piece `fixedMm` thick: 2.5 × it, raised so two-thirds sits in the base. */
export function minimumScrewLengthMm(fixedMm: number): number {
  requirePositive(fixedMm, 'Thickness of the piece being fixed', 'millimetres');
  return Math.max(SCREW_LENGTH_FACTOR * fixedMm, fixedMm / (1 - MIN_SHARE_IN_BASE));
}

function gaugeFor(lengthMm: number): number {
  const band = GAUGE_BY_LENGTH.find((b) => lengthMm <= b.upToLengthMm);
  return band === undefined ? Math.max(...GAUGE_BY_LENGTH.map((b) => b.gaugeMm)) : band.gaugeMm;
}

/**
 * Chooses a countersunk wood screw for a joint: about 2.5 × the thickness of the piece being fixed, with at least
 * two-thirds of its length in the base piece (so at least 3 × that thickness), rounded up to a stock length, and never
 * so long that its tip reaches the base's far face.
 */
export function screwFor(joint: ScrewJoint): ScrewChoice {
  const { fixedThicknessMm: fixed, baseDepthMm: base, farFaceCoverMm: cover = FAR_FACE_COVER_MM } = joint;
  requirePositive(base, 'Depth of the base piece', 'millimetres');
  const neededMm = minimumScrewLengthMm(fixed);
  const fitsMm = fixed + base - cover;
  const lengthMm = STOCK_SCREW_LENGTHS_MM.find(
    (l) => l >= neededMm - 1e-9 && l - fixed >= MIN_SHARE_IN_BASE * l - 1e-9,
  );
  if (lengthMm === undefined) {
    return {
      ok: false,
      reason: `A piece ${len(fixed)} thick needs a screw over ${len(Math.max(...STOCK_SCREW_LENGTHS_MM))}; bolt it instead.`,
    };
  }
  if (lengthMm > fitsMm) {
    return {
      ok: false,
      reason:
        `A piece ${len(fixed)} thick needs a ${len(lengthMm)} screw to get two-thirds of it into the base, but the base ` +
        `is only ${len(base)} deep, so the point would come through. Fix from the other side, use a deeper base ` +
        'piece, or bolt it.',
    };
  }
  const gauge = screwGauge(joint.gaugeMm ?? gaugeFor(lengthMm));
  return {
    ok: true,
    screw: {
      lengthMm,
      gaugeMm: gauge.nominalMm,
      pilotMm: gauge.pilotMm,
      pilotRangeMm: gauge.pilotRangeMm,
      clearanceMm: gauge.clearanceMm,
      countersinkMm: COUNTERSINK_FACTOR * gauge.nominalMm,
      inBaseMm: lengthMm - fixed,
      leftBeyondTipMm: fixed + base - lengthMm,
    },
  };
}
