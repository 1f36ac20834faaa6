/**
 * The orders a search can come back in. Relevance needs search words; distance needs a town. Kept apart from the
 * search schema so the browser can read a search from the address bar without loading the validation library.
 */
export const LISTING_SORTS = ['relevance', 'newest', 'price-asc', 'price-desc', 'distance'] as const;
export type ListingSort = (typeof LISTING_SORTS)[number];
