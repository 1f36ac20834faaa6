import type { Pool, RowDataPacket } from 'mysql2/promise';
import { searchListings } from '../../server/features/listings/listing-search.service';
import { getListing } from '../../server/features/listings/listings.service';
import { gazetteer } from '../../server/features/towns/gazetteer';
import { listingSearchSchema } from '../../shared/schemas/listings';
import type { HttpLoad, Statement, StatementPlan } from './load';
import type { sqlRecorder } from './sql-capture';

/** One API workload: the requests autocannon sends in turn, and the SQL each one runs (the baseline). */
export interface ApiScenario {
  name: string;
  what: string;
  requests: HttpLoad['requests'];
  plans: StatementPlan[];
  /** p95 the app must stay under, ms. */
  budgetMs?: number;
}

type Recorder = Awaited<ReturnType<typeof sqlRecorder>>;

/** Search words with a scale and a price range, as a buyer narrows a search; sent in turn. */
const TEXT_SEARCHES = [
  { q: 'station', scale: 'oo', priceMin: '5000', priceMax: '40000' },
  { q: 'fiddle yard', scale: 'n', priceMin: '2000', priceMax: '20000' },
  { q: 'viaduct', scale: 'h0', priceMin: '5000', priceMax: '60000' },
  { q: 'sceniced junction', scale: 'oo', priceMin: '10000', priceMax: '80000' },
  { q: 'harbour', scale: 'oo9', priceMin: '1000', priceMax: '50000' },
  { q: 'dcc terminus', scale: 'tt', priceMin: '3000', priceMax: '30000' },
];
const NEAR_TOWNS = ['Crewe', 'Derby', 'York', 'Leeds', 'Bristol', 'Glasgow', 'Norwich', 'Cork'];
const SEARCH_BUDGET_MS = 100;

/**
 * The statements of one search as the service runs them: the page and, when it does not count in the page, the
 * count together; then the listings and their photos.
 */
function searchPlan(s: Statement[]): StatementPlan {
  const together = s[1]?.sql.startsWith('SELECT COUNT(*)') ? 2 : 1;
  return [s.slice(0, together), ...s.slice(together).map((one) => [one])];
}

async function searches(recorder: Recorder, queries: Record<string, string>[]) {
  const plans: StatementPlan[] = [];
  for (const q of queries)
    plans.push(searchPlan(await recorder.record((ctx) => searchListings(ctx, listingSearchSchema.parse(q)))));
  return { requests: queries.map((q) => ({ path: `/api/listings?${new URLSearchParams(q)}` })), plans };
}

/** The search and listing-page workloads, with the SQL recorded from the services themselves. */
export async function apiScenarios(recorder: Recorder, pool: Pool): Promise<ApiScenario[]> {
  const towns = await gazetteer();
  const near = NEAR_TOWNS.map((name) => ({
    town: String(towns.search(name, 1)[0]!.id),
    withinKm: '50',
    sort: 'distance',
  }));
  const [ids] = await pool.query<RowDataPacket[]>(
    "SELECT id FROM listings WHERE state = 'listed' ORDER BY RAND(42) LIMIT 200",
  );
  const pagePlans: StatementPlan[] = [];
  for (const { id } of ids)
    pagePlans.push((await recorder.record((ctx) => getListing(ctx, null, Number(id)))).map((s) => [s]));
  return [
    {
      name: 'search: words + scale + price',
      what: 'GET /api/listings?q=…&scale=…&priceMin=…&priceMax=…',
      ...(await searches(recorder, TEXT_SEARCHES)),
      budgetMs: SEARCH_BUDGET_MS,
    },
    {
      name: 'search: within 50 km of a town, by distance',
      what: 'GET /api/listings?town=…&withinKm=50&sort=distance',
      ...(await searches(recorder, near)),
      budgetMs: SEARCH_BUDGET_MS,
    },
    {
      name: 'listing page data',
      what: 'GET /api/listings/:id',
      requests: ids.map(({ id }) => ({ path: `/api/listings/${id}` })),
      plans: pagePlans,
    },
  ];
}
