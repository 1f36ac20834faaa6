import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { ListingSearchQuery } from '../../../shared/schemas/listings';
import type { ListingSearchResult } from '../../../shared/types/listings';
import { validationFailed } from '../../http/errors';
import { photosByListing } from '../photos/listing-photos.repository';
import { gazetteer } from '../towns/gazetteer';
import { presentSearchItem } from './listing.presenter';
import { listingsInOrder } from './listing.repository';
import { buildSearchSql, type SearchSql } from './search-sql';
import { splitSearchText } from './search-text';

interface IdRow {
  id: number | string;
  distance_km: number | string | null;
  total?: number | string;
}

type CountRow = { total: number | string };

/** The count the page carried; past the last page the page is empty and carries none, so count apart. */
async function totalFromPage(m: EntityManager, plan: SearchSql, rows: IdRow[]): Promise<number> {
  if (rows.length > 0) return Number(rows[0]!.total ?? 0);
  return Number(((await m.query(plan.countSql, plan.countParams)) as CountRow[])[0]?.total ?? 0);
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
    plan.countInPage ? null : m.query(plan.countSql, plan.countParams),
  ])) as [IdRow[], CountRow[] | null];
  const total = counted ? Number(counted[0]?.total ?? 0) : await totalFromPage(m, plan, rows);
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
    total,
    page: query.page,
    pageSize: query.pageSize,
    sort,
  };
}
