import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import SearchPage from '@/pages/listings/SearchPage.vue';
import { routes } from '@/router/routes';
import { stubApi } from './support/fetch-stub';
import { buildSearchItem } from './support/listings';

async function openSearch(path: string, items = [buildSearchItem()]) {
  const fetchStub = stubApi({
    'GET /api/listings': { body: { items, total: items.length, page: 1, pageSize: 24, sort: 'relevance' } },
  });
  const router = createRouter({ history: createMemoryHistory(), routes });
  await router.push(path);
  const wrapper = mount(SearchPage, { global: { plugins: [createPinia(), router] }, attachTo: document.body });
  await flushPromises();
  return { wrapper, router, fetchStub };
}

const chipLabels = (wrapper: Awaited<ReturnType<typeof openSearch>>['wrapper']) =>
  wrapper.findAll('.search-chips__chip').map((chip) => chip.text());

describe('the search page', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('shows the filters from the address as chips and asks the API for the same search', async () => {
    const { wrapper, fetchStub } = await openSearch('/modules?q=station&scale=oo,h0&finish=topped');

    expect(chipLabels(wrapper)).toEqual(['Scale OO', 'Scale H0', 'Frame and top, ready for track']);
    const asked = new URL(String(fetchStub.mock.calls[0]?.[0]), 'http://localhost').searchParams;
    expect(asked.get('scale')).toBe('oo,h0');
    expect(asked.get('q')).toBe('station');
  });

  it('announces the result count politely', async () => {
    const { wrapper } = await openSearch('/modules?scale=oo');

    const status = wrapper.find('[aria-live="polite"]');
    expect(status.attributes('role')).toBe('status');
    expect(status.text()).toBe('1 result');
  });

  it('removes one value of a filter and keeps the other values, the words and the order', async () => {
    const { wrapper, router } = await openSearch('/modules?q=station&scale=oo,h0&sort=price-asc');

    await wrapper.find('[aria-label="Remove filter: Scale H0"]').trigger('click');
    await flushPromises();

    expect(router.currentRoute.value.query).toEqual({ q: 'station', scale: 'oo', sort: 'price-asc' });
  });

  it('clears every filter in one go, keeping the search words', async () => {
    const { wrapper, router } = await openSearch('/modules?q=station&scale=oo&finish=topped&handling=parcel');

    const clear = wrapper.findAll('button').find((b) => b.text() === 'Clear all filters');
    await clear!.trigger('click');
    await flushPromises();

    expect(router.currentRoute.value.query).toEqual({ q: 'station' });
  });

  it('adds a ticked value to those already chosen, back on the first page', async () => {
    const { wrapper, router } = await openSearch('/modules?scale=oo&page=2');

    const n = wrapper.findAll('.search-choice-filter__option').find((o) => o.text().startsWith('N (1:160'));
    await n!.find('input').setValue(true);
    await flushPromises();

    expect(router.currentRoute.value.query).toEqual({ scale: 'oo,n' });
  });

  it('lists the active filters, each removable, when nothing matches', async () => {
    const { wrapper } = await openSearch('/modules?q=viaduct&scale=z', []);

    const empty = wrapper.find('.search-empty');
    expect(empty.text()).toContain('Search words “viaduct”');
    expect(empty.text()).toContain('Scale Z');
    expect(empty.findAll('button').map((b) => b.text())).toEqual(['Remove the search words', 'Remove Scale Z']);
  });
});
