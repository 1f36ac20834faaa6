import { formatFeetInches } from '../engineering/units';

/** How finely a length is given: a size (whole mm, nearest 1/16 in) or a small measure such as a sag (0.1 mm, 1/32 in). */
export type LengthPrecision = 'size' | 'fine';

/** Puts a length held in millimetres into the reader's unit: "1200 mm" or `3' 11 1/4"`. */
export type LengthFormat = (mm: number, precision?: LengthPrecision) => string;

/** Millimetres: sizes to the whole millimetre (a saw cut's precision), small measures to a tenth. */
export const metricLengths: LengthFormat = (mm, precision = 'size') =>
  precision === 'fine' ? `${mm.toFixed(1)} mm` : `${Math.round(mm)} mm`;

/** Feet and inches: sizes to the nearest 1/16 in, small measures to the nearest 1/32 in. */
export const imperialLengths: LengthFormat = (mm, precision = 'size') =>
  formatFeetInches(mm, { denominator: precision === 'fine' ? 32 : 16 });

/** The words for a plan's `units` setting, millimetres unless it says imperial. */
export function lengthFormatFor(units: unknown): LengthFormat {
  return units === 'imperial' ? imperialLengths : metricLengths;
}

/*
 * The format the planner's messages use while it works. Planning is synchronous, so `withLengthFormat` sets it for
 * the length of one call and puts the previous one back, and messages built anywhere inside (the schema's field
 * messages included, which zod builds as it parses) quote lengths in the reader's unit without every function taking
 * the format along.
 */
let current: LengthFormat = metricLengths;

/** A length in the words of the plan being worked out: millimetres, or the caller's format. */
export function lengthText(mm: number, precision?: LengthPrecision): string {
  return current(mm, precision);
}

/** Runs `work` with lengths in its messages given by `format`. */
export function withLengthFormat<T>(format: LengthFormat, work: () => T): T {
  const before = current;
  current = format;
  try {
    return work();
  } finally {
    current = before;
  }
}
