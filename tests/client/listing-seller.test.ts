import { flushPromises, mount } from '@vue/test-utils';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import ListingSeller from '@/components/listings/ListingSeller.vue';
import { routes } from '@/router/routes';
import { stubApi } from './support/fetch-stub';
import { buildSearchItem } from './support/listings';

async function mountSeller(items: ReturnType<typeof buildSearchItem>[]) {
  const fetchStub = stubApi({
    'GET /api/listings': { body: { items, total: items.length, page: 1, pageSize: 5, sort: 'newest' } },
  });
  const router = createRouter({ history: createMemoryHistory(), routes });
  const wrapper = mount(ListingSeller, {
    props: { listing: buildSearchItem({ id: 41 }) },
    global: { plugins: [router] },
  });
  await flushPromises();
  return { wrapper, fetchStub };
}

describe('more from this seller', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('asks the search for this seller’s newest listings, and lists them without the one shown', async () => {
    const { wrapper, fetchStub } = await mountSeller([
      buildSearchItem({ id: 52, title: 'N gauge fiddle yard, two boards' }),
      buildSearchItem({ id: 41 }),
      buildSearchItem({ id: 38, title: 'OO engine shed module' }),
    ]);

    const asked = new URL(String(fetchStub.mock.calls[0]?.[0]), 'http://localhost').searchParams;
    expect(Object.fromEntries(asked)).toEqual({ seller: '3', sort: 'newest', pageSize: '5' });
    expect(wrapper.find('h3').text()).toBe('More from Hattie Dowel');
    expect(wrapper.findAll('li a').map((a) => a.text())).toEqual([
      'N gauge fiddle yard, two boards',
      'OO engine shed module',
    ]);
  });

  it('shows no list when the seller has nothing else listed', async () => {
    const { wrapper } = await mountSeller([buildSearchItem({ id: 41 })]);

    expect(wrapper.find('h3').exists()).toBe(false);
  });
});
