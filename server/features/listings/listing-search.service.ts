import type { AppContext } from '../../app-context';
import type { ListingSearchQuery } from '../../../shared/schemas/listings';
import type { ListingSearchResult } from '../../../shared/types/listings';
import { validationFailed } from '../../http/errors';
import { photosByListing } from '../photos/listing-photos.repository';
import { gazetteer } from '../towns/gazetteer';
import { presentSearchItem } from './listing.presenter';
import { listingsInOrder } from './listing.repository';
import { buildSearchSql } from './search-sql';
import { splitSearchText } from './search-text';

interface IdRow {
  id: number | string;
  distance_km: number | string | null;
}

/**
 * Public search over listed listings. Sorted by relevance when words are given, else newest first, unless the
 * query asks otherwise.
 */
export async function searchListings(ctx: AppContext, query: ListingSearchQuery): Promise<ListingSearchResult> {
  const towns = await gazetteer();
  const centre = query.town === undefined ? null : (towns.find(query.town) ?? null);
  if (query.town !== undefined && !centre) throw validationFailed({ town: 'Choose a town from the list.' });
  const text = splitSearchText(query.q);
  const sort = query.sort ?? (text ? 'relevance' : 'newest');
  const plan = buildSearchSql(query, text, centre, sort);
  const m = ctx.dataSource.manager;
  const [rows, counted] = (await Promise.all([
    m.query(plan.sql, plan.params),
    m.query(plan.countSql, plan.countParams),
  ])) as [IdRow[], { total: number | string }[]];
  const listings = await listingsInOrder(
    m,
    rows.map((r) => Number(r.id)),
  );
  const photos = await photosByListing(
    m,
    listings.map((l) => l.id),
  );
  const distances = new Map(
    rows.map((r) => [Number(r.id), r.distance_km === null ? undefined : Number(r.distance_km)]),
  );
  return {
    items: listings.map((l) => presentSearchItem(l, towns, photos.get(l.id) ?? [], distances.get(l.id))),
    total: Number(counted[0]?.total ?? 0),
    page: query.page,
    pageSize: query.pageSize,
    sort,
  };
}
