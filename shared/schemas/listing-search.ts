import { z } from 'zod';
import { LISTING_LIMITS as L } from '../listings/limits';
import { CONTROL_SYSTEMS, CURRENCIES, FINISHES, HANDLING_OPTIONS, LISTING_KINDS } from '../listings/vocabulary';
import { GAUGES_MM, SCALE_IDS } from '../scales';
import { pageField, pageSizeField } from './listing-fields';
import { LISTING_SORTS } from '../listings/sorts';

export { LISTING_SORTS, type ListingSort } from '../listings/sorts';

/** A query-string value as a list: `scale=h0&scale=oo` and `scale=h0,oo` both give ["h0", "oo"]. */
function toList(value: unknown): unknown {
  if (value === undefined || value === '') return undefined;
  const items = Array.isArray(value) ? value : [value];
  return items.flatMap((item) => (typeof item === 'string' ? item.split(',') : [item])).map((s) => String(s).trim());
}

const list = <T extends z.ZodType>(item: T, max: number, what: string) =>
  z.preprocess(toList, z.array(item).max(max, { error: `Choose at most ${max} ${what}.` })).optional();

const choices = <T extends readonly [string, ...string[]]>(values: T, what: string) =>
  list(z.enum(values, { error: `Unknown ${what}: choose from ${values.join(', ')}.` }), values.length, what);

/** A whole number from the query string, or absent when empty. */
const queryInt = (what: string, min: number, max: number) =>
  z
    .preprocess(
      (v) => (v === '' ? undefined : v),
      z.coerce
        .number({ error: `${what} must be a number.` })
        .int({ error: `${what} must be a whole number.` })
        .min(min, { error: `${what} must be at least ${min}.` })
        .max(max, { error: `${what} must be at most ${max}.` }),
    )
    .optional();

const gaugeItem = z.coerce
  .number({ error: 'Gauge must be a number of mm.' })
  .refine((g) => GAUGES_MM.includes(g), { error: `Choose a gauge from ${GAUGES_MM.join(', ')} mm.` });

/**
 * GET /api/listings. Several values of one filter widen the search (scale H0 or OO); different filters narrow it
 * (scale H0 and wired for DCC). Only listed listings are searched.
 */
export const listingSearchSchema = z
  .strictObject({
    q: z
      .string({ error: 'Search words must be text.' })
      .trim()
      .max(L.searchTextMax, { error: `Search words must be at most ${L.searchTextMax} characters.` })
      .optional(),
    kind: z.enum(LISTING_KINDS, { error: 'Kind must be module or service.' }).optional(),
    /** One seller's listings, by their user id (the listing page's "more from this seller"). */
    seller: queryInt('Seller', 1, 4_294_967_295),
    scale: choices(SCALE_IDS, 'scale'),
    gauge: list(gaugeItem, GAUGES_MM.length, 'gauges'),
    finish: choices(FINISHES, 'finish'),
    lengthMin: queryInt('Shortest length (mm)', 0, L.lengthMm.max),
    lengthMax: queryInt('Longest length (mm)', 0, L.lengthMm.max),
    widthMin: queryInt('Narrowest width (mm)', 0, L.widthMm.max),
    widthMax: queryInt('Widest width (mm)', 0, L.widthMm.max),
    priceMin: queryInt('Lowest price (pence or cents)', 0, L.priceMinor.max),
    priceMax: queryInt('Highest price (pence or cents)', 0, L.priceMinor.max),
    currency: z.enum(CURRENCIES, { error: `Currency must be ${CURRENCIES.join(' or ')}.` }).default('GBP'),
    town: queryInt('Town', 1, 4_294_967_295),
    withinKm: queryInt('Distance (km)', 1, L.withinKmMax),
    handling: choices(HANDLING_OPTIONS, 'handling option'),
    control: choices(CONTROL_SYSTEMS, 'control system'),
    joinOffsets: list(
      z.coerce
        .number({ error: 'Each track offset must be a number of mm.' })
        .int({ error: 'Each track offset must be a whole number of mm.' })
        .min(0, { error: 'A track offset cannot be negative.' })
        .max(L.widthMm.max, { error: `A track offset must be at most ${L.widthMm.max} mm.` }),
      L.tracksPerEnd,
      'track offsets',
    ),
    joinTolerance: queryInt('Offset tolerance (mm)', 0, L.profileToleranceMmMax).default(5),
    sort: z.enum(LISTING_SORTS, { error: `Sort must be one of ${LISTING_SORTS.join(', ')}.` }).optional(),
    page: pageField,
    pageSize: pageSizeField(L.searchPageSizeMax, 24),
  })
  .superRefine((s, ctx) => {
    const pairs = [
      ['lengthMin', 'lengthMax'],
      ['widthMin', 'widthMax'],
      ['priceMin', 'priceMax'],
    ] as const;
    for (const [low, high] of pairs) {
      const a = s[low];
      const b = s[high];
      if (a !== undefined && b !== undefined && a > b)
        ctx.addIssue({ code: 'custom', path: [high], message: `${high} must be at least ${low}.` });
    }
    if (s.withinKm !== undefined && s.town === undefined)
      ctx.addIssue({ code: 'custom', path: ['town'], message: 'Choose a town to search around.' });
    if (s.sort === 'distance' && s.town === undefined)
      ctx.addIssue({ code: 'custom', path: ['sort'], message: 'Choose a town to sort by distance.' });
    if (s.sort === 'relevance' && !s.q)
      ctx.addIssue({ code: 'custom', path: ['sort'], message: 'Type some search words to sort by relevance.' });
    if (s.joinOffsets && s.joinOffsets.length === 0)
      ctx.addIssue({ code: 'custom', path: ['joinOffsets'], message: 'Give at least one track offset.' });
  });
export type ListingSearchQuery = z.infer<typeof listingSearchSchema>;
