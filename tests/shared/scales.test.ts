import { describe, expect, it } from 'vitest';
import { GAUGES_MM, SCALES, scaleById, scaleIdsOnGauges } from '../../shared/scales';

const scale = (id: string) => {
  const found = scaleById(id);
  if (!found) throw new Error(`no scale ${id}`);
  return found;
};

describe('scales and gauges', () => {
  it('holds the NEM 010 standard-gauge scales with their ratios and gauges', () => {
    // published: NEM 010 (TRADE.md, "Scales and gauges")
    const expected: [string, number, number][] = [
      ['z', 220, 6.5],
      ['n', 160, 9],
      ['tt', 120, 12],
      ['h0', 87, 16.5],
      ['s', 64, 22.5],
      ['0', 45, 32],
      ['i', 32, 45],
      ['ii', 22.5, 64],
    ];
    for (const [id, ratio, gaugeMm] of expected)
      expect(scale(id), id).toMatchObject({ ratio, gaugeMm, standard: 'NEM 010', prototype: 'standard' });
  });

  it('holds the NMRA scale ratios', () => {
    // published: NMRA standards (TRADE.md, "Scales and gauges", NMRA ratio column)
    expect(scale('nmra-ho').ratio).toBe(87.1);
    expect(scale('nmra-o').ratio).toBe(48);
    expect(scale('nmra-s').ratio).toBe(64);
    expect(scale('nmra-n').ratio).toBe(160);
  });

  it('gives HO 3.5 mm to the foot, which is 1:87.1', () => {
    // published: NMRA, "1:87.1 (3.5 mm per ft)"; one foot is 304.8 mm exactly
    expect(304.8 / 3.5).toBeCloseTo(scale('nmra-ho').ratio, 1);
  });

  it('gives OO as 4 mm to the foot (1:76.2) on 16.5 mm track, and OO9 on 9 mm', () => {
    // published: UK OO, "4 mm per foot = 1:76.2 on 16.5 mm gauge — a fact of the trade"
    expect(304.8 / 4).toBe(scale('oo').ratio);
    expect(scale('oo')).toMatchObject({ ratio: 76.2, gaugeMm: 16.5, standard: 'UK trade' });
    expect(scale('oo9')).toMatchObject({ ratio: 76.2, gaugeMm: 9 });
  });

  it('derives narrow gauges by the m / e / i rule: H0m on 12 mm and H0e on 9 mm', () => {
    // published: NEM 010, "H0m = 12 mm, H0e = 9 mm"
    expect(scale('h0-m')).toMatchObject({ label: 'H0m', ratio: 87, gaugeMm: 12, prototype: 'metre' });
    expect(scale('h0-e')).toMatchObject({ label: 'H0e', ratio: 87, gaugeMm: 9, prototype: 'narrow-e' });
    // the same rule one scale up: 0m runs on S's 22.5 mm, IIm (garden metre gauge) on I's 45 mm
    expect(scale('0-m').gaugeMm).toBe(22.5);
    expect(scale('ii-m')).toMatchObject({ label: 'IIm', ratio: 22.5, gaugeMm: 45 });
    expect(scaleById('z-m')).toBeUndefined();
  });

  it('gives every scale a unique id, and lists each gauge once for the gauge filter', () => {
    expect(new Set(SCALES.map((s) => s.id)).size).toBe(SCALES.length);
    expect(GAUGES_MM).toEqual([...new Set(GAUGES_MM)].sort((a, b) => a - b));
    expect(scaleIdsOnGauges([16.5])).toEqual(expect.arrayContaining(['h0', 'oo', 'nmra-ho', '0-e', 's-m']));
  });
});
