import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import ShortlistToggle from '@/components/shortlist/ShortlistToggle.vue';
import { routes } from '@/router/routes';
import { queryOfSavedSearch } from '@/utils/listings/saved-search-link';
import { stubApi } from './support/fetch-stub';
import { buildSearchItem } from './support/listings';

async function mountToggle(listingId: number, keptIds: number[], answers: Parameters<typeof stubApi>[0] = {}) {
  const items = keptIds.map((id) => ({ listing: buildSearchItem({ id }), addedAt: '2026-11-30T10:00:00.000Z' }));
  const fetchStub = stubApi({ 'GET /api/shortlist': { body: { items } }, ...answers });
  const router = createRouter({ history: createMemoryHistory(), routes });
  const wrapper = mount(ShortlistToggle, {
    props: { listingId },
    global: { plugins: [createPinia(), router] },
    attachTo: document.body,
  });
  await flushPromises();
  const button = () => wrapper.find('button');
  const calls = () =>
    fetchStub.mock.calls.map(
      ([url, init]) => `${init?.method ?? 'GET'} ${new URL(String(url), 'http://localhost').pathname}`,
    );
  return { wrapper, button, calls };
}

describe('the shortlist toggle', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('starts unpressed for a listing not kept, and keeps it when pressed', async () => {
    const { button, calls } = await mountToggle(7, [3], { 'PUT /api/shortlist/7': { status: 204 } });

    expect(button().text()).toContain('Keep on my shortlist');
    expect(button().attributes('aria-pressed')).toBe('false');
    await button().trigger('click');
    await flushPromises();

    expect(calls()).toContain('PUT /api/shortlist/7');
    expect(button().attributes('aria-pressed')).toBe('true');
  });

  it('starts pressed for a kept listing, and takes it off when pressed again', async () => {
    const { button, calls } = await mountToggle(7, [7], { 'DELETE /api/shortlist/7': { status: 204 } });

    expect(button().attributes('aria-pressed')).toBe('true');
    await button().trigger('click');
    await flushPromises();

    expect(calls()).toContain('DELETE /api/shortlist/7');
    expect(button().attributes('aria-pressed')).toBe('false');
  });

  it('stays as it was and says why when the API refuses', async () => {
    const { wrapper, button } = await mountToggle(9, [], {
      'PUT /api/shortlist/9': {
        status: 404,
        body: { error: { code: 'not_found', message: 'That listing was not found.' } },
      },
    });

    await button().trigger('click');
    await flushPromises();

    expect(button().attributes('aria-pressed')).toBe('false');
    expect(wrapper.text()).toContain('That listing was not found.');
  });
});

describe('the link of a saved search', () => {
  it('gives the search page the same filters, lists comma-joined', () => {
    expect(
      queryOfSavedSearch({ q: 'fiddle yard', scale: ['oo', 'h0'], priceMax: 20000, currency: 'GBP', joinTolerance: 5 }),
    ).toEqual({
      q: 'fiddle yard',
      scale: 'oo,h0',
      priceMax: '20000',
    });
  });
});
