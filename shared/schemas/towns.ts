import { z } from 'zod';

/** GET /api/towns?q= : towns whose name starts with `q`. */
export const townSearchSchema = z.strictObject({
  q: z
    .string({ error: 'Type the start of a town’s name.' })
    .trim()
    .min(1, { error: 'Type the start of a town’s name.' })
    .max(60, { error: 'A town’s name is at most 60 characters.' }),
  country: z.enum(['GB', 'IE'], { error: 'Country must be GB or IE.' }).optional(),
});
export type TownSearchQuery = z.infer<typeof townSearchSchema>;
