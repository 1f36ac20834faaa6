/**
 * Thrown when a calculation is given a number it cannot work with. The message names the field, what it must be
 * and what was given, so a form can show it as it is.
 */
export class EngineeringInputError extends Error {
  override readonly name = 'EngineeringInputError';

  constructor(
    message: string,
    /** The input field at fault, as named in the message. */
    readonly field: string,
  ) {
    super(message);
  }
}

/** Throws unless `value` is a finite number greater than zero; `field` and `unit` word the message. */
export function requirePositive(value: number, field: string, unit: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new EngineeringInputError(`${field} must be a number of ${unit} greater than zero (got ${value}).`, field);
  }
}

/** Throws unless `value` is a finite number of zero or more; `field` and `unit` word the message. */
export function requireNonNegative(value: number, field: string, unit: string): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new EngineeringInputError(`${field} must be a number of ${unit}, zero or more (got ${value}).`, field);
  }
}

/** Throws unless `value` is a finite number (any sign). */
export function requireFinite(value: number, field: string, unit: string): void {
  if (!Number.isFinite(value)) {
    throw new EngineeringInputError(`${field} must be a number of ${unit} (got ${value}).`, field);
  }
}
