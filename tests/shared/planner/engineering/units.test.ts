import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  formatFeetInches,
  formatMillimetres,
  LengthParseError,
  parseLength,
  tryParseLength,
} from '../../../../shared/planner/engineering/units';

const SIXTEENTH_MM = 25.4 / 16;

describe('parseLength', () => {
  it('reads one inch as exactly 25.4 mm and one foot as exactly 304.8 mm', () => {
    expect(parseLength('1 in')).toBe(25.4); // international yard and pound agreement, 1959: exact by definition
    expect(parseLength('1 ft')).toBe(304.8); // 12 × 25.4, exact by definition
  });

  it('reads an 8 × 4 ft sheet as 2438.4 × 1219.2 mm', () => {
    expect(parseLength("8'")).toBe(2438.4); // published: 8 × 4 ft = 2438 × 1219 mm
    expect(parseLength('4 feet')).toBe(1219.2); // published: 8 × 4 ft = 2438 × 1219 mm
  });

  it('reads 762 mm written in every common way', () => {
    // 2 ft 6 in = 30 in = 30 × 25.4 mm = 762 mm exactly (international inch)
    const ways = [
      `2' 6"`,
      `2'6"`,
      `2'6`,
      `2'-6"`,
      '2 ft 6 in',
      '2ft 6in',
      '2 feet 6 inches',
      '30in',
      '30 inches',
      '30"',
      '2.5 ft',
      '762 mm',
      '762mm',
      '76.2 cm',
      '0.762 m',
      '.762 metres',
      '2′ 6″',
      '2’ 6”',
      "2' 6''",
      '  762 MM  ',
    ];
    for (const text of ways) expect(parseLength(text), text).toBeCloseTo(762, 9);
  });

  it('reads fractions of an inch, plain, mixed and as one character', () => {
    expect(parseLength('1/16 in')).toBe(SIXTEENTH_MM); // 25.4 / 16, exact
    expect(parseLength('6 1/2"')).toBeCloseTo(165.1, 9); // 6.5 × 25.4
    expect(parseLength('6-1/2 in')).toBeCloseTo(165.1, 9); // 6.5 × 25.4
    expect(parseLength('6½ in')).toBeCloseTo(165.1, 9); // 6.5 × 25.4
    expect(parseLength(`1' 3 3/4"`)).toBeCloseTo(400.05, 9); // 15.75 × 25.4
  });

  it('reads a bare number in the default unit when one is given', () => {
    expect(parseLength('762', { defaultUnit: 'mm' })).toBe(762);
    expect(parseLength('30', { defaultUnit: 'in' })).toBe(762); // 30 × 25.4
  });

  it.each([
    ['', /Enter a length/],
    ['   ', /Enter a length/],
    ['762', /"762" .* has no unit/],
    ['3 yd', /"yd" .* is not a unit/],
    ['3 constructor', /"constructor" .* is not a unit/],
    ['2 m 30 cm', /mixes units/],
    [`6" 2'`, /mixes units/],
    ['1,5 m', /comma/],
    ['-3 mm', /negative/],
    ['12 mm.', /Could not understand "\."/],
    ['abc', /Could not understand "abc"/],
    ['1/0 in', /not a usable number/],
    ['1 2 3 mm', /too many numbers/],
  ])('refuses %j with a message naming what was not understood', (text, message) => {
    expect(() => parseLength(text)).toThrow(LengthParseError);
    expect(() => parseLength(text)).toThrow(message);
  });

  it('returns the message instead of throwing through tryParseLength', () => {
    expect(tryParseLength('762 mm')).toEqual({ ok: true, mm: 762 });
    const result = tryParseLength('seven feet');
    expect(result.ok).toBe(false);
    expect(!result.ok && result.message).toMatch(/Could not understand "seven feet"/);
  });

  it('reads any whole number of millimetres back exactly', () => {
    fc.assert(fc.property(fc.nat(1_000_000), (mm) => parseLength(`${mm} mm`) === mm));
  });
});

describe('formatFeetInches', () => {
  it('shows lengths in feet, inches and sixteenths', () => {
    expect(formatFeetInches(762)).toBe(`2' 6"`); // 30 in exactly
    expect(formatFeetInches(165.1)).toBe(`6 1/2"`); // 6.5 in exactly
    expect(formatFeetInches(304.8)).toBe(`1' 0"`); // 12 in exactly
    expect(formatFeetInches(2438.4)).toBe(`8' 0"`); // 96 in exactly
    expect(formatFeetInches(SIXTEENTH_MM)).toBe(`1/16"`);
    expect(formatFeetInches(400)).toBe(`1' 3 3/4"`); // 15.748 in → 15 12/16
    expect(formatFeetInches(0)).toBe(`0"`);
  });

  it('carries a rounded-up inch into the next foot', () => {
    expect(formatFeetInches(304.7)).toBe(`1' 0"`); // 11.996 in rounds to 12 in
  });

  it('shows inches only, or a coarser fraction, when asked', () => {
    expect(formatFeetInches(762, { feet: false })).toBe(`30"`);
    expect(formatFeetInches(165.1 + SIXTEENTH_MM, { denominator: 8 })).toBe(`6 5/8"`); // 6 9/16 to the nearest 1/8
  });

  it('gives back the length within 1/32 in when its text is read again', () => {
    const halfStepMm = 25.4 / 32 + 1e-9;
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100_000, noNaN: true }), fc.boolean(), (mm, feet) => {
        expect(Math.abs(parseLength(formatFeetInches(mm, { feet })) - mm)).toBeLessThanOrEqual(halfStepMm);
      }),
    );
  });
});

describe('formatMillimetres', () => {
  it('shows millimetres rounded, without a minus sign on zero', () => {
    expect(formatMillimetres(762.04)).toBe('762 mm');
    expect(formatMillimetres(12.345, 1)).toBe('12.3 mm');
    expect(formatMillimetres(-0.2)).toBe('0 mm');
  });

  it('gives back the length within half a millimetre when its text is read again', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100_000, noNaN: true }), (mm) => {
        expect(Math.abs(parseLength(formatMillimetres(mm)) - mm)).toBeLessThanOrEqual(0.5 + 1e-9);
      }),
    );
  });
});
