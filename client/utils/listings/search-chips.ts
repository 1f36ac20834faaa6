import { CONTROL_SYSTEMS, FINISH_LABELS, HANDLING_LABELS, type ControlSystem } from '@shared/listings/vocabulary';
import { scaleById } from '@shared/scales';
import { formatMoney } from '@/utils/format';
import type { SearchFilters } from './search-filters';

/** One applied filter, shown as a removable chip above the results. */
export interface FilterChip {
  /** Stable key: `scale:oo`, `length`, `town`… */
  id: string;
  label: string;
}

/** How the chips say lengths (in the person's unit). */
export type LengthWords = (mm: number) => string;

const CONTROL_WORDS: Record<ControlSystem, string> = { dc: 'Wired for DC', dcc: 'Wired for DCC' };

function range(what: string, low: number | null, high: number | null, say: (n: number) => string): string {
  if (low !== null && high !== null) return `${what} ${say(low)} to ${say(high)}`;
  if (low !== null) return `${what} at least ${say(low)}`;
  return `${what} up to ${say(high!)}`;
}

/** Every applied filter (not the search words, which stay in their box), in the order of the filter panel. */
export function filterChips(f: SearchFilters, length: LengthWords): FilterChip[] {
  const chips: FilterChip[] = [];
  if (f.kind) chips.push({ id: 'kind', label: f.kind === 'module' ? 'Modules only' : 'Build services only' });
  for (const id of f.scale) chips.push({ id: `scale:${id}`, label: `Scale ${scaleById(id)?.label ?? id}` });
  for (const g of f.gauge) chips.push({ id: `gauge:${g}`, label: `${g} mm gauge` });
  for (const finish of f.finish) chips.push({ id: `finish:${finish}`, label: FINISH_LABELS[finish] });
  if (f.lengthMin !== null || f.lengthMax !== null)
    chips.push({ id: 'length', label: range('Length', f.lengthMin, f.lengthMax, length) });
  if (f.widthMin !== null || f.widthMax !== null)
    chips.push({ id: 'width', label: range('Width', f.widthMin, f.widthMax, length) });
  if (f.priceMin !== null || f.priceMax !== null)
    chips.push({ id: 'price', label: range('Price', f.priceMin, f.priceMax, (p) => formatMoney(p, 'GBP')) });
  if (f.town !== null) {
    const place = f.townName || 'the chosen town';
    chips.push({ id: 'town', label: f.withinKm ? `Within ${f.withinKm} km of ${place}` : `Distances from ${place}` });
  }
  for (const h of f.handling) chips.push({ id: `handling:${h}`, label: HANDLING_LABELS[h] });
  for (const c of CONTROL_SYSTEMS)
    if (f.control.includes(c)) chips.push({ id: `control:${c}`, label: CONTROL_WORDS[c] });
  if (f.joinOffsets.length) {
    const tracks = f.joinOffsets.length === 1 ? '1 track' : `${f.joinOffsets.length} tracks`;
    const at = f.joinOffsets.map(length).join(', ');
    chips.push({ id: 'join', label: `Joins my end: ${tracks} at ${at} (± ${f.joinTolerance ?? 5} mm)` });
  }
  return chips;
}

const without = <T>(list: readonly T[], value: T) => list.filter((v) => v !== value);

/** The search with one chip's filter taken off, back on the first page. */
export function withoutChip(f: SearchFilters, chipId: string): SearchFilters {
  const [key, value = ''] = chipId.split(/:(.*)/s);
  const next: SearchFilters = { ...f, page: 1 };
  if (key === 'kind') next.kind = null;
  if (key === 'scale') next.scale = without(f.scale, value);
  if (key === 'gauge') next.gauge = without(f.gauge, Number(value));
  if (key === 'finish') next.finish = f.finish.filter((v) => v !== value);
  if (key === 'length') Object.assign(next, { lengthMin: null, lengthMax: null });
  if (key === 'width') Object.assign(next, { widthMin: null, widthMax: null });
  if (key === 'price') Object.assign(next, { priceMin: null, priceMax: null });
  if (key === 'town') Object.assign(next, { town: null, townName: '', withinKm: null });
  if (key === 'handling') next.handling = f.handling.filter((v) => v !== value);
  if (key === 'control') next.control = f.control.filter((v) => v !== value);
  if (key === 'join') Object.assign(next, { joinOffsets: [], joinTolerance: null });
  return next;
}

/** Every filter off; the search words and the chosen order stay. */
export function withoutAllFilters(f: SearchFilters): SearchFilters {
  return filterChips(f, String).reduce((acc, chip) => withoutChip(acc, chip.id), { ...f, page: 1 });
}
