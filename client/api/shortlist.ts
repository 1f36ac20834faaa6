import type { SavedSearchQuery } from '@shared/schemas/saved-searches';
import type { SavedSearchView, ShortlistItemView } from '@shared/types/saved-searches';
import { http, request } from './http';

/** The listings the member keeps on their shortlist that are still shown, most recently kept first. */
export async function listShortlist(signal?: AbortSignal): Promise<ShortlistItemView[]> {
  const { items } = await http.get<{ items: ShortlistItemView[] }>('/api/shortlist', {}, signal);
  return items;
}

/** Keep a listing on the shortlist; keeping it twice changes nothing. */
export function keepOnShortlist(listingId: number): Promise<void> {
  return request<void>('PUT', `/api/shortlist/${listingId}`);
}

/** Take a listing off the shortlist. */
export function dropFromShortlist(listingId: number): Promise<void> {
  return http.delete<void>(`/api/shortlist/${listingId}`);
}

/** The member's saved searches, newest first. */
export async function listSavedSearches(signal?: AbortSignal): Promise<SavedSearchView[]> {
  const { items } = await http.get<{ items: SavedSearchView[] }>('/api/saved-searches', {}, signal);
  return items;
}

/** Keep a search under a name; the member is e-mailed when a newly listed listing matches it. */
export async function saveSearch(name: string, query: Record<string, unknown>): Promise<SavedSearchView> {
  const { search } = await http.post<{ search: SavedSearchView }>('/api/saved-searches', { name, query });
  return search;
}

export function deleteSavedSearch(id: number): Promise<void> {
  return http.delete<void>(`/api/saved-searches/${id}`);
}

export type { SavedSearchQuery };
