import { z } from 'zod';
import { deliveryAddressField } from './checkout';
import { minorUnits, plainTextField, wholeNumber } from './listing-fields';

/** Limits on quote requests and quotes, stated in the forms and enforced here. */
export const QUOTE_LIMITS = {
  buildersPerRequest: 5,
  notesMax: 2000,
  linesMax: 30,
  lineLabelMax: 120,
  noteMax: 1000,
  validDays: { min: 7, max: 90 },
  leadTimeWeeks: { min: 1, max: 104 },
  /** A builder's deposit, percent of the order total. */
  depositPercent: { min: 10, max: 50 },
  stageNoteMax: 500,
  amountMaxMinor: 10_000_000,
} as const;
const Q = QUOTE_LIMITS;

const recordId = (what: string) =>
  z.coerce
    .number({ error: `Unknown ${what}.` })
    .int({ error: `Unknown ${what}.` })
    .positive({ error: `Unknown ${what}.` })
    .max(4_294_967_295, { error: `Unknown ${what}.` });

/** Route parameter `:id`, for a quote request, a quote or a build order. */
export const quoteRequestParamSchema = z.strictObject({ id: recordId('quote request') });
export const quoteParamSchema = z.strictObject({ id: recordId('quote') });
export const buildOrderParamSchema = z.strictObject({ id: recordId('order') });

/** GET /api/quotes/builders: builders whose service area reaches the buyer's town. */
export const builderChoiceQuerySchema = z.strictObject({ town: recordId('town') });
export type BuilderChoiceQuery = z.infer<typeof builderChoiceQuerySchema>;

/** A day as YYYY-MM-DD. */
const isoDay = (what: string) => z.iso.date({ error: `Give the ${what} as a date, e.g. 2027-03-01.` });

/** POST /api/quotes/requests: ask builders to price a saved plan. */
export const createQuoteRequestSchema = z.strictObject({
  planId: z.number({ error: 'Choose one of your saved plans.' }).int().positive({ error: 'Choose a saved plan.' }),
  townId: z
    .number({ error: 'Choose the town the boards are for from the list.' })
    .int({ error: 'Choose the town the boards are for from the list.' })
    .positive({ error: 'Choose the town the boards are for from the list.' }),
  listingIds: z
    .array(z.number().int().positive(), { error: 'Choose the builders to ask.' })
    .min(1, { error: 'Choose at least one builder to ask.' })
    .max(Q.buildersPerRequest, { error: `Ask at most ${Q.buildersPerRequest} builders at once.` })
    .refine((ids) => new Set(ids).size === ids.length, { error: 'Choose each builder once.' }),
  notes: plainTextField('notes for the builders', 0, Q.notesMax).default(''),
  neededBy: isoDay('date you need the boards by').nullable().default(null),
});
export type CreateQuoteRequestInput = z.infer<typeof createQuoteRequestSchema>;

/** One line of a quote as the builder sends it; quantities and rates are filled in from the draft by the server. */
export const quoteLineInputSchema = z.strictObject({
  key: z
    .string({ error: 'Each line needs its key.' })
    .regex(/^[a-z:-]{1,40}$/, { error: 'Each line needs its key (letters, colons and dashes).' }),
  label: plainTextField('line description', 2, Q.lineLabelMax),
  amountMinor: minorUnits('line amount', 0, Q.amountMaxMinor),
});
export type QuoteLineInput = z.infer<typeof quoteLineInputSchema>;

/** POST /api/quotes/inbox/:id/quote: the builder's quote. A note is needed when it differs from the rate card. */
export const sendQuoteSchema = z.strictObject({
  lines: z
    .array(quoteLineInputSchema, { error: 'List the lines of the quote.' })
    .min(1, { error: 'A quote needs at least one line.' })
    .max(Q.linesMax, { error: `A quote can have at most ${Q.linesMax} lines.` }),
  deliveryMinor: minorUnits('delivery charge', 0, Q.amountMaxMinor),
  leadTimeWeeks: wholeNumber('lead time', 'weeks', Q.leadTimeWeeks.min, Q.leadTimeWeeks.max),
  validDays: wholeNumber('time the quote stands', 'days', Q.validDays.min, Q.validDays.max),
  note: plainTextField('note to the buyer', 0, Q.noteMax).default(''),
});
export type SendQuoteInput = z.infer<typeof sendQuoteSchema>;

/** Hand-over of the finished boards: collected from the builder, or delivered by them. */
export const BUILD_HANDOVERS = ['collection', 'seller_delivery'] as const;
export type BuildHandover = (typeof BUILD_HANDOVERS)[number];

/** POST /api/quotes/:id/accept: the buyer accepts one quote; the address is needed for delivery. */
export const acceptQuoteSchema = z
  .strictObject({
    handover: z.enum(BUILD_HANDOVERS, { error: 'Choose how the finished boards reach you.' }),
    deliveryAddress: deliveryAddressField.nullable().optional(),
  })
  .superRefine((o, ctx) => {
    if (o.handover === 'seller_delivery' && !o.deliveryAddress)
      ctx.addIssue({
        code: 'custom',
        path: ['deliveryAddress'],
        message: 'Give the address the boards should go to: name, street, town and postcode.',
      });
  });
export type AcceptQuoteInput = z.infer<typeof acceptQuoteSchema>;

/** PUT /api/quotes/settings: the deposit a builder asks when a quote is accepted. */
export const quoteSettingsSchema = z.strictObject({
  depositPercent: wholeNumber('deposit', 'per cent', Q.depositPercent.min, Q.depositPercent.max),
});
export type QuoteSettingsInput = z.infer<typeof quoteSettingsSchema>;

/** Stages a builder records on a build order; "ready" asks the buyer for the balance. */
export const BUILD_STAGES = ['materials_bought', 'frames_built', 'ready'] as const;
export type BuildStage = (typeof BUILD_STAGES)[number];
export const BUILD_STAGE_LABELS: Record<BuildStage, string> = {
  materials_bought: 'Materials bought',
  frames_built: 'Frames built',
  ready: 'Built and ready',
};

/** POST /api/builds/:id/stages */
export const buildStageSchema = z.strictObject({
  stage: z.enum(BUILD_STAGES, { error: 'Choose the stage the build has reached.' }),
  note: plainTextField('note on this stage', 0, Q.stageNoteMax).default(''),
});
export type BuildStageInput = z.infer<typeof buildStageSchema>;
