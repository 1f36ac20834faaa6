import { formatFeetInches } from '@shared/planner/engineering/units';
import { ref, watch } from 'vue';
import type { LengthUnit } from '@/utils/planner/draft-to-input';

/** Where the chosen unit is remembered between visits. */
export const LENGTH_UNIT_KEY = 'bw-length-unit';

function storedUnit(): LengthUnit {
  try {
    return localStorage.getItem(LENGTH_UNIT_KEY) === 'ft-in' ? 'ft-in' : 'mm';
  } catch {
    return 'mm';
  }
}

/** One choice for the whole app, so every drawing and table follows the toggle at once. */
const unit = ref<LengthUnit>(storedUnit());
watch(unit, (value) => {
  try {
    localStorage.setItem(LENGTH_UNIT_KEY, value);
  } catch {
    // Storage blocked: the choice lasts until the page is closed.
  }
});

/** Millimetres to at most one decimal place, without trailing zeros: 406.4, 1200. */
export function plainMm(mm: number): string {
  return String(Math.round(mm * 10) / 10);
}

/**
 * Lengths shown the way the person chose: millimetres or feet and inches (to 1/16 in, or 1/32 in for `fine`
 * thicknesses). Lengths are always held in millimetres; this converts only for display.
 */
export function useLengthUnit() {
  /** "1200 mm" or `3' 11 1/4"`. */
  function formatLength(mm: number, options: { fine?: boolean } = {}): string {
    if (!Number.isFinite(mm)) return '';
    if (unit.value === 'mm') return `${plainMm(mm)} mm`;
    return formatFeetInches(mm, { denominator: options.fine ? 32 : 16 });
  }

  return { unit, formatLength };
}

/** Read the remembered unit again (tests change storage between cases). */
export function reloadLengthUnit(): void {
  unit.value = storedUnit();
}
