import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import { startEarly, takeEarly } from '@/api/early';
import SearchPage from '@/pages/listings/SearchPage.vue';
import { routes } from '@/router/routes';
import { startFirstPageData } from '@/utils/first-page-data';
import { stubApi } from './support/fetch-stub';
import { buildSearchItem } from './support/listings';

const page = { items: [buildSearchItem()], total: 1, page: 1, pageSize: 24, sort: 'newest' };
const listingCalls = (fetchStub: ReturnType<typeof stubApi>) =>
  fetchStub.mock.calls.filter(([url]) => String(url).startsWith('/api/listings'));

describe('data asked for before the page has loaded', () => {
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('is handed over once: a page shown again asks afresh', async () => {
    startEarly('listing 7', () => Promise.resolve('seven'));

    await expect(takeEarly('listing 7')).resolves.toBe('seven');
    expect(takeEarly('listing 7')).toBeUndefined();
  });

  it('is not shown when it was asked for more than 15 seconds ago', () => {
    vi.useFakeTimers();
    startEarly('listing 8', () => Promise.resolve('eight'));
    vi.advanceTimersByTime(15_001);

    expect(takeEarly('listing 8')).toBeUndefined();
  });

  it('is the one request the search page makes when opened on that search', async () => {
    const fetchStub = stubApi({ 'GET /api/listings': { body: page } });
    const router = createRouter({ history: createMemoryHistory(), routes });
    startFirstPageData(router.resolve('/modules?scale=oo,n&sort=price-asc'));
    expect(listingCalls(fetchStub)).toHaveLength(1);

    await router.push('/modules?scale=oo,n&sort=price-asc');
    const wrapper = mount(SearchPage, { global: { plugins: [createPinia(), router] } });
    await flushPromises();

    expect(listingCalls(fetchStub)).toHaveLength(1);
    expect(wrapper.find('.search-result-card').exists()).toBe(true);
  });

  it('is not used for a different search: the page asks for its own', async () => {
    const fetchStub = stubApi({ 'GET /api/listings': { body: page } });
    const router = createRouter({ history: createMemoryHistory(), routes });
    startFirstPageData(router.resolve('/modules?scale=oo'));

    await router.push('/modules?scale=n');
    mount(SearchPage, { global: { plugins: [createPinia(), router] } });
    await flushPromises();

    const asked = listingCalls(fetchStub).map(([url]) =>
      new URL(String(url), 'http://localhost').searchParams.get('scale'),
    );
    expect(asked).toEqual(['oo', 'n']);
  });
});
