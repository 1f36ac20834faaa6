import { EARTH_MEAN_RADIUS_KM, boundingBox, type LatLon } from '../../../shared/geo';
import type { HandlingOption } from '../../../shared/listings/vocabulary';
import type { ListingSearchQuery, ListingSort } from '../../../shared/schemas/listings';
import { scaleIdsOnGauges } from '../../../shared/scales';
import { wholeWordPattern, type SearchText } from './search-text';

/**
 * The search's SQL. Every value the caller sent travels as a `?` parameter; the SQL text is assembled only from the
 * fixed fragments below, chosen by validated enum values, so no input can change its shape.
 */

const MATCH = 'MATCH(l.title, l.description) AGAINST (? IN NATURAL LANGUAGE MODE)';

/** Haversine distance in km from (?, ?): the same formula and radius as shared/geo.ts. */
const DISTANCE =
  '(2 * ? * ASIN(LEAST(1, SQRT(POWER(SIN(RADIANS(l.latitude - ?) / 2), 2) + ' +
  'COS(RADIANS(?)) * COS(RADIANS(l.latitude)) * POWER(SIN(RADIANS(l.longitude - ?) / 2), 2)))))';
const distanceParams = (c: LatLon) => [EARTH_MEAN_RADIUS_KM, c.lat, c.lat, c.lon];

const HANDLING_SQL: Record<HandlingOption, string> = {
  collection: 'l.offers_collection = 1',
  delivery: 'l.delivery_km IS NOT NULL',
  parcel: "l.courier = 'parcel'",
  pallet: "l.courier = 'pallet'",
};

/** Ties broken by id, so pages never overlap. NULL prices (services) sort last either way. */
const ORDER_BY: Record<ListingSort, string> = {
  relevance: 'score DESC, l.published_at DESC, l.id DESC',
  newest: 'l.published_at DESC, l.id DESC',
  'price-asc': 'l.price_minor IS NULL, l.price_minor ASC, l.id DESC',
  'price-desc': 'l.price_minor IS NULL, l.price_minor DESC, l.id DESC',
  distance: 'distance_km ASC, l.id DESC',
};

class Conditions {
  readonly sql: string[] = [];
  readonly params: unknown[] = [];
  add(fragment: string, ...params: unknown[]): void {
    this.sql.push(fragment);
    this.params.push(...params);
  }
  /** `column IN (?, …)` for a non-empty list. */
  in(column: string, values: readonly unknown[] | undefined): void {
    if (values?.length) this.add(`${column} IN (${values.map(() => '?').join(', ')})`, ...values);
  }
}

/** An end whose tracks match the buyer's profile: same count, each offset within the tolerance. */
function joinsProfile(c: Conditions, offsets: readonly number[], tolerance: number): void {
  const ends = (['a', 'b'] as const).map((end) => {
    const path = `$.${end}.trackOffsetsMm`;
    const checks = offsets.map(() => 'ABS(JSON_EXTRACT(l.end_profiles, ?) - ?) <= ?');
    const params = [path, offsets.length, ...offsets.flatMap((o, i) => [`${path}[${i}]`, o, tolerance])];
    return { sql: `(JSON_LENGTH(l.end_profiles, ?) = ? AND ${checks.join(' AND ')})`, params };
  });
  c.add(`(${ends.map((e) => e.sql).join(' OR ')})`, ...ends.flatMap((e) => e.params));
}

/** Modules within `km` (narrowed first by a lat/lon box on the index); services whose area reaches the town. */
function nearTown(c: Conditions, centre: LatLon, km: number): void {
  const box = boundingBox(centre, km);
  c.add(
    `((l.kind = 'module' AND l.latitude BETWEEN ? AND ? AND l.longitude BETWEEN ? AND ? AND ${DISTANCE} <= ?)` +
      ` OR (l.kind = 'service' AND ${DISTANCE} <= l.service_area_km))`,
    box.minLat,
    box.maxLat,
    box.minLon,
    box.maxLon,
    ...distanceParams(centre),
    km,
    ...distanceParams(centre),
  );
}

