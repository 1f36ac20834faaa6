import type { CuttingListRow, TimberMaterial } from '../cutting/types';
import { standardSection } from '../engineering/materials';
import { firstFitDecreasing, planStockCutting } from '../packing/stock-cutting';
import type { StockCuttingInput, StockCuttingPlan } from '../packing/stock-types';
import { timberKey } from './item-keys';
import { withPlanFields } from './packing-errors';
import { type PriceBook, planningPrices } from './price-book';

/** The cutting plan for one timber section, beside the plain First-Fit Decreasing plan it must not be worse than. */
export interface StockSectionPlan {
  materialKey: string;
  sectionId: string;
  /** What the trade calls the section, e.g. "2x1". */
  nominal: string;
  widthMm: number;
  thicknessMm: number;
  plan: StockCuttingPlan;
  /** The same parts by First-Fit Decreasing alone, for comparison. */
  firstFitDecreasing: Pick<
    StockCuttingPlan,
    'stockCount' | 'totalStockLength' | 'totalWaste' | 'wastePercent' | 'costMinor'
  >;
  /** Stock length the chosen plan saves over First-Fit Decreasing, mm (0 or more). */
  savedMm: number;
}

/** What the timber is cut from. */
export interface StockSettings {
  stockLengthsMm: readonly number[];
  kerfMm: number;
  prices: PriceBook;
  mode: string;
}

/** Plans the cutting of every timber row, one plan per section; each row's parts are cut exactly once. */
export function planStock(rows: readonly CuttingListRow[], settings: StockSettings): StockSectionPlan[] {
  const bySection = new Map<string, CuttingListRow[]>();
  for (const row of rows) {
    if (row.material.type !== 'timber') continue;
    bySection.set(row.materialKey, [...(bySection.get(row.materialKey) ?? []), row]);
  }
  return [...bySection.entries()].map(([materialKey, sectionRows]) => {
    const material = sectionRows[0]!.material as TimberMaterial;
    const lengths = [...new Set(settings.stockLengthsMm)].sort((a, b) => a - b);
    const keys = lengths.map((length) => timberKey(material.sectionId, length));
    const prices = planningPrices(settings.prices, keys, settings.mode);
    const input: StockCuttingInput = {
      parts: sectionRows.map((r) => ({ id: r.id, length: r.lengthMm, quantity: r.quantity, label: r.name })),
      stock: lengths.map((length, i) => (prices === undefined ? { length } : { length, priceMinor: prices[i]! })),
      kerf: settings.kerfMm,
    };
    const plan = withPlanFields(() => planStockCutting(input));
    const ffd = firstFitDecreasing(input);
    return {
      materialKey,
      sectionId: material.sectionId,
      nominal: standardSection(material.sectionId).nominal,
      widthMm: material.widthMm,
      thicknessMm: material.thicknessMm,
      plan,
      firstFitDecreasing: {
        stockCount: ffd.stockCount,
        totalStockLength: ffd.totalStockLength,
        totalWaste: ffd.totalWaste,
        wastePercent: ffd.wastePercent,
        ...(ffd.costMinor === undefined ? {} : { costMinor: ffd.costMinor }),
      },
      savedMm: ffd.totalStockLength - plan.totalStockLength,
    };
  });
}
