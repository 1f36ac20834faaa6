import { mount } from '@vue/test-utils';
import { beforeEach, describe, expect, it } from 'vitest';
import ListingHandlingBox from '@/components/listings/ListingHandlingBox.vue';
import { reloadLengthUnit } from '@/composables/useLengthUnit';
import { handlingSummary } from '@/utils/listings/handling-summary';
import { buildModule } from './support/listings';

function mountBox(overrides: Parameters<typeof buildModule>[0]) {
  return mount(ListingHandlingBox, {
    props: { module: buildModule(overrides), currency: 'GBP', townName: 'Crewe' },
  });
}

describe('the handling box', () => {
  beforeEach(() => {
    localStorage.clear();
    reloadLengthUnit();
  });

  it('calls a 30 kg board a two-person lift, with the guideline figures and the caution', () => {
    const text = mountBox({ weightKg: 30 }).text();

    // HSE manual handling guideline (UK, L23 / INDG143): 25 kg for one person; two people two-thirds of 2 × 25 kg
    expect(text).toContain('A two-person lift');
    expect(text).toContain('over the 25.0 kg guideline for one person; two people can lift up to 33.3 kg together');
    expect(text).toContain('These are guidelines, not safe limits.');
    expect(text).toContain('Follow your local rules.');
  });

  it('calls a 9.5 kg board a one-person lift', () => {
    expect(mountBox({ weightKg: 9.5 }).text()).toContain('One person can lift it');
  });

  it('gives the packed parcel and its volumetric weight for a parcel courier', () => {
    const text = mountBox({
      weightKg: 12,
      handling: { collection: false, delivery: null, courier: 'parcel' },
    }).text();

    // 1200 × 450 × 100 mm packed with 50 mm each side = 130 × 55 × 20 cm;
    // courier convention, L×W×H/5000 (TRADE.md): 143 000 / 5000 = 28.6 kg, charged over the actual 12 kg
    expect(text).toContain('1300 mm × 550 mm × 200 mm');
    expect(text).toContain('28.6 kg');
    expect(text).toContain('Parcel courier, charged on 28.6 kg');
  });

  it('matches the published worked example of the courier convention', () => {
    // courier convention, L×W×H/5000 (TRADE.md): 25 × 30 × 15 cm / 5000 = 2.25 kg
    const summary = handlingSummary(
      buildModule({
        lengthMm: 150,
        widthMm: 200,
        heightMm: 50,
        handling: { collection: false, delivery: null, courier: 'parcel' },
      }),
      'GBP',
      'Crewe',
    );

    expect(summary.carriage).toMatchObject({ kind: 'parcel', volumetricKg: 2.25 });
  });

  it('says a board without a courier must be collected, and prices the seller’s delivery', () => {
    const text = mountBox({
      handling: { collection: true, delivery: { withinKm: 40, priceMinor: 2_500 }, courier: null },
    }).text();

    expect(text).toContain('Not sent by courier: it must be collected or delivered by the seller.');
    expect(text).toContain('Collect it from near CreweNo charge');
    expect(text).toContain('The seller delivers within 40 km of Crewe£25.00');
  });

  it('says a pallet board goes on a pallet', () => {
    const text = mountBox({ handling: { collection: false, delivery: null, courier: 'pallet' } }).text();

    expect(text).toContain('Too big or heavy for a parcel: it goes on a pallet.');
  });

  it('says when the weight was estimated from the construction rather than weighed', () => {
    expect(mountBox({ weightKg: 9.5, weightSource: 'estimated' }).text()).toContain(
      '9.5 kg (one board), estimated from the construction, not weighed',
    );
    expect(mountBox({ weightKg: 9.5 }).text()).not.toContain('estimated from the construction');
  });
});
