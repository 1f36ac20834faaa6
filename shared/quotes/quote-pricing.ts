import { computePlan } from '../planner/compute-plan';
import type { Plan } from '../planner/plan-types';
import type { PlanInput } from '../planner/schema';
import type { RateCard } from '../schemas/listing-service';

/** One priced line of a quote, in minor units of the quote's currency. */
export interface QuoteLine {
  /** Where the line came from: a rate-card item, the materials, the mark-up, or the builder's own line. */
  key: string;
  label: string;
  /** Quantity and rate when the line is priced per unit; null for a lump sum. */
  quantity: number | null;
  unit: string | null;
  rateMinor: number | null;
  amountMinor: number;
}

/** A quote as the rate card prices the plan, before the builder changes anything. */
export interface QuoteDraft {
  lines: QuoteLine[];
  /** Sum of the lines: the price of the build, without delivery. */
  itemMinor: number;
  deliveryKm: number;
  deliveryMinor: number;
  /** False when the plan carries no suppliers' prices, so the builder must price the materials. */
  materialsPriced: boolean;
}

/** Planner labour-line names, keyed for the quote. */
const LINE_KEYS: Record<string, string> = {
  'Frame timber': 'frame',
  'Tops, shelves and kickboards': 'top',
  'Leg sets': 'legs',
  'Second-level boards': 'second-level',
};

/** The listing's rate card in the planner's terms, with the distance to deliver. */
export function plannerRates(card: RateCard, deliveryKm: number) {
  return {
    perMetreFrameMinor: card.perMetreFrameMinor,
    perSquareMetreTopMinor: card.perSquareMetreTopMinor,
    perLegSetMinor: card.perLegSetMinor,
    perSecondLevelMinor: card.perSecondLevelMinor,
    deliveryPerKmMinor: card.deliveryPerKmMinor,
    deliveryKm,
    materialsMarkupBasisPoints: card.materialsMarkupBp,
  };
}

/** The plan worked out with the builder's rates, by the planner itself (labour, materials and mark-up). */
export function planWithRates(planInput: PlanInput, card: RateCard, deliveryKm: number): Plan {
  return computePlan({ ...planInput, labour: plannerRates(card, deliveryKm) });
}

/** Quantities shown on a quote: metres and square metres to two places. */
const shown = (quantity: number) => Math.round(quantity * 100) / 100;

/**
 * Price a saved plan by a builder's rate card: the planner's labour lines (frame, tops, leg sets, second level),
 * the materials on the plan's bill of materials at the plan's suppliers' prices with the builder's mark-up, and
 * delivery by the km from the builder to the buyer's town as a separate amount. Throws the planner's
 * PlanInputError when the saved input no longer makes a plan.
 */
export function draftQuote(planInput: PlanInput, card: RateCard, deliveryKm: number): QuoteDraft {
  const cost = planWithRates(planInput, card, deliveryKm).cost;
  const labour = cost?.labour?.lines ?? [];
  const lines: QuoteLine[] = labour
    .filter((l) => l.unit !== 'km')
    .map((l) => ({
      key: `labour:${LINE_KEYS[l.what] ?? l.what}`,
      label: l.what,
      quantity: shown(l.quantity),
      unit: l.unit,
      rateMinor: l.rateMinor,
      amountMinor: l.totalMinor,
    }));
  const materials = cost?.materials ?? null;
  const lump = { quantity: null, unit: null, rateMinor: null };
  if (materials) {
    const label = 'Materials on the bill of materials, at the plan’s suppliers’ prices';
    lines.push({ key: 'materials', label, ...lump, amountMinor: materials.totalMinor });
    if (cost!.markupMinor > 0) {
      const percent = card.materialsMarkupBp / 100;
      const markup = { key: 'markup', label: `Mark-up on materials, ${percent} %`, ...lump };
      lines.push({ ...markup, amountMinor: cost!.markupMinor });
    }
  } else {
    const label = 'Materials on the bill of materials';
    lines.push({ key: 'materials', label, ...lump, amountMinor: 0 });
  }
  const deliveryMinor = labour.find((l) => l.unit === 'km')?.totalMinor ?? 0;
  return {
    lines,
    itemMinor: sumLines(lines),
    deliveryKm,
    deliveryMinor,
    materialsPriced: materials !== null,
  };
}

export const sumLines = (lines: readonly Pick<QuoteLine, 'amountMinor'>[]) =>
  lines.reduce((sum, l) => sum + l.amountMinor, 0);

/** Whether the builder's lines and delivery differ from the draft in any amount, label or line. */
export function differsFromDraft(
  draft: QuoteDraft,
  lines: readonly Pick<QuoteLine, 'label' | 'amountMinor'>[],
  deliveryMinor: number,
): boolean {
  if (deliveryMinor !== draft.deliveryMinor || lines.length !== draft.lines.length) return true;
  return lines.some((l, i) => l.label !== draft.lines[i]!.label || l.amountMinor !== draft.lines[i]!.amountMinor);
}

/** Whole kilometres to deliver: the straight-line distance rounded up. */
export const deliveryKmFor = (distanceKm: number) => Math.max(0, Math.ceil(distanceKm));
