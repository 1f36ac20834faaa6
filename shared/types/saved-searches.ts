import type { SavedSearchQuery } from '../schemas/saved-searches';
import type { ListingSearchItem } from './listings';

/** A saved search as its member sees it. */
export interface SavedSearchView {
  id: number;
  name: string;
  query: SavedSearchQuery;
  createdAt: string;
  lastNotifiedAt: string | null;
}

/** A listing on the member's shortlist, and when they kept it. */
export interface ShortlistItemView {
  listing: ListingSearchItem;
  addedAt: string;
}
