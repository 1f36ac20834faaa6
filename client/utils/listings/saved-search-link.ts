import type { LocationQuery, LocationQueryRaw } from 'vue-router';
import type { SavedSearchQuery } from '@shared/schemas/saved-searches';
import { queryFromFilters, filtersFromQuery } from './search-filters';

/** The address bar's query for a saved search, read back through the search page's own filters. */
export function queryOfSavedSearch(saved: SavedSearchQuery): LocationQueryRaw {
  const raw: LocationQuery = {};
  for (const [key, value] of Object.entries(saved)) {
    if (value === undefined || value === null) continue;
    raw[key] = Array.isArray(value) ? value.join(',') : String(value);
  }
  return queryFromFilters(filtersFromQuery(raw));
}
