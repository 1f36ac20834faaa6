import { computed, shallowRef, watch } from 'vue';
import { useRoute, useRouter, type LocationQuery } from 'vue-router';
import type { z } from 'zod';
import type { Page } from '@shared/types/user';
import { useAsync } from './useAsync';

/** The query every paged list shares. */
export interface PagedQuery {
  page: number;
  pageSize: number;
}

/** Keep only the named keys that hold a single string. */
function pickQuery(query: LocationQuery, keys: readonly string[]): Record<string, string> {
  const picked: Record<string, string> = {};
  for (const key of keys) {
    const value = query[key];
    if (typeof value === 'string' && value !== '') picked[key] = value;
  }
  return picked;
}

/**
 * A paged, filterable list whose whole query lives in the address bar, so it survives reloads
 * and can be shared. The query is read with the same zod schema the server uses; changing it
 * replaces the URL, which loads the matching page.
 */
export function usePagedList<Q extends PagedQuery, T>(
  schema: z.ZodType<Q, unknown>,
  keys: readonly (keyof Q & string)[],
  fetchPage: (query: Q) => Promise<Page<T>>,
) {
  const route = useRoute();
  const router = useRouter();
  const routeName = route.name;
  const { run, loading, error } = useAsync(fetchPage);
  const page = shallowRef<Page<T> | null>(null);

  const query = computed<Q>(() => {
    const parsed = schema.safeParse(pickQuery(route.query, keys));
    return parsed.success ? parsed.data : schema.parse({});
  });

  async function load(): Promise<void> {
    const result = await run(query.value);
    if (result) page.value = result;
  }

  watch(
    () => (route.name === routeName ? JSON.stringify(query.value) : null),
    (now) => {
      if (now !== null) void load();
    },
    { immediate: true },
  );

  /** Change part of the query; any change other than the page goes back to page 1. */
  function update(changes: Partial<Q>): void {
    const next: Record<string, string | undefined> = { ...pickQuery(route.query, keys) };
    for (const [key, value] of Object.entries(changes)) {
      next[key] = value === undefined || value === null || value === '' ? undefined : String(value);
    }
    if (!('page' in changes)) next.page = undefined;
    if (next.page === '1') next.page = undefined;
    void router.replace({ query: next });
  }

  /** Swap one item for its updated version (after a change on the server). */
  function replaceItem(matches: (item: T) => boolean, updated: T): void {
    if (!page.value) return;
    page.value = { ...page.value, items: page.value.items.map((item) => (matches(item) ? updated : item)) };
  }

  return { query, page, loading, error, update, reload: load, replaceItem };
}
