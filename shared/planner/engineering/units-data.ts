/** Millimetres in one inch: the international inch, exact by definition since 1959. */
export const MM_PER_INCH = 25.4; // international yard and pound agreement, 1959: exact by definition

/** Inches in one foot. */
export const INCHES_PER_FOOT = 12; // definition of the foot, exact

/** Millimetres in one foot: 12 × 25.4, exact (written out, as 12 × 25.4 in floating point is not). */
export const MM_PER_FOOT = 304.8; // international yard and pound agreement, 1959: exact by definition

/** The finest fraction of an inch a length is shown in: 1/16 in, the smallest mark on a common tape. */
export const DEFAULT_INCH_DENOMINATOR = 16; // common practice, no source

/** A unit a length may be typed in. */
export type LengthUnit = 'mm' | 'cm' | 'm' | 'in' | 'ft';

/** Millimetres per unit; each is exact. */
export const MM_PER_UNIT: Readonly<Record<LengthUnit, number>> = {
  mm: 1,
  cm: 10, // SI prefix, exact
  m: 1000, // SI prefix, exact
  in: MM_PER_INCH,
  ft: MM_PER_FOOT,
};

/**
 * Millimetres per unit as a whole-number ratio [numerator, denominator], so sums of feet and inches are worked in
 * whole numbers and divided once.
 */
export const MM_PER_UNIT_RATIO: Readonly<Record<LengthUnit, readonly [number, number]>> = {
  mm: [1, 1],
  cm: [10, 1],
  m: [1000, 1],
  in: [254, 10],
  ft: [3048, 10],
};

/** The words and marks read as each unit, lower case. Primes and typographic quotes are folded to ' and " first. */
export const UNIT_WORDS: Readonly<Record<string, LengthUnit>> = {
  mm: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  cm: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  ft: 'ft',
  foot: 'ft',
  feet: 'ft',
  "'": 'ft',
};

/** Unicode vulgar fractions read as the fraction they show (½ → 1/2). */
export const UNICODE_FRACTIONS: Readonly<Record<string, string>> = {
  '¼': '1/4',
  '½': '1/2',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
};

/** Millimetres in `numerator / denominator` inches, divided once so that e.g. ¾ in gives exactly 19.05. */
export function inchesToMm(numerator: number, denominator = 1): number {
  return (numerator * 254) / (denominator * 10);
}
