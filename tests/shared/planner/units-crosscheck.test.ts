import convert from 'convert-units';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatFeetInches, parseLength } from '../../../shared/planner/engineering';

describe('length conversion against a unit-conversion package', () => {
  it('turns feet and inches into the same millimetres as convert-units', () => {
    // reference library: convert-units 2.3.4 (its inch is 25.3999992 mm, so agreement is to one part in 10⁷)
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 11 }), (feet, inches) => {
        const reference = convert(feet).from('ft').to('mm') + convert(inches).from('in').to('mm');
        const ours = parseLength(`${feet}' ${inches}"`);
        expect(Math.abs(ours - reference)).toBeLessThanOrEqual(Math.max(1e-7 * reference, 1e-9));
      }),
      { numRuns: 300 },
    );
  });

  it('reads back its own feet-and-inches text as convert-units converts it, to the nearest 1/16 in', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12_000 }), (mm) => {
        const back = parseLength(formatFeetInches(mm));
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(
          convert(1 / 32)
            .from('in')
            .to('mm') + 1e-6,
        );
      }),
      { numRuns: 300 },
    );
  });
});
