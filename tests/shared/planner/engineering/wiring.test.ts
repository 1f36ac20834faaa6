import { describe, expect, it } from 'vitest';
import { AWG_SOLID_OHM_PER_KM, IEC_60228_MAX_OHM_PER_KM } from '../../../../shared/planner/engineering/wiring-data';
import {
  awgDiameterMm,
  conductorsOf,
  resistanceFromAreaOhmPerM,
  resistanceOhmPerM,
  smallestPassingConductor,
  voltageDrop,
} from '../../../../shared/planner/engineering/wiring';

describe('conductor resistance', () => {
  it('gives the maximum resistance of each IEC size and class at 20 °C', () => {
    const perKm = (areaMm2: 0.5 | 0.75 | 1 | 1.5 | 2.5, cls: '1/2' | '5/6') =>
      resistanceOhmPerM({ kind: 'iec', areaMm2, class: cls }) * 1000;
    expect(perKm(0.5, '1/2')).toBeCloseTo(36.0, 9); // IEC 60228, class 1/2
    expect(perKm(0.75, '1/2')).toBeCloseTo(24.5, 9); // IEC 60228, class 1/2
    expect(perKm(1, '1/2')).toBeCloseTo(18.1, 9); // IEC 60228, class 1/2
    expect(perKm(1.5, '1/2')).toBeCloseTo(12.1, 9); // IEC 60228, class 1/2
    expect(perKm(2.5, '1/2')).toBeCloseTo(7.41, 9); // IEC 60228, class 1/2
    expect(perKm(0.5, '5/6')).toBeCloseTo(39.0, 9); // IEC 60228, class 5/6
    expect(perKm(1.5, '5/6')).toBeCloseTo(13.3, 9); // IEC 60228, class 5/6
    expect(perKm(2.5, '5/6')).toBeCloseTo(7.98, 9); // IEC 60228, class 5/6
  });

  it('gives flexible conductors more resistance than solid or stranded of the same size', () => {
    for (const row of IEC_60228_MAX_OHM_PER_KM) expect(row.class56).toBeGreaterThan(row.class12); // IEC 60228
  });

  it('agrees with the AWG diameter law and copper resistivity within 0.1 %', () => {
    for (const { gauge, ohmPerKm } of AWG_SOLID_OHM_PER_KM) {
      // standard AWG tables: d = 0.127 mm × 92^((36 − n)/39); resistivity 1/58 Ω·mm²/m (IEC 60028 — from memory)
      const area = (Math.PI / 4) * awgDiameterMm(gauge) ** 2;
      const fromLaw = resistanceFromAreaOhmPerM(area) * 1000;
      expect(Math.abs(fromLaw - ohmPerKm) / ohmPerKm).toBeLessThan(0.001);
      expect(resistanceOhmPerM({ kind: 'awg', gauge }) * 1000).toBeCloseTo(ohmPerKm, 9); // standard AWG tables
    }
  });

  it('puts the ends of the AWG scale at 0.005 in (36) and 0.46 in (0000)', () => {
    expect(awgDiameterMm(36)).toBeCloseTo(0.127, 12); // standard AWG tables
    expect(awgDiameterMm(-3)).toBeCloseTo(11.684, 9); // from memory: 0000 AWG is 0.46 in
  });

  it('corrects resistance for temperature', () => {
    const at20 = resistanceOhmPerM({ kind: 'iec', areaMm2: 1.5, class: '1/2' });
    const at40 = resistanceOhmPerM({ kind: 'iec', areaMm2: 1.5, class: '1/2' }, 40);
    expect(at40 / at20).toBeCloseTo(1 + 0.00393 * 20, 12); // from memory: 0.00393 per kelvin
  });
});

describe('voltageDrop', () => {
  it('loses 0.484 V over a 10 m run of 1.5 mm² at 2 A, out and back', () => {
    // IEC 60228, class 1/2, worked example: 2 × 10 m × 12.1 Ω/km × 2 A
    const drop = voltageDrop({ lengthM: 10, currentA: 2, conductor: { kind: 'iec', areaMm2: 1.5, class: '1/2' } });
    expect(drop).toBeCloseTo(0.484, 12);
  });

  it('loses 0.460 V over the same run worked from copper resistivity', () => {
    // IEC 60028 — from memory: 1/58 Ω·mm²/m; 2 × 10 × (1/58 / 1.5) × 2 = 0.4598 V
    const drop = voltageDrop({ lengthM: 10, currentA: 2, conductor: { kind: 'area', areaMm2: 1.5 } });
    expect(drop).toBeCloseTo(0.46, 3);
  });

  it('refuses a negative current', () => {
    expect(() => voltageDrop({ lengthM: 1, currentA: -1, conductor: { kind: 'area', areaMm2: 1 } })).toThrow(/Current/);
  });
});

describe('smallestPassingConductor', () => {
  const run = { lengthM: 10, currentA: 2 };

  it('picks the smallest IEC size whose drop is within the limit', () => {
    // IEC 60228, class 1/2: 1.0 mm² drops 0.724 V, 1.5 mm² 0.484 V, 2.5 mm² 0.2964 V
    expect(smallestPassingConductor(0.5, { ...run, family: 'iec-1/2' })?.conductor).toEqual({
      kind: 'iec',
      areaMm2: 1.5,
      class: '1/2',
    });
    expect(smallestPassingConductor(0.3, { ...run, family: 'iec-1/2' })?.dropV).toBeCloseTo(0.2964, 12);
  });

  it('picks from AWG sizes, smallest conductor first', () => {
    expect(conductorsOf('awg').map((c) => (c.kind === 'awg' ? c.gauge : 0))).toEqual([22, 18, 16, 14]);
    // standard AWG tables: 16 AWG drops 0.527 V, 14 AWG 0.331 V
    expect(smallestPassingConductor(0.5, { ...run, family: 'awg' })?.conductor).toEqual({ kind: 'awg', gauge: 14 });
  });

  it('answers null when no listed size is big enough', () => {
    expect(smallestPassingConductor(0.1, { ...run, family: 'iec-5/6' })).toBeNull();
  });
});
