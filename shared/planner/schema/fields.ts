import { z } from 'zod';
import { PLAN_LIMITS } from '../limits';
import { lengthText } from '../text/lengths';

/*
 * Field builders shared by the plan's schemas. Lengths are numbers of millimetres: the form converts what the user
 * types (feet and inches too) with the engineering units module before it gets here. Every message names the cause
 * and the fix.
 */

/**
 * A number in a range, with messages that name the field, e.g. "Board length must be at least 300 mm." Limits of a
 * length (unit "mm") are worded when the message is made, in the unit of the plan being read (see text/lengths).
 */
export function rangeField(label: string, unit: string, min: number, max: number) {
  const isLength = unit === 'mm';
  const limit = (value: number) => (isLength ? lengthText(value) : unit === '' ? `${value}` : `${value} ${unit}`);
  const what = label.toLowerCase();
  return z
    .number({
      error: () =>
        isLength
          ? `Enter the ${what} as a length.`
          : `Enter the ${what} as a number${unit === '' ? '' : ` of ${unit}`}.`,
    })
    .min(min, { error: () => `${label} must be at least ${limit(min)}.` })
    .max(max, { error: () => `${label} must be at most ${limit(max)}.` });
}

/** A length in millimetres, rounded to the nearest whole millimetre (the precision of a saw cut) once checked. */
export function wholeMmField(label: string, min: number, max: number) {
  return rangeField(label, 'mm', min, max).transform((mm) => Math.round(mm));
}

/** A whole number in a range: a count, a price in minor units, a day count. */
export function wholeNumberField(label: string, min: number, max: number, unit = '') {
  return rangeField(label, unit, min, max).int({ error: `${label} must be a whole number.` });
}

/** A name shown to people: trimmed, not empty, not too long. */
export function nameField(label: string) {
  const max = PLAN_LIMITS.maxNameLength;
  return z
    .string({ error: `Enter the ${label.toLowerCase()}.` })
    .trim()
    .min(1, { error: `Enter the ${label.toLowerCase()}.` })
    .max(max, { error: `${label} must be at most ${max} characters.` });
}

/** One of a fixed list of choices, with a message that lists them. */
export function choiceField<const T extends readonly [string, ...string[]]>(label: string, options: T) {
  return z.enum(options, { error: `Choose the ${label.toLowerCase()}: ${options.join(', ')}.` });
}

/** A strict object whose message for an unknown key names the key and what it was found in. */
export function strictGroup<T extends z.core.$ZodLooseShape>(what: string, shape: T) {
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `"${issue.keys.join('", "')}" is not a setting of ${what}; remove it or check its spelling.`
        : `Give the ${what} as an object of settings.`,
  });
}
