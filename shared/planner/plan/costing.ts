import { materialsCost, type MaterialsCost } from './cost';
import type { LabourCost, RateCard } from './labour';
import type { PriceBook } from './price-book';
import type { ShoppingItem } from './shopping';

/** The whole price: materials, the builder's markup on them, and labour. Integer minor units of `currency`. */
export interface CostPlan {
  currency: 'GBP';
  /** Null when no suppliers are given. */
  materials: MaterialsCost | null;
  /** The rate card's markup on everything paid to suppliers (items, delivery, cutting), rounded to a minor unit. */
  markupMinor: number;
  /** Null when no rate card is given. */
  labour: LabourCost | null;
  totalMinor: number;
}

/** Costs the plan; null when neither suppliers nor a rate card are given. */
export function costPlan(
  items: readonly ShoppingItem[],
  book: PriceBook,
  pricing: { mode: MaterialsCost['mode']; currency: 'GBP' } | undefined,
  labour: { rates: RateCard; cost: LabourCost } | undefined,
): CostPlan | null {
  if (pricing === undefined && labour === undefined) return null;
  const materials = pricing === undefined ? null : materialsCost(items, book, pricing.mode);
  const paid = materials?.totalMinor ?? 0;
  const markupMinor = Math.round((paid * (labour?.rates.materialsMarkupBasisPoints ?? 0)) / 10_000);
  const labourMinor = labour?.cost.totalMinor ?? 0;
  return {
    currency: pricing?.currency ?? 'GBP',
    materials,
    markupMinor,
    labour: labour?.cost ?? null,
    totalMinor: paid + markupMinor + labourMinor,
  };
}
