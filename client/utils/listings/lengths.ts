import { formatFeetInches, tryParseLength } from '@shared/planner/engineering/units';
import type { LengthUnit } from '@/utils/planner/draft-to-input';

/** Lengths are held in whole millimetres; these show and read them in the unit the person chose. */

/** "1200 mm" or `3' 11 1/4"`. */
export function lengthIn(mm: number, unit: LengthUnit): string {
  return unit === 'mm' ? `${Math.round(mm)} mm` : formatFeetInches(mm);
}

/** The chosen unit first, the other after: `1200 mm (3' 11 1/4")`. */
export function lengthBoth(mm: number, unit: LengthUnit): string {
  const other: LengthUnit = unit === 'mm' ? 'ft-in' : 'mm';
  return `${lengthIn(mm, unit)} (${lengthIn(mm, other)})`;
}

/**
 * A board's plan size in both units, the chosen one first, for a result card: `1200 × 450 mm` and
 * `3' 11 1/4" × 1' 5 3/4"` (to the nearest quarter inch, enough to judge a board by).
 */
export function sizeBoth(lengthMm: number, widthMm: number, unit: LengthUnit): [string, string] {
  const mm = `${Math.round(lengthMm)} × ${Math.round(widthMm)} mm`;
  const quarter = (v: number) => formatFeetInches(v, { denominator: 4 });
  const ftIn = `${quarter(lengthMm)} × ${quarter(widthMm)}`;
  return unit === 'mm' ? [mm, ftIn] : [ftIn, mm];
}

/** A length as it goes back into a typed box: "1200" in mm, `3' 11 1/4"` in feet and inches. */
export function lengthForInput(mm: number | null | undefined, unit: LengthUnit): string {
  if (mm === null || mm === undefined) return '';
  return unit === 'mm' ? String(Math.round(mm)) : formatFeetInches(mm);
}

/** What a typed length box holds once read. */
export type TypedLength = { ok: true; mm: number | null } | { ok: false; message: string };

/**
 * Read a typed length to the nearest whole millimetre. A bare number is millimetres, or inches when the person
 * works in feet and inches; any written unit (mm, cm, m, in, ft, ' and ") is honoured. Empty is `null`.
 */
export function readTypedLength(text: string, unit: LengthUnit): TypedLength {
  if (text.trim() === '') return { ok: true, mm: null };
  const read = tryParseLength(text, { defaultUnit: unit === 'mm' ? 'mm' : 'in' });
  return read.ok ? { ok: true, mm: Math.round(read.mm) } : read;
}

/** The hint under a typed length box, naming what a bare number means. */
export function lengthHint(unit: LengthUnit): string {
  return unit === 'mm'
    ? 'In mm, or write a unit: 1200, 120 cm, 3\' 11".'
    : 'In feet and inches (3\' 11 1/4") or inches (47); mm also works (1200 mm).';
}
