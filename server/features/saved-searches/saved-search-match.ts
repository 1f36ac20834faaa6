import type { EntityManager } from 'typeorm';
import { listingSearchSchema } from '../../../shared/schemas/listing-search';
import type { SavedSearchQuery } from '../../../shared/schemas/saved-searches';
import { buildSearchSql } from '../listings/search-sql';
import { splitSearchText } from '../listings/search-text';
import type { Gazetteer } from '../towns/gazetteer';

type CountRow = { total: number | string };

/**
 * Whether a listing is among the results of a saved search. It runs the search's own SQL narrowed to that one
 * listing, so a saved search matches exactly what the same search on the site would show.
 */
export async function savedSearchMatches(
  m: EntityManager,
  towns: Gazetteer,
  saved: SavedSearchQuery,
  listingId: number,
): Promise<boolean> {
  const parsed = listingSearchSchema.safeParse(saved);
  if (!parsed.success) return false;
  const query = parsed.data;
  const centre = query.town === undefined ? null : (towns.find(query.town) ?? null);
  if (query.town !== undefined && !centre) return false;
  const plan = buildSearchSql(query, splitSearchText(query.q), centre, 'newest', listingId);
  const rows = (await m.query(plan.countSql, plan.countParams)) as CountRow[];
  return Number(rows[0]?.total ?? 0) > 0;
}
