import { computed, shallowRef, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import type { ListingSearchResult } from '@shared/types/listings';
import { earlyOrSearchListings } from '@/api/early';
import { withoutAllFilters, withoutChip } from '@/utils/listings/search-chips';
import {
  apiQueryFromFilters,
  filtersFromQuery,
  queryFromFilters,
  type SearchFilters,
} from '@/utils/listings/search-filters';
import { useAsync } from './useAsync';

/**
 * The module search, held in the address bar: reading the query gives the filters, changing a filter replaces
 * the query (no new history entry, no jump to the top) and that loads the matching page of results.
 */
export function useListingSearch() {
  const route = useRoute();
  const router = useRouter();
  const routeName = route.name;
  const { run, loading, error } = useAsync(earlyOrSearchListings);
  const result = shallowRef<ListingSearchResult | null>(null);

  const filters = computed(() => filtersFromQuery(route.query));

  watch(
    () => (route.name === routeName ? JSON.stringify(apiQueryFromFilters(filters.value)) : null),
    async (now) => {
      if (now === null) return;
      const found = await run(apiQueryFromFilters(filters.value));
      if (found) result.value = found;
    },
    { immediate: true },
  );

  /** Show this search. */
  function apply(next: SearchFilters): Promise<unknown> {
    return router.replace({ query: queryFromFilters(next) });
  }

  /** Change some filters; anything but the page goes back to page 1. */
  function change(changes: Partial<SearchFilters>): Promise<unknown> {
    return apply({ ...filters.value, page: 1, ...changes });
  }

  return {
    filters,
    result,
    loading,
    error,
    apply,
    change,
    removeChip: (chipId: string) => apply(withoutChip(filters.value, chipId)),
    clearAll: () => apply(withoutAllFilters(filters.value)),
  };
}
