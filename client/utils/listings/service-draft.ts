import type { Currency } from '@shared/listings/vocabulary';
import type { ServiceDetailsView } from '@shared/types/listings';
import type { TownView } from '@shared/types/towns';
import type { ReadDraft } from '@/composables/useDraftForm';
import { moneyForInput, readTypedMoney } from './money';
import { numberOrMissing } from './module-read';

/** The rate card's prices, each typed in pounds. */
export const RATE_KEYS = [
  'rateCard.perMetreFrameMinor',
  'rateCard.perSquareMetreTopMinor',
  'rateCard.perLegSetMinor',
  'rateCard.perSecondLevelMinor',
  'rateCard.deliveryPerKmMinor',
] as const;
type RateKey = (typeof RATE_KEYS)[number];

/** The build-service form's entries, keyed by the field's path in the shared schema. */
export type ServiceDraft = {
  [key: string]: unknown;
  title: string;
  description: string;
  builds: string[];
  townId: TownView | null;
  serviceAreaKm: string;
  leadTimeWeeks: string;
  materialsSupplied: string[];
  currency: Currency;
  /** Mark-up on materials, in per cent (the schema holds basis points). */
  'rateCard.materialsMarkupBp': string;
} & Record<RateKey, string>;

export function blankServiceDraft(): ServiceDraft {
  return {
    title: '',
    description: '',
    builds: [],
    townId: null,
    serviceAreaKm: '',
    leadTimeWeeks: '',
    materialsSupplied: [],
    currency: 'GBP',
    'rateCard.perMetreFrameMinor': '',
    'rateCard.perSquareMetreTopMinor': '',
    'rateCard.perLegSetMinor': '',
    'rateCard.perSecondLevelMinor': '',
    'rateCard.deliveryPerKmMinor': '',
    'rateCard.materialsMarkupBp': '',
  };
}

export function serviceDraftFrom(
  base: { title: string; description: string; currency: Currency; town: TownView },
  s: ServiceDetailsView,
): ServiceDraft {
  const r = s.rateCard;
  return {
    title: base.title,
    description: base.description,
    builds: [...s.builds],
    townId: base.town,
    serviceAreaKm: String(s.serviceAreaKm),
    leadTimeWeeks: String(s.leadTimeWeeks),
    materialsSupplied: [...s.materialsSupplied],
    currency: base.currency,
    'rateCard.perMetreFrameMinor': moneyForInput(r.perMetreFrameMinor),
    'rateCard.perSquareMetreTopMinor': moneyForInput(r.perSquareMetreTopMinor),
    'rateCard.perLegSetMinor': moneyForInput(r.perLegSetMinor),
    'rateCard.perSecondLevelMinor': moneyForInput(r.perSecondLevelMinor),
    'rateCard.deliveryPerKmMinor': moneyForInput(r.deliveryPerKmMinor),
    'rateCard.materialsMarkupBp': String(r.materialsMarkupBp / 100),
  };
}

/** The service form's entries as the shared schema's input. */
export function readServiceDraft(d: ServiceDraft): ReadDraft {
  const problems: Record<string, string> = {};
  const rate = (key: RateKey) => {
    const read = readTypedMoney(d[key]);
    if (read.ok) return read.value ?? undefined;
    problems[key] = read.message;
    return undefined;
  };
  const percent = numberOrMissing(d['rateCard.materialsMarkupBp']);
  return {
    problems,
    input: {
      kind: 'service',
      title: d.title,
      description: d.description,
      builds: d.builds,
      townId: d.townId?.id,
      serviceAreaKm: numberOrMissing(d.serviceAreaKm),
      leadTimeWeeks: numberOrMissing(d.leadTimeWeeks),
      materialsSupplied: d.materialsSupplied,
      currency: d.currency,
      rateCard: {
        perMetreFrameMinor: rate('rateCard.perMetreFrameMinor'),
        perSquareMetreTopMinor: rate('rateCard.perSquareMetreTopMinor'),
        perLegSetMinor: rate('rateCard.perLegSetMinor'),
        perSecondLevelMinor: rate('rateCard.perSecondLevelMinor'),
        deliveryPerKmMinor: rate('rateCard.deliveryPerKmMinor'),
        materialsMarkupBp: percent === undefined ? undefined : Math.round(percent * 100),
      },
    },
  };
}

/** The schema speaks of pence and basis points; the form's boxes are in pounds and per cent. */
export function rewordService(field: string, message: string): string {
  if (field === 'rateCard.materialsMarkupBp') return 'Give the mark-up in per cent, from 0 to 100, e.g. 15.';
  if (message.includes('pence')) return 'Give this price in pounds (0 if you do not charge for it), e.g. 45 or 0.60.';
  return message;
}
