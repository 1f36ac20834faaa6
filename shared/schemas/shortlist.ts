import { z } from 'zod';

/** Route parameter `:listingId` of PUT and DELETE /api/shortlist/:listingId. */
export const shortlistParamSchema = z.strictObject({
  listingId: z.coerce
    .number({ error: 'Unknown listing.' })
    .int({ error: 'Unknown listing.' })
    .positive({ error: 'Unknown listing.' })
    .max(4_294_967_295, { error: 'Unknown listing.' }),
});
export type ShortlistParam = z.infer<typeof shortlistParamSchema>;
