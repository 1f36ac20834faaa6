import type { Currency } from '@shared/listings/vocabulary';
import type { ModuleDetailsView } from '@shared/types/listings';
import type { TownView } from '@shared/types/towns';
import type { LengthUnit } from '@/utils/planner/draft-to-input';
import { lengthForInput, readTypedLength } from './lengths';
import { moneyForInput } from './money';

/**
 * The sell form's entries for a module, one per field, keyed by the field's path in the shared schema. Lengths
 * are typed in the person's unit and money in pounds; `readModuleDraft` turns them into the schema's input.
 */
export interface ModuleDraft {
  [key: string]: unknown;
  title: string;
  description: string;
  scaleId: string;
  boardCount: string;
  joinMethod: string;
  lengthMm: string;
  widthMm: string;
  heightMm: string;
  'levels.type': 'single' | 'two-level';
  'levels.deckGapMm': string;
  'construction.frameDepthMm': string;
  'construction.frameThicknessMm': string;
  'construction.crossMemberSpacingMm': string;
  'construction.topMaterial': string;
  'construction.topThicknessMm': string;
  'construction.supports': string;
  /** Whether the board carries wiring at all. */
  wiring: boolean;
  'wiring.control': string;
  'wiring.busWireMm2': string;
  'wiring.boardConnectors': string;
  'endProfiles.a.trackOffsetsMm': string[];
  'endProfiles.a.railTopHeightMm': string;
  'endProfiles.a.railTopFrom': string;
  'endProfiles.b.trackOffsetsMm': string[];
  'endProfiles.b.railTopHeightMm': string;
  'endProfiles.b.railTopFrom': string;
  finish: string;
  condition: string;
  conditionNotes: string;
  priceMinor: string;
  currency: Currency;
  townId: TownView | null;
  'handling.collection': boolean;
  /** Whether the seller delivers. */
  'handling.delivery': boolean;
  'handling.delivery.withinKm': string;
  'handling.delivery.priceMinor': string;
  'handling.courier': '' | 'parcel' | 'pallet';
  'handling.courierPriceMinor': string;
  weightKg: string;
  /** "estimated" while the weight is the planner's estimate, following the construction as it is typed. */
  weightSource: 'entered' | 'estimated';
}

/** Single lengths typed in the person's unit. */
export const LENGTH_KEYS = [
  'lengthMm',
  'widthMm',
  'heightMm',
  'levels.deckGapMm',
  'construction.frameDepthMm',
  'construction.frameThicknessMm',
  'construction.crossMemberSpacingMm',
  'construction.topThicknessMm',
  'endProfiles.a.railTopHeightMm',
  'endProfiles.b.railTopHeightMm',
] as const;
export const OFFSET_KEYS = ['endProfiles.a.trackOffsetsMm', 'endProfiles.b.trackOffsetsMm'] as const;

export function blankModuleDraft(): ModuleDraft {
  return {
    title: '',
    description: '',
    scaleId: '',
    boardCount: '1',
    joinMethod: '',
    lengthMm: '',
    widthMm: '',
    heightMm: '',
    'levels.type': 'single',
    'levels.deckGapMm': '',
    'construction.frameDepthMm': '',
    'construction.frameThicknessMm': '',
    'construction.crossMemberSpacingMm': '',
    'construction.topMaterial': '',
    'construction.topThicknessMm': '',
    'construction.supports': '',
    wiring: false,
    'wiring.control': '',
    'wiring.busWireMm2': '',
    'wiring.boardConnectors': '',
    'endProfiles.a.trackOffsetsMm': [''],
    'endProfiles.a.railTopHeightMm': '',
    'endProfiles.a.railTopFrom': 'floor',
    'endProfiles.b.trackOffsetsMm': [''],
    'endProfiles.b.railTopHeightMm': '',
    'endProfiles.b.railTopFrom': 'floor',
    finish: '',
    condition: '',
    conditionNotes: '',
    priceMinor: '',
    currency: 'GBP',
    townId: null,
    'handling.collection': true,
    'handling.delivery': false,
    'handling.delivery.withinKm': '',
    'handling.delivery.priceMinor': '',
    'handling.courier': '',
    'handling.courierPriceMinor': '',
    weightKg: '',
    weightSource: 'entered',
  };
}

/** A saved listing back in the form, lengths in the person's unit. */
export function moduleDraftFrom(
  base: { title: string; description: string; currency: Currency; town: TownView },
  m: ModuleDetailsView,
  unit: LengthUnit,
): ModuleDraft {
  const len = (mm: number | null) => lengthForInput(mm, unit);
  const c = m.construction;
  const end = (e: ModuleDetailsView['endProfiles']['a']) => ({
    offsets: e.trackOffsetsMm.length ? e.trackOffsetsMm.map(len) : [],
    height: len(e.railTopHeightMm),
  });
  const [a, b] = [end(m.endProfiles.a), end(m.endProfiles.b)];
  return {
    title: base.title,
    description: base.description,
    scaleId: m.scale.id,
    boardCount: String(m.boardCount),
    joinMethod: m.joinMethod,
    lengthMm: len(m.lengthMm),
    widthMm: len(m.widthMm),
    heightMm: len(m.heightMm),
    'levels.type': m.levels.type,
    'levels.deckGapMm': m.levels.type === 'two-level' ? len(m.levels.deckGapMm) : '',
    'construction.frameDepthMm': len(c.frameDepthMm),
    'construction.frameThicknessMm': len(c.frameThicknessMm),
    'construction.crossMemberSpacingMm': len(c.crossMemberSpacingMm),
    'construction.topMaterial': c.topMaterial,
    'construction.topThicknessMm': len(c.topThicknessMm),
    'construction.supports': c.supports,
    wiring: m.wiring !== null,
    'wiring.control': m.wiring?.control ?? '',
    'wiring.busWireMm2': m.wiring ? String(m.wiring.busWireMm2) : '',
    'wiring.boardConnectors': m.wiring?.boardConnectors ?? '',
    'endProfiles.a.trackOffsetsMm': a.offsets,
    'endProfiles.a.railTopHeightMm': a.height,
    'endProfiles.a.railTopFrom': m.endProfiles.a.railTopFrom,
    'endProfiles.b.trackOffsetsMm': b.offsets,
    'endProfiles.b.railTopHeightMm': b.height,
    'endProfiles.b.railTopFrom': m.endProfiles.b.railTopFrom,
    finish: m.finish,
    condition: m.condition,
    conditionNotes: m.conditionNotes,
    priceMinor: moneyForInput(m.priceMinor),
    currency: base.currency,
    townId: base.town,
    'handling.collection': m.handling.collection,
    'handling.delivery': m.handling.delivery !== null,
    'handling.delivery.withinKm': m.handling.delivery ? String(m.handling.delivery.withinKm) : '',
    'handling.delivery.priceMinor': moneyForInput(m.handling.delivery?.priceMinor),
    'handling.courier': m.handling.courier ?? '',
    'handling.courierPriceMinor': moneyForInput(m.handling.courierPriceMinor ?? undefined),
    weightKg: String(m.weightKg),
    weightSource: m.weightSource,
  };
}

/** Retype every length in the new unit, keeping what could not be read as it was typed. */
export function convertLengths(d: ModuleDraft, from: LengthUnit, to: LengthUnit): void {
  const convert = (text: string) => {
    const read = readTypedLength(text, from);
    return read.ok && read.mm !== null ? lengthForInput(read.mm, to) : text;
  };
  for (const key of LENGTH_KEYS) d[key] = convert(d[key]);
  for (const key of OFFSET_KEYS) d[key] = d[key].map(convert);
}
