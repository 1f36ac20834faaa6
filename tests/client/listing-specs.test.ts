import { mount } from '@vue/test-utils';
import { beforeEach, describe, expect, it } from 'vitest';
import ListingSpecs from '@/components/listings/ListingSpecs.vue';
import { LENGTH_UNIT_KEY, reloadLengthUnit } from '@/composables/useLengthUnit';
import { buildModule } from './support/listings';

function row(wrapper: ReturnType<typeof mount>, name: string): string {
  const found = wrapper.findAll('tr').find((tr) => tr.find('th').text() === name);
  return found?.find('td').text() ?? '';
}

function mountSpecs() {
  return mount(ListingSpecs, { props: { module: buildModule() }, attachTo: document.body });
}

describe('the specification table', () => {
  beforeEach(() => {
    localStorage.clear();
    reloadLengthUnit();
    document.body.innerHTML = '';
  });

  it('shows sizes in millimetres by default', () => {
    const wrapper = mountSpecs();

    expect(row(wrapper, 'Size of a board')).toBe('1200 mm long × 450 mm wide');
    expect(row(wrapper, 'Frame')).toBe('44 mm × 18 mm timber, cross members every 400 mm');
  });

  it('switches every length to feet and inches and remembers the choice', async () => {
    const wrapper = mountSpecs();

    await wrapper.find('input[value="ft-in"]').setValue(true);

    // 1200 mm = 47.24 in → 3' 11 1/4"; 450 mm = 17.72 in → 1' 5 11/16" (nearest 1/16 in; 1 in = 25.4 mm exactly)
    expect(row(wrapper, 'Size of a board')).toBe(`3' 11 1/4" long × 1' 5 11/16" wide`);
    expect(row(wrapper, 'Height')).toBe('3 15/16"');
    expect(localStorage.getItem(LENGTH_UNIT_KEY)).toBe('ft-in');
  });

  it('opens in the unit chosen on an earlier visit', () => {
    localStorage.setItem(LENGTH_UNIT_KEY, 'ft-in');
    reloadLengthUnit();

    expect(row(mountSpecs(), 'Size of a board')).toBe(`3' 11 1/4" long × 1' 5 11/16" wide`);
  });

  it('draws each end with its tracks at their offsets, described in words', () => {
    const ends = mountSpecs().findAll('.listing-end-profile svg');

    expect(ends.map((svg) => svg.attributes('aria-label'))).toEqual([
      'End A: 2 tracks at 150 mm, 196 mm from the front edge; rail top 1050 mm above the floor.',
      'End B: 1 track at 150 mm from the front edge; rail top 1050 mm above the floor.',
    ]);
  });
});
