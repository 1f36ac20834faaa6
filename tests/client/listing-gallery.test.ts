import { mount } from '@vue/test-utils';
import { afterEach, describe, expect, it } from 'vitest';
import ListingGallery from '@/components/listings/ListingGallery.vue';
import { buildPhoto } from './support/listings';

function mountGallery(count = 3) {
  const photos = Array.from({ length: count }, (_, i) => buildPhoto(i + 1, i + 1));
  return mount(ListingGallery, { props: { photos, title: 'OO through station' }, attachTo: document.body });
}

const position = (wrapper: ReturnType<typeof mountGallery>) => wrapper.find('.listing-gallery__position').text();

describe('the photo gallery', () => {
  afterEach(() => {
    document.body.innerHTML = '';
  });

  it('moves between photos with the arrow keys, Home and End, wrapping at the ends', async () => {
    const wrapper = mountGallery();
    const stage = wrapper.find('.listing-gallery__stage');

    await stage.trigger('keydown', { key: 'ArrowRight' });
    expect(position(wrapper)).toBe('Photo 2 of 3');
    await stage.trigger('keydown', { key: 'End' });
    expect(position(wrapper)).toBe('Photo 3 of 3');
    await stage.trigger('keydown', { key: 'ArrowRight' });
    expect(position(wrapper)).toBe('Photo 1 of 3');
    await stage.trigger('keydown', { key: 'ArrowLeft' });
    expect(position(wrapper)).toBe('Photo 3 of 3');
  });

  it('shows the chosen thumbnail as current, with its size given so the page does not shift', async () => {
    const wrapper = mountGallery();

    const thumbs = wrapper.findAll('.listing-gallery__thumb');
    await thumbs[1]!.trigger('click');

    expect(thumbs.map((t) => t.attributes('aria-current'))).toEqual([undefined, 'true', undefined]);
    expect(wrapper.find('.listing-gallery__main').attributes()).toMatchObject({
      src: '/api/photos/key2/display.jpg',
      width: '1600',
      height: '1200',
    });
    // a 1600 × 1200 display photo has a 320 × 240 thumbnail (both fitted from the same original)
    expect(thumbs[1]!.find('img').attributes()).toMatchObject({ width: '320', height: '240' });
  });

  it('draws a placeholder when the seller has added no photos', () => {
    const wrapper = mountGallery(0);

    expect(wrapper.find('svg[role="img"]').attributes('aria-label')).toBe('The seller has not added photos yet');
  });
});
