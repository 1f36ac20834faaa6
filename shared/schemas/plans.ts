import { z } from 'zod';
import { planInputSchema } from '../planner/schema';

const nameField = z
  .string({ error: 'Give the plan a name.' })
  .trim()
  .min(1, { error: 'Give the plan a name.' })
  .max(120, { error: 'Plan name must be at most 120 characters.' });

/** POST /api/plans */
export const savePlanSchema = z.strictObject({ name: nameField, input: planInputSchema });
export type SavePlanInput = z.input<typeof savePlanSchema>;

/** PUT /api/plans/:id */
export const updatePlanSchema = savePlanSchema;

/** POST /api/plans/:id/share */
export const sharePlanSchema = z.strictObject({
  shared: z.boolean({ error: 'Say whether the plan is shared (true or false).' }),
});
export type SharePlanInput = z.infer<typeof sharePlanSchema>;

/** Route parameter `:id` of a saved plan. */
export const planIdParamSchema = z.strictObject({
  id: z.coerce.number({ error: 'Unknown plan.' }).int({ error: 'Unknown plan.' }).positive({ error: 'Unknown plan.' }),
});

/** Route parameter `:token` of a shared plan. */
export const shareTokenParamSchema = z.strictObject({
  token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, { error: 'This share link is not valid.' }),
});
