import { z } from 'zod';
import { LISTING_STATES } from '../listings/states';
import { moduleListingSchema } from './listing-module';
import { pageField, pageSizeField } from './listing-fields';
import { serviceListingSchema } from './listing-service';

export { moduleListingSchema, type ModuleListingInput, type EndProfile } from './listing-module';
export { serviceListingSchema, rateCardSchema, type ServiceListingInput, type RateCard } from './listing-service';
export { listingSearchSchema, type ListingSearchQuery, type ListingSort } from './listing-search';

/**
 * POST /api/listings and PUT /api/listings/:id: a whole module or service listing, told apart by `kind`. State,
 * seller and dates are the server's to set, so a body naming them is refused.
 */
export const listingInputSchema = z.discriminatedUnion('kind', [moduleListingSchema, serviceListingSchema], {
  error: 'Say what you are listing: kind must be "module" or "service".',
});
export type ListingInput = z.infer<typeof listingInputSchema>;

/** Route parameter `:id` of a listing. */
export const listingIdParamSchema = z.strictObject({
  id: z.coerce
    .number({ error: 'Unknown listing.' })
    .int({ error: 'Unknown listing.' })
    .positive({ error: 'Unknown listing.' })
    .max(4_294_967_295, { error: 'Unknown listing.' }),
});
export type ListingIdParam = z.infer<typeof listingIdParamSchema>;

/** GET /api/listings/mine */
export const myListingsQuerySchema = z.strictObject({
  state: z.enum(LISTING_STATES, { error: 'Choose one of the listing states.' }).optional(),
  page: pageField,
  pageSize: pageSizeField(100, 25),
});
export type MyListingsQuery = z.infer<typeof myListingsQuerySchema>;
