import { requireNonNegative, requirePositive } from './checks';

/*
 * Deflection of a prismatic elastic beam, in consistent units: N, mm, N/mm² give millimetres. A uniform load w is in
 * N/mm (1 kN/m = 1 N/mm). Formulas from any structures handbook.
 */

function requireBeam(lengthMm: number, eNmm2: number, iMm4: number): void {
  requirePositive(lengthMm, 'Span', 'millimetres');
  requirePositive(eNmm2, 'Modulus of elasticity', 'N/mm²');
  requirePositive(iMm4, 'Second moment of area', 'mm⁴');
}

/** Mid-span deflection of a simply supported beam under a uniform load: 5wL⁴ / (384EI). */
export function simplySupportedUniformDeflection(
  wNPerMm: number,
  lengthMm: number,
  eNmm2: number,
  iMm4: number,
): number {
  requireNonNegative(wNPerMm, 'Uniform load', 'N/mm');
  requireBeam(lengthMm, eNmm2, iMm4);
  return (5 * wNPerMm * lengthMm ** 4) / (384 * eNmm2 * iMm4);
}

/** Mid-span deflection of a simply supported beam under a central point load: PL³ / (48EI). */
export function simplySupportedPointDeflection(pN: number, lengthMm: number, eNmm2: number, iMm4: number): number {
  requireNonNegative(pN, 'Point load', 'newtons');
  requireBeam(lengthMm, eNmm2, iMm4);
  return (pN * lengthMm ** 3) / (48 * eNmm2 * iMm4);
}

/** Tip deflection of a cantilever under a uniform load: wL⁴ / (8EI). */
export function cantileverUniformDeflection(wNPerMm: number, lengthMm: number, eNmm2: number, iMm4: number): number {
  requireNonNegative(wNPerMm, 'Uniform load', 'N/mm');
  requireBeam(lengthMm, eNmm2, iMm4);
  return (wNPerMm * lengthMm ** 4) / (8 * eNmm2 * iMm4);
}

/** Tip deflection of a cantilever under a point load at its end: PL³ / (3EI). */
export function cantileverEndPointDeflection(pN: number, lengthMm: number, eNmm2: number, iMm4: number): number {
  requireNonNegative(pN, 'Point load', 'newtons');
  requireBeam(lengthMm, eNmm2, iMm4);
  return (pN * lengthMm ** 3) / (3 * eNmm2 * iMm4);
}

/** Second moment of area of a rectangle about its centroidal axis parallel to `breadthMm`: bh³ / 12, in mm⁴. */
export function rectangleSecondMoment(breadthMm: number, depthMm: number): number {
  requirePositive(breadthMm, 'Breadth', 'millimetres');
  requirePositive(depthMm, 'Depth', 'millimetres');
  return (breadthMm * depthMm ** 3) / 12;
}
