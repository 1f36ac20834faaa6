import type { z } from 'zod';
import { checkPlanInput } from './schema/checks';
import { planInputObjectSchema } from './schema/object';
import { resolvePlanInput } from './schema/resolve';

/**
 * Everything a baseboard plan needs, as JSON. Every length is a number of millimetres (the form converts feet and
 * inches with the engineering units module); lengths of boards, walls and openings are rounded to whole millimetres.
 * Every field has a default except the boards themselves, so `{ boards: [{ lengthMm: 1200, widthMm: 600 }] }` is a
 * whole input. Parsing checks each field, then the fields against each other (a board too big for a sheet, an opening
 * off its wall), then fills in the defaults that depend on other fields.
 */
export const planInputSchema = planInputObjectSchema.superRefine(checkPlanInput).transform(resolvePlanInput);

/** A plan input as written: every defaulted field may be left out. */
export type PlanInput = z.input<typeof planInputSchema>;

/** A plan input once parsed: every default filled in, sections resolved to their sizes. */
export type ParsedPlanInput = z.output<typeof planInputSchema>;

export {
  constructionSchema,
  legsSchema,
  loadsSchema,
  sectionChoiceSchema,
  wallBattensSchema,
} from './schema/construction';
export { labourSchema, priceSchema, pricingSchema, scheduleSchema, supplierSchema } from './schema/costing';
export {
  explicitBoardSchema,
  kickboardsSchema,
  lowerShelfSchema,
  openingSchema,
  roomSchema,
  secondLevelSchema,
  wallSchema,
} from './schema/layout';
export { planInputObjectSchema } from './schema/object';
export type { ResolvedSection } from './schema/sections';
export { conductorSchema, wiringSchema } from './schema/wiring';
