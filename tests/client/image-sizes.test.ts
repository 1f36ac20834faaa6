import { mount, type VueWrapper } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import ListingGallery from '@/components/listings/ListingGallery.vue';
import SearchResults from '@/components/search/SearchResults.vue';
import { routes } from '@/router/routes';
import { buildPhoto, buildSearchItem } from './support/listings';

/**
 * Every photo on the search and listing pages states its size, so the browser keeps its box before the file
 * arrives and nothing below it moves (web.dev "Optimize Cumulative Layout Shift": images carry width and height).
 */
function expectSized(wrapper: VueWrapper): void {
  const images = wrapper.findAll('img');
  expect(images.length).toBeGreaterThan(0);
  for (const img of images) {
    const { width, height } = img.attributes();
    expect(Number(width), `width of ${img.attributes('src')}`).toBeGreaterThan(0);
    expect(Number(height), `height of ${img.attributes('src')}`).toBeGreaterThan(0);
  }
}

function mountResults(count: number) {
  const items = Array.from({ length: count }, (_, i) =>
    buildSearchItem({
      id: 100 + i,
      photos: [buildPhoto(i + 1, 1)],
      coverThumbUrl: `/api/photos/key${i + 1}/thumb.jpg`,
    }),
  );
  const router = createRouter({ history: createMemoryHistory(), routes });
  return mount(SearchResults, { props: { items, busy: false }, global: { plugins: [createPinia(), router] } });
}

describe('photos on the search and listing pages', () => {
  afterEach(() => {
    document.body.innerHTML = '';
  });

  it('give every result card photo its size; only the first is fetched at once and first', () => {
    const wrapper = mountResults(3);

    expectSized(wrapper);
    const images = wrapper.findAll('img');
    // A 1600 × 1200 display photo has a 320 × 240 thumbnail (both fitted inside squares of 1600 and 320 px).
    expect(images[0]!.attributes()).toMatchObject({ width: '320', height: '240' });
    expect(images.map((img) => img.attributes('loading'))).toEqual(['eager', 'lazy', 'lazy']);
    expect(images.map((img) => img.attributes('fetchpriority'))).toEqual(['high', 'auto', 'auto']);
  });

  it('give the gallery photo and its thumbnails their sizes, the large photo fetched first and never lazily', () => {
    const photos = [1, 2, 3].map((i) => buildPhoto(i, i));
    const wrapper = mount(ListingGallery, { props: { photos, title: 'OO fiddle yard' } });

    expectSized(wrapper);
    const main = wrapper.find('.listing-gallery__main');
    expect(main.attributes('loading')).toBeUndefined();
    expect(main.attributes('fetchpriority')).toBe('high');
    expect(main.attributes('srcset')).toBe('/api/photos/key1/thumb.jpg 320w, /api/photos/key1/display.jpg 1600w');
  });
});
