import { describe, expect, it } from 'vitest';
import { findContactDetails } from '../../../shared/listings/contact-details';

describe('findContactDetails', () => {
  it('flags e-mail addresses, plain and disguised', () => {
    expect(findContactDetails('Write to owen.pellby@example.org today')).toEqual([
      { kind: 'email', match: 'owen.pellby@example.org' },
    ]);
    expect(findContactDetails('owen at cattersby dot co dot uk')).toEqual([
      { kind: 'email', match: 'owen at cattersby dot co dot uk' },
    ]);
  });

  it('flags UK and Irish phone numbers in their usual spellings', () => {
    for (const number of ['07700 900123', '+44 (0)1632 960001', '01632-960-001', '+353 1 234 5678'])
      expect(findContactDetails(`Ring ${number} after six`), number).toEqual([{ kind: 'phone', match: number }]);
  });

  it('leaves sizes, sections and years alone', () => {
    const text = 'Boards 1200 x 600 x 90 mm, 44 x 18 frame at 400 centres, 2440 x 1220 sheet, built 2019 at 3 pm.';
    expect(findContactDetails(text)).toEqual([]);
  });
});
