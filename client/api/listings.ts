import type { ListingInput, MyListingsQuery } from '@shared/schemas/listings';
import type { ReportInput } from '@shared/schemas/listing-moderation';
import type { ListingSearchResult, ListingView, OwnListingView } from '@shared/types/listings';
import type { Page } from '@shared/types/user';
import { http, request, type QueryParams } from './http';

/** The search as the API takes it: several values of one filter joined by commas (`scale=h0,oo`). */
export type ListingSearchParams = QueryParams;

/** One page of listed modules and services matching the query. */
export function searchListings(query: ListingSearchParams, signal?: AbortSignal): Promise<ListingSearchResult> {
  return http.get<ListingSearchResult>('/api/listings', query, signal);
}

/** One listing; the seller and moderators get the fuller view with dates and the last decision. */
export async function getListing(id: number, signal?: AbortSignal): Promise<ListingView | OwnListingView> {
  const { listing } = await http.get<{ listing: ListingView | OwnListingView }>(`/api/listings/${id}`, {}, signal);
  return listing;
}

/** Whether the answer is the seller's (or a moderator's) view. */
export const isOwnView = (listing: ListingView): listing is OwnListingView => 'lastDecision' in listing;

/** Start a listing: it is saved as a draft only its seller sees. */
export async function createListing(input: ListingInput): Promise<OwnListingView> {
  const { listing } = await http.post<{ listing: OwnListingView }>('/api/listings', input);
  return listing;
}

/** Replace a listing's fields. A listed listing whose title, description or price changes goes back to review. */
export async function updateListing(id: number, input: ListingInput): Promise<OwnListingView> {
  const { listing } = await request<{ listing: OwnListingView }>('PUT', `/api/listings/${id}`, { body: input });
  return listing;
}

/** Ask a moderator to check the listing. */
export async function submitListing(id: number): Promise<OwnListingView> {
  const { listing } = await http.post<{ listing: OwnListingView }>(`/api/listings/${id}/submit`);
  return listing;
}

/** Take the listing off Benchwright. */
export async function withdrawListing(id: number): Promise<OwnListingView> {
  const { listing } = await http.post<{ listing: OwnListingView }>(`/api/listings/${id}/withdraw`);
  return listing;
}

/** The signed-in seller's listings in every state, most recently changed first. */
export function myListings(query: Partial<MyListingsQuery>, signal?: AbortSignal): Promise<Page<OwnListingView>> {
  return http.get<Page<OwnListingView>>('/api/listings/mine', { ...query }, signal);
}

/** Tell the moderators what is wrong with a listing. */
export function reportListing(id: number, input: ReportInput): Promise<{ message: string }> {
  return http.post<{ message: string }>(`/api/listings/${id}/reports`, input);
}

/** Other listed listings by the same seller, newest first: the search's seller filter, less the one being shown. */
export async function otherListingsBy(sellerId: number, exceptId: number, limit = 4): Promise<ListingView[]> {
  const result = await searchListings({ seller: sellerId, sort: 'newest', pageSize: limit + 1 });
  return result.items.filter((l) => l.id !== exceptId).slice(0, limit);
}