function filters(
  q: ListingSearchQuery,
  text: SearchText | null,
  centre: LatLon | null,
  onlyListingId: number | undefined,
): Conditions {
  const c = new Conditions();
  if (onlyListingId !== undefined) c.add('l.id = ?', onlyListingId);
  c.add("l.state = 'listed'");
  // With the state, this reads one seller's listed listings straight from ix_listings_owner_state.
  if (q.seller !== undefined) c.add('l.owner_id = ?', q.seller);
  c.add('u.suspended_at IS NULL');
  if (text?.fulltext) c.add(MATCH, text.fulltext);
  for (const word of text?.shortWords ?? []) {
    const pattern = wholeWordPattern(word);
    c.add('(l.title REGEXP ? OR l.description REGEXP ?)', pattern, pattern);
  }
  if (q.kind) c.add('l.kind = ?', q.kind);
  c.in('l.scale_id', q.scale);
  if (q.gauge?.length) c.in('l.scale_id', scaleIdsOnGauges(q.gauge));
  c.in('l.finish', q.finish);
  if (q.lengthMin !== undefined) c.add('l.length_mm >= ?', q.lengthMin);
  if (q.lengthMax !== undefined) c.add('l.length_mm <= ?', q.lengthMax);
  if (q.widthMin !== undefined) c.add('l.width_mm >= ?', q.widthMin);
  if (q.widthMax !== undefined) c.add('l.width_mm <= ?', q.widthMax);
  if (q.priceMin !== undefined || q.priceMax !== undefined) c.add('l.currency = ?', q.currency);
  if (q.priceMin !== undefined) c.add('l.price_minor >= ?', q.priceMin);
  if (q.priceMax !== undefined) c.add('l.price_minor <= ?', q.priceMax);
  if (q.handling?.length) c.add(`(${q.handling.map((h) => HANDLING_SQL[h]).join(' OR ')})`);
  c.in('l.control', q.control);
  if (centre && q.withinKm !== undefined) nearTown(c, centre, q.withinKm);
  if (q.joinOffsets?.length) joinsProfile(c, q.joinOffsets, q.joinTolerance);
  return c;
}

export interface SearchSql {
  sql: string;
  params: unknown[];
  /** The page carries the count of every match in its `total` column; the count query is needed only past the end. */
  countInPage: boolean;
  countSql: string;
  countParams: unknown[];
}

/** Sorts that score every match anyway (by relevance or distance): the page may as well count them as it goes. */
const SCORES_EVERY_MATCH: readonly ListingSort[] = ['relevance', 'distance'];

/**
 * One page of matching ids (with score and distance), and the count of every match. The page joins listings first
 * (STRAIGHT_JOIN), so "newest" and "price" can read the listings in index order and stop after a page; the
 * optimizer would otherwise start from the users and sort every listing. The count keeps the optimizer's order.
 * `onlyListingId` narrows the search to one listing, so a saved search can ask whether a new listing matches it.
 */
export function buildSearchSql(
  q: ListingSearchQuery,
  text: SearchText | null,
  centre: LatLon | null,
  sort: ListingSort,
  onlyListingId?: number,
): SearchSql {
  const where = filters(q, text, centre, onlyListingId);
  const on = `users u ON u.id = l.owner_id WHERE ${where.sql.join(' AND ')}`;
  const score = text?.fulltext ? { sql: MATCH, params: [text.fulltext] } : { sql: 'NULL', params: [] };
  const distance = centre ? { sql: DISTANCE, params: distanceParams(centre) } : { sql: 'NULL', params: [] };
  const countInPage = SCORES_EVERY_MATCH.includes(sort);
  const total = countInPage ? ', COUNT(*) OVER () AS total' : '';
  return {
    sql:
      `SELECT l.id AS id, ${score.sql} AS score, ${distance.sql} AS distance_km${total} ` +
      `FROM listings l STRAIGHT_JOIN ${on} ORDER BY ${ORDER_BY[sort]} LIMIT ? OFFSET ?`,
    params: [...score.params, ...distance.params, ...where.params, q.pageSize, (q.page - 1) * q.pageSize],
    countInPage,
    countSql: `SELECT COUNT(*) AS total FROM listings l INNER JOIN ${on}`,
    countParams: where.params,
  };
}
