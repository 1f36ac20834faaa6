import { z } from 'zod';
import { LISTING_LIMITS as L } from '../listings/limits';
import {
  CONDITIONS,
  CONTROL_SYSTEMS,
  COURIER_SERVICES,
  FINISHES,
  HEIGHT_REFERENCES,
  JOIN_METHODS,
  SUPPORTS,
  TOP_MATERIALS,
} from '../listings/vocabulary';
import { estimateModuleWeight, estimateToKg } from '../planner/estimate-module-weight';
import { SCALE_IDS } from '../scales';
import {
  currencyField,
  descriptionField,
  minorUnits,
  plainTextField,
  positionField,
  titleField,
  townIdField,
  wholeNumber,
} from './listing-fields';

/** Whether the seller typed the weight or took the planner's estimate from the construction. */
export const WEIGHT_SOURCES = ['entered', 'estimated'] as const;
export type WeightSource = (typeof WEIGHT_SOURCES)[number];

const mm = (what: string, range: { min: number; max: number }) => wholeNumber(what, 'mm', range.min, range.max);

/** Single deck, or two decks (a scene above a fiddle yard, say) with the height between them. */
export const levelsSchema = z.discriminatedUnion(
  'type',
  [
    z.strictObject({ type: z.literal('single') }),
    z.strictObject({ type: z.literal('two-level'), deckGapMm: mm('height between the decks', L.deckGapMm) }),
  ],
  { error: 'Choose single or two-level.' },
);

export const constructionSchema = z
  .strictObject({
    /** The frame members' section: depth on edge × thickness, e.g. 44 × 18 for planed "2x1". */
    frameDepthMm: mm('depth of the frame timber', L.frameMemberMm),
    frameThicknessMm: mm('thickness of the frame timber', L.frameMemberMm),
    crossMemberSpacingMm: mm('cross-member spacing', L.crossMemberSpacingMm),
    topMaterial: z.enum(TOP_MATERIALS, { error: 'Choose what the top is made of, or "No top".' }),
    topThicknessMm: mm('top thickness', L.topThicknessMm).nullable(),
    supports: z.enum(SUPPORTS, { error: 'Say what holds the board up: legs, wall brackets or nothing.' }),
  })
  .refine((c) => (c.topMaterial === 'none') === (c.topThicknessMm === null), {
    error: 'Give the top thickness, or choose "No top" and leave the thickness empty.',
    path: ['topThicknessMm'],
  });

/** How the board is wired; null when it carries no wiring. */
export const wiringSchema = z
  .strictObject({
    control: z.enum(CONTROL_SYSTEMS, { error: 'Choose DC or DCC.' }),
    busWireMm2: z
      .number({ error: 'Give the bus wire size in mm², e.g. 1.5.' })
      .min(L.busWireMm2.min, { error: `The bus wire must be at least ${L.busWireMm2.min} mm².` })
      .max(L.busWireMm2.max, { error: `The bus wire must be at most ${L.busWireMm2.max} mm².` }),
    boardConnectors: plainTextField('connectors between boards', 0, 120),
  })
  .nullable();

/**
 * The joining profile at one end: where each track crosses the end, measured from the board's front edge, and the
 * rail-top height. Another module joins when its end has the same tracks at the same places.
 */
export const endProfileSchema = z
  .strictObject({
    trackOffsetsMm: z
      .array(wholeNumber('track offset from the front edge', 'mm', 0, L.widthMm.max), {
        error: 'List each track’s offset from the front edge, in mm.',
      })
      .max(L.tracksPerEnd, { error: `An end can carry at most ${L.tracksPerEnd} tracks.` }),
    railTopHeightMm: mm('rail-top height', L.railTopHeightMm),
    railTopFrom: z.enum(HEIGHT_REFERENCES, {
      error: 'Say whether the rail-top height is measured from the floor or from the frame.',
    }),
  })
  .refine((e) => e.trackOffsetsMm.every((o, i) => i === 0 || o > e.trackOffsetsMm[i - 1]!), {
    error: 'List the track offsets from the front edge, smallest first, each once.',
    path: ['trackOffsetsMm'],
  });

