import { z } from 'zod';
import { listingSearchSchema, type ListingSearchQuery } from './listing-search';

/** A member keeps at most this many saved searches. */
export const MAX_SAVED_SEARCHES = 20;
export const SAVED_SEARCH_NAME_MAX = 80;

/** What a saved search keeps of a search: the filters, not the page, page size or order. */
export type SavedSearchQuery = Omit<ListingSearchQuery, 'page' | 'pageSize' | 'sort'>;

/** POST /api/saved-searches. `query` is the same query GET /api/listings takes. */
export const savedSearchInputSchema = z.strictObject({
  name: z
    .string({ error: 'Give the search a name.' })
    .trim()
    .min(1, { error: 'Give the search a name.' })
    .max(SAVED_SEARCH_NAME_MAX, { error: `A search name must be at most ${SAVED_SEARCH_NAME_MAX} characters.` }),
  query: listingSearchSchema,
});
export type SavedSearchInput = z.input<typeof savedSearchInputSchema>;
export type SavedSearchParsed = z.infer<typeof savedSearchInputSchema>;

/** Route parameter `:id` of a saved search. */
export const savedSearchIdParamSchema = z.strictObject({
  id: z.coerce
    .number({ error: 'Unknown saved search.' })
    .int({ error: 'Unknown saved search.' })
    .positive({ error: 'Unknown saved search.' })
    .max(4_294_967_295, { error: 'Unknown saved search.' }),
});

/** The filters of a parsed search, with what does not change the matches left out. */
export function filtersOfSearch(query: ListingSearchQuery): SavedSearchQuery {
  const { page: _page, pageSize: _pageSize, sort: _sort, ...filters } = query;
  return Object.fromEntries(Object.entries(filters).filter(([, v]) => v !== undefined)) as SavedSearchQuery;
}
