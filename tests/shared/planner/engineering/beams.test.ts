import { describe, expect, it } from 'vitest';
import {
  cantileverEndPointDeflection,
  cantileverUniformDeflection,
  rectangleSecondMoment,
  simplySupportedPointDeflection,
  simplySupportedUniformDeflection,
} from '../../../../shared/planner/engineering/beams';
import { EngineeringInputError } from '../../../../shared/planner/engineering/checks';

describe('beam deflection', () => {
  it('gives 21.18 mm for a 4.8 m simply supported beam under 2.4 kN/m', () => {
    // published worked example (open beam calculator): E = 11 GPa, I = 7119 cm⁴
    expect(simplySupportedUniformDeflection(2.4, 4800, 11_000, 7119e4)).toBeCloseTo(21.18, 2);
  });

  it('gives 0.167 mm for a 1000 N load at the middle of a 4 m beam', () => {
    // published worked example (engineering reference): E = 200 GPa, I = 4 × 10⁷ mm⁴
    expect(simplySupportedPointDeflection(1000, 4000, 200_000, 4e7)).toBeCloseTo(0.167, 3);
  });

  it('gives cantilever tip deflections of wL⁴/8EI and PL³/3EI', () => {
    // published (any structures handbook): 1 N/mm × (1000 mm)⁴ / (8 × 10 000 × 10⁶) = 12.5 mm
    expect(cantileverUniformDeflection(1, 1000, 10_000, 1e6)).toBeCloseTo(12.5, 12);
    // published (any structures handbook): 100 N × (1000 mm)³ / (3 × 10 000 × 10⁶) = 3.333 mm
    expect(cantileverEndPointDeflection(100, 1000, 10_000, 1e6)).toBeCloseTo(10 / 3, 12);
  });

  it('gives a 44 × 18 mm rail on edge a second moment of 127 776 mm⁴', () => {
    expect(rectangleSecondMoment(18, 44)).toBe(127_776); // published: bh³/12 = 18 × 44³ / 12
  });

  it('refuses a span, stiffness or section of zero and a negative load', () => {
    expect(() => simplySupportedUniformDeflection(1, 0, 8000, 1e5)).toThrow(EngineeringInputError);
    expect(() => simplySupportedPointDeflection(1, 1000, 0, 1e5)).toThrow(/Modulus of elasticity/);
    expect(() => cantileverUniformDeflection(-1, 1000, 8000, 1e5)).toThrow(/Uniform load/);
    expect(() => rectangleSecondMoment(18, 0)).toThrow(/Depth/);
  });
});
