import { getListing, searchListings, type ListingSearchParams } from './listings';

/**
 * Answers fetched before the page that needs them has loaded its code: the first page's data is asked for while
 * the app's code is still arriving, and the page takes the answer instead of asking again. Each answer is taken
 * once, and only soon after it was asked for, so a page shown later always asks afresh.
 */
const FRESH_MS = 15_000;
const started = new Map<string, { at: number; answer: Promise<unknown> }>();

/** Start a GET now for the page that will want it under `key`. */
export function startEarly(key: string, load: () => Promise<unknown>): void {
  const answer = load();
  // A failure is the page's to report when it takes the answer; nothing is reported before then.
  answer.catch(() => undefined);
  started.set(key, { at: Date.now(), answer });
}

/** The answer started under `key`, once; undefined when none was started or it is too old to show. */
export function takeEarly<T>(key: string): Promise<T> | undefined {
  const found = started.get(key);
  started.delete(key);
  if (!found || Date.now() - found.at > FRESH_MS) return undefined;
  return found.answer as Promise<T>;
}

/** The key of a search for a set of API query parameters. */
export const searchKey = (query: object): string => `search ${JSON.stringify(query)}`;
/** The key of one listing. */
export const listingKey = (id: number): string => `listing ${id}`;

/** One listing: the early answer when the page was opened on it, otherwise asked for now. */
export const earlyOrGetListing = (id: number): ReturnType<typeof getListing> =>
  takeEarly<Awaited<ReturnType<typeof getListing>>>(listingKey(id)) ?? getListing(id);

/** One page of search results: the early answer when the page was opened on this search, otherwise asked now. */
export const earlyOrSearchListings = (query: ListingSearchParams): ReturnType<typeof searchListings> =>
  takeEarly<Awaited<ReturnType<typeof searchListings>>>(searchKey(query)) ?? searchListings(query);
