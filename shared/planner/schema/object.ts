import { z } from 'zod';
import { PLAN_LIMITS } from '../limits';
import { constructionSchema, loadsSchema } from './construction';
import { labourSchema, pricingSchema, scheduleSchema } from './costing';
import { choiceField, strictGroup } from './fields';
import { explicitBoardSchema, kickboardsSchema, lowerShelfSchema, roomSchema, secondLevelSchema } from './layout';
import { wiringSchema } from './wiring';

/** The whole plan input, field by field, before the checks across fields and the defaults that depend on others. */
export const planInputObjectSchema = strictGroup('the plan', {
  units: choiceField('units', ['metric', 'imperial'])
    .default('metric')
    .describe('How lengths are shown; every length in this input is in mm. Imperial also sets 16 in cross members.'),
  boards: z
    .array(explicitBoardSchema, { error: 'List the boards as an array.' })
    .max(PLAN_LIMITS.maxBoards, { error: `Plan at most ${PLAN_LIMITS.maxBoards} boards at a time.` })
    .default([])
    .describe('Boards given by their size, laid end to end in this order and joined to each other.'),
  room: roomSchema.optional().describe('A room with shelves round its walls, split into boards.'),
  secondLevel: secondLevelSchema.optional().describe('A second level over the first, at a height above it.'),
  lowerShelf: lowerShelfSchema.optional().describe('A storage shelf between the legs of every lower board.'),
  kickboards: kickboardsSchema.optional().describe('Kickboards along the front of every lower board on legs.'),
  construction: constructionSchema.prefault({}).describe('How the boards are built and what they are cut from.'),
  joins: choiceField('way boards are joined', ['bolts', 'dowels', 'pattern-makers-dowels', 'clamps'])
    .default('bolts')
    .describe('How neighbouring boards are held together: bolts, dowels, pattern-makers’ dowels or clamps.'),
  wiring: wiringSchema.prefault({}).describe('The wiring under the boards.'),
  loads: loadsSchema.prefault({}).describe('The loads the boards are checked for.'),
  pricing: pricingSchema.optional().describe('Suppliers and their prices; the plan is costed when given.'),
  labour: labourSchema.optional().describe('A builder’s rate card; labour is costed when given.'),
  schedule: scheduleSchema.optional().describe('Dates; the plan is scheduled when given.'),
});

/** The plan input once each field is parsed, before the checks across fields. */
export type PlanInputFields = z.output<typeof planInputObjectSchema>;
