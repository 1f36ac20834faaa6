import type { ReadDraft } from '@/composables/useDraftForm';
import type { LengthUnit } from '@/utils/planner/draft-to-input';
import { readTypedLength } from './lengths';
import { readTypedMoney } from './money';
import type { ModuleDraft } from './module-draft';

/** Empty text as "not given", so the schema names the missing field; anything else as the number it reads as. */
export const numberOrMissing = (text: string): number | undefined => (text.trim() === '' ? undefined : Number(text));

/** The module form's entries as the shared schema's input, with messages for boxes that could not be read. */
export function readModuleDraft(d: ModuleDraft, unit: LengthUnit): ReadDraft {
  const problems: Record<string, string> = {};
  const len = (key: keyof ModuleDraft & string): number | null | undefined => {
    const read = readTypedLength(String(d[key]), unit);
    if (read.ok) return read.mm;
    problems[key] = read.message;
    return undefined;
  };
  const given = (key: keyof ModuleDraft & string) => len(key) ?? undefined;
  const money = (key: keyof ModuleDraft & string): number | undefined => {
    const read = readTypedMoney(String(d[key]));
    if (read.ok) return read.value ?? undefined;
    problems[key] = read.message;
    return undefined;
  };
  const offsets = (key: 'endProfiles.a.trackOffsetsMm' | 'endProfiles.b.trackOffsetsMm') =>
    d[key].flatMap((text, i) => {
      const read = readTypedLength(text, unit);
      if (read.ok && read.mm !== null) return [read.mm];
      problems[key] ??= read.ok ? `Give the offset of track ${i + 1}, or remove that track.` : read.message;
      return [];
    });
  const end = (e: 'a' | 'b') => ({
    trackOffsetsMm: offsets(`endProfiles.${e}.trackOffsetsMm`),
    railTopHeightMm: given(`endProfiles.${e}.railTopHeightMm`),
    railTopFrom: d[`endProfiles.${e}.railTopFrom`] || undefined,
  });
  const input = {
    kind: 'module',
    title: d.title,
    description: d.description,
    scaleId: d.scaleId || undefined,
    lengthMm: given('lengthMm'),
    widthMm: given('widthMm'),
    heightMm: given('heightMm'),
    boardCount: numberOrMissing(d.boardCount),
    joinMethod: d.joinMethod || undefined,
    levels:
      d['levels.type'] === 'two-level'
        ? { type: 'two-level', deckGapMm: given('levels.deckGapMm') }
        : { type: 'single' },
    construction: {
      frameDepthMm: given('construction.frameDepthMm'),
      frameThicknessMm: given('construction.frameThicknessMm'),
      crossMemberSpacingMm: given('construction.crossMemberSpacingMm'),
      topMaterial: d['construction.topMaterial'] || undefined,
      topThicknessMm: d['construction.topMaterial'] === 'none' ? null : (len('construction.topThicknessMm') ?? null),
      supports: d['construction.supports'] || undefined,
    },
    wiring: d.wiring
      ? {
          control: d['wiring.control'] || undefined,
          busWireMm2: numberOrMissing(d['wiring.busWireMm2']),
          boardConnectors: d['wiring.boardConnectors'],
        }
      : null,
    endProfiles: { a: end('a'), b: end('b') },
    finish: d.finish || undefined,
    condition: d.condition || undefined,
    conditionNotes: d.conditionNotes,
    priceMinor: money('priceMinor'),
    currency: d.currency,
    townId: d.townId?.id,
    handling: {
      collection: d['handling.collection'],
      delivery: d['handling.delivery']
        ? {
            withinKm: numberOrMissing(d['handling.delivery.withinKm']),
            priceMinor: money('handling.delivery.priceMinor'),
          }
        : null,
      courier: d['handling.courier'] || null,
      courierPriceMinor: d['handling.courier'] ? money('handling.courierPriceMinor') : null,
    },
    weightKg: numberOrMissing(d.weightKg),
    weightSource: d.weightSource,
  };
  return { input, problems };
}

/** The schema speaks of pence; the form's money boxes are in pounds. */
export function rewordMoney(field: string, message: string): string {
  if (!message.includes('pence')) return message;
  if (field === 'priceMinor') return 'Give the price in pounds, from 0.01 up to 100000, e.g. 180 or 179.50.';
  if (field === 'handling.courierPriceMinor')
    return 'Give the courier price in pounds (0 if your price includes it), e.g. 24 or 12.50.';
  if (field.endsWith('priceMinor')) return 'Give the delivery price in pounds (0 for free), e.g. 25 or 12.50.';
  return message.replace(/in (whole )?pence or cents, e\.g\. 12500 for 125\.00/, 'in pounds, e.g. 125');
}
