import { describe, expect, it } from 'vitest';
import {
  chargeableWeight,
  packedSize,
  shippingWeight,
  volumetricWeight,
  volumetricWeightLb,
} from '../../../../shared/planner/engineering/shipping';

describe('volumetric weight', () => {
  it('divides by 5000 by default and by 6000 for air cargo', () => {
    expect(volumetricWeight(25, 30, 15)).toBe(2.25); // published worked example (courier convention): / 5000
    expect(volumetricWeight(30, 45, 65, 6000)).toBe(14.625); // published worked example (IATA): / 6000
  });

  it('gives US dimensional weight in pounds at 139 cubic inches per pound', () => {
    expect(volumetricWeightLb(12, 12, 12)).toBeCloseTo(1728 / 139, 12); // published (US, inches)
  });

  it('charges the greater of the actual and the volumetric weight', () => {
    expect(chargeableWeight(8, 45.5)).toBe(45.5); // published (courier convention)
    expect(chargeableWeight(50, 45.5)).toBe(50); // published (courier convention)
  });
});

describe('packing a board', () => {
  it('adds 50 mm of padding on every side unless told otherwise', () => {
    const board = { lengthMm: 1200, widthMm: 600, heightMm: 150 };
    expect(packedSize(board)).toEqual({ lengthMm: 1300, widthMm: 700, heightMm: 250 }); // common practice, no source
    expect(packedSize(board, 0)).toEqual(board);
  });

  it('works out what a courier charges for a packed board', () => {
    const result = shippingWeight({ lengthMm: 1200, widthMm: 600, heightMm: 150 }, 8);
    // published (courier convention): 130 × 70 × 25 cm / 5000 = 45.5 kg, more than the 8 kg it weighs
    expect(result.volumetricKg).toBeCloseTo(45.5, 12);
    expect(result.chargeableKg).toBeCloseTo(45.5, 12);
  });

  it('refuses a parcel with no size', () => {
    expect(() => volumetricWeight(0, 10, 10)).toThrow(/Length/);
  });
});