/** How a buyer can get the board: at least one way. */
export const handlingSchema = z
  .strictObject({
    collection: z.boolean({ error: 'Say whether the buyer may collect (true or false).' }),
    delivery: z
      .strictObject({
        withinKm: wholeNumber('delivery distance', 'km', L.deliveryKm.min, L.deliveryKm.max),
        priceMinor: minorUnits('delivery price', 0, L.priceMinor.max),
      })
      .nullable(),
    courier: z.enum(COURIER_SERVICES, { error: 'Choose parcel or pallet courier, or none.' }).nullable(),
    /** What the buyer pays for the courier; required when a courier is offered. */
    courierPriceMinor: minorUnits('courier price', 0, L.priceMinor.max).nullable().optional(),
  })
  .refine((h) => h.collection || h.delivery !== null || h.courier !== null, {
    error: 'Offer at least one way to get the board: collection, your own delivery, or a courier.',
    path: ['collection'],
  })
  .refine((h) => h.courier === null || typeof h.courierPriceMinor === 'number', {
    error: 'Give the courier price the buyer pays (0 if you include it in the price).',
    path: ['courierPriceMinor'],
  });

/**
 * A second-hand baseboard module. Sizes and weight are of one board (the largest, when the module has several):
 * what two people lift and a courier measures.
 */
export const moduleListingSchema = z
  .strictObject({
    kind: z.literal('module'),
    title: titleField,
    description: descriptionField,
    scaleId: z.enum(SCALE_IDS, { error: 'Choose the scale and gauge from the list.' }),
    lengthMm: mm('length', L.lengthMm),
    widthMm: mm('width', L.widthMm),
    heightMm: mm('height', L.heightMm),
    boardCount: wholeNumber('number of boards', 'boards', L.boardCount.min, L.boardCount.max),
    joinMethod: z.enum(JOIN_METHODS, { error: 'Choose how the boards join.' }),
    levels: levelsSchema,
    construction: constructionSchema,
    wiring: wiringSchema,
    endProfiles: z.strictObject(
      { a: endProfileSchema, b: endProfileSchema },
      { error: 'Describe both ends, A and B.' },
    ),
    finish: z.enum(FINISHES, { error: 'Choose how far the module is finished.' }),
    condition: z.enum(CONDITIONS, { error: 'Choose the condition.' }),
    conditionNotes: plainTextField('condition notes', 0, L.notesMax).default(''),
    priceMinor: minorUnits('price', L.priceMinor.min, L.priceMinor.max),
    currency: currencyField,
    townId: townIdField,
    position: positionField.optional(),
    handling: handlingSchema,
    weightKg: z
      .number({ error: 'Give the weight of the heaviest board in kg.' })
      .min(L.weightKg.min, { error: `The weight must be at least ${L.weightKg.min} kg.` })
      .max(L.weightKg.max, { error: `The weight must be at most ${L.weightKg.max} kg.` }),
    /** "estimated" only while the weight is the planner's estimate from the construction above. */
    weightSource: z
      .enum(WEIGHT_SOURCES, { error: 'Say whether you weighed the board (entered) or took the estimate (estimated).' })
      .default('entered'),
  })
  .superRefine((m, ctx) => {
    for (const end of ['a', 'b'] as const) {
      if (m.endProfiles[end].trackOffsetsMm.some((o) => o > m.widthMm))
        ctx.addIssue({
          code: 'custom',
          path: ['endProfiles', end, 'trackOffsetsMm'],
          message: `A track offset cannot be more than the board’s width (${m.widthMm} mm).`,
        });
    }
    if (m.condition !== 'as-new' && m.conditionNotes.length < 10)
      ctx.addIssue({
        code: 'custom',
        path: ['conditionNotes'],
        message: 'Say in a sentence what a buyer should know about its condition (at least 10 characters).',
      });
    if (m.weightSource === 'estimated') checkEstimatedWeight(m, ctx);
  });

/** An "estimated" weight must be the estimate from the construction as listed, so the listing page tells the truth. */
function checkEstimatedWeight(
  m: Parameters<typeof estimateModuleWeight>[0] & { weightKg: number },
  ctx: z.core.$RefinementCtx,
): void {
  const estimate = estimateModuleWeight(m);
  if (!estimate.ok) {
    ctx.addIssue({ code: 'custom', path: ['weightKg'], message: `${estimate.reason} Type the weight you measured.` });
    return;
  }
  const kg = estimateToKg(estimate.boardG);
  if (Math.abs(kg - m.weightKg) > 1e-9)
    ctx.addIssue({
      code: 'custom',
      path: ['weightKg'],
      message:
        `The construction as described now comes to an estimated ${kg} kg, not ${m.weightKg} kg: ` +
        'take the estimate again, or type the weight you measured.',
    });
}
export type ModuleListingInput = z.infer<typeof moduleListingSchema>;
export type EndProfile = z.infer<typeof endProfileSchema>;
