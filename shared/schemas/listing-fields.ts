import { z } from 'zod';
import { roundPosition } from '../geo';
import { CURRENCIES } from '../listings/vocabulary';
import { LISTING_LIMITS as L } from '../listings/limits';

/** Field rules shared by the module and service listing schemas. Messages name the cause and the fix. */

/** A whole number of `unit` between `min` and `max`, e.g. a length in mm. */
export const wholeNumber = (what: string, unit: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${what} as a number of ${unit}.` })
    .int({ error: `Give the ${what} as a whole number of ${unit}.` })
    .min(min, { error: `The ${what} must be at least ${min} ${unit}.` })
    .max(max, { error: `The ${what} must be at most ${max} ${unit}.` });

/** An amount of money in whole minor units (pence, cent). */
export const minorUnits = (what: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${what} in pence or cents, e.g. 12500 for 125.00.` })
    .int({ error: `Give the ${what} in whole pence or cents, e.g. 12500 for 125.00.` })
    .min(min, {
      error:
        min > 0
          ? `The ${what} must be more than zero: give it in pence or cents, e.g. 12500 for 125.00.`
          : `The ${what} cannot be negative.`,
    })
    .max(max, { error: `The ${what} must be at most ${max} in pence or cents.` });

/** Drop carriage returns and control characters other than tab and newline; trim the ends. */
const plainText = (value: string) =>
  value
    .replace(/\r\n?/g, '\n')
    // eslint-disable-next-line no-control-regex -- removing control characters is the point
    .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/g, '')
    .trim();

/** Plain text of `min`–`max` characters (the client shows it as text, never as HTML). */
export const plainTextField = (what: string, min: number, max: number) =>
  z
    .string({ error: `Write the ${what}.` })
    .transform(plainText)
    .pipe(
      z
        .string()
        .min(min, { error: `The ${what} must be at least ${min} characters.` })
        .max(max, { error: `The ${what} must be at most ${max} characters.` }),
    );

export const titleField = z
  .string({ error: 'Give the listing a title.' })
  .transform((v) => plainText(v).replace(/\s+/g, ' '))
  .pipe(
    z
      .string()
      .min(L.titleMin, { error: `The title must be at least ${L.titleMin} characters, e.g. "H0 station module".` })
      .max(L.titleMax, { error: `The title must be at most ${L.titleMax} characters.` }),
  );

export const descriptionField = plainTextField('description', L.descriptionMin, L.descriptionMax);

/** A town from the gazetteer (GET /api/towns); the server checks that it exists. */
export const townIdField = z
  .number({ error: 'Choose the nearest town from the list.' })
  .int({ error: 'Choose the nearest town from the list.' })
  .positive({ error: 'Choose the nearest town from the list.' });

/**
 * An approximate position, rounded to two decimal places (about a kilometre) before it is stored: never a street
 * address. Leave it out to use the town's own position.
 */
export const positionField = z
  .strictObject({
    lat: z
      .number({ error: 'Give the latitude in decimal degrees.' })
      .min(-90, { error: 'Latitude must be between -90 and 90.' })
      .max(90, { error: 'Latitude must be between -90 and 90.' }),
    lon: z
      .number({ error: 'Give the longitude in decimal degrees.' })
      .min(-180, { error: 'Longitude must be between -180 and 180.' })
      .max(180, { error: 'Longitude must be between -180 and 180.' }),
  })
  .transform((p) => roundPosition(p));

export const currencyField = z
  .enum(CURRENCIES, { error: `Choose the currency: ${CURRENCIES.join(' or ')}.` })
  .default('GBP');

/** An array whose items are each given once. */
export const distinct = <T>(items: readonly T[]) => new Set(items).size === items.length;

/** A list of choices from `values`, each at most once. */
export const choiceList = <T extends readonly [string, ...string[]]>(values: T, what: string, min: number) =>
  z
    .array(z.enum(values, { error: `Choose ${what} from the list.` }), { error: `Choose ${what} from the list.` })
    .min(min, { error: `Choose at least ${min === 1 ? 'one' : min} of the ${what}.` })
    .max(values.length, { error: `Choose each of the ${what} at most once.` })
    .refine(distinct, { error: `Choose each of the ${what} at most once.` });

/** A page number, from 1. */
export const pageField = z.coerce
  .number({ error: 'Page must be a number.' })
  .int({ error: 'Page must be a whole number.' })
  .min(1, { error: 'Page must be 1 or more.' })
  .max(10_000, { error: 'Page must be at most 10000.' })
  .default(1);

/** A page size from 1 to `max`. */
export const pageSizeField = (max: number, fallback: number) =>
  z.coerce
    .number({ error: 'Page size must be a number.' })
    .int({ error: 'Page size must be a whole number.' })
    .min(1, { error: 'Page size must be 1 or more.' })
    .max(max, { error: `Page size must be at most ${max}.` })
    .default(fallback);
