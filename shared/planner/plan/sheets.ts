import type { CuttingListRow, SheetMaterial } from '../cutting/types';
import { SHEET_MATERIALS } from '../engineering/sheet-data';
import { planSheetCutting } from '../packing/sheet-cutting';
import type { SheetCuttingPlan } from '../packing/sheet-types';
import { yardCutList } from '../packing/yard-cut-list';
import { sheetKey } from './item-keys';
import { withPlanFields } from './packing-errors';
import { type PriceBook, planningPrices } from './price-book';

/** The cutting plan for one sheet material and thickness. */
export interface SheetStockPlan {
  materialKey: string;
  material: SheetMaterial['material'];
  /** The material in words, e.g. "Birch plywood". */
  materialName: string;
  thicknessMm: number;
  /** The sheet on sale, long side first, mm. */
  sheetMm: { lengthMm: number; widthMm: number };
  /** Key of one sheet in the price lists. */
  itemKey: string;
  plan: SheetCuttingPlan;
  /** Saw cuts over all the sheets: what a yard charges for when it cuts them. */
  cuts: number;
  /** The cuts as lines a timber yard can follow, when the yard cuts the sheets. */
  yardCutList?: string[];
}

/** What the sheets are cut from. */
export interface SheetSettings {
  sheetMm: { lengthMm: number; widthMm: number };
  kerfMm: number;
  yardCuts: boolean;
  prices: PriceBook;
  mode: string;
}

/** Plans the cutting of every sheet row, one plan per material and thickness; each part is placed exactly once. */
export function planSheets(rows: readonly CuttingListRow[], settings: SheetSettings): SheetStockPlan[] {
  const byMaterial = new Map<string, CuttingListRow[]>();
  for (const row of rows) {
    if (row.material.type !== 'sheet') continue;
    byMaterial.set(row.materialKey, [...(byMaterial.get(row.materialKey) ?? []), row]);
  }
  const { lengthMm, widthMm } = settings.sheetMm;
  return [...byMaterial.entries()].map(([materialKey, materialRows]) => {
    const material = materialRows[0]!.material as SheetMaterial;
    const itemKey = sheetKey(material.material, material.thicknessMm, lengthMm, widthMm);
    const price = planningPrices(settings.prices, [itemKey], settings.mode)?.[0];
    const plan = withPlanFields(() =>
      planSheetCutting({
        parts: materialRows.map((r) => ({
          id: r.id,
          width: r.lengthMm,
          height: r.widthMm!,
          quantity: r.quantity,
          label: r.name,
          grain: r.grain,
        })),
        sheets: [{ width: lengthMm, height: widthMm, ...(price === undefined ? {} : { priceMinor: price }) }],
        kerf: settings.kerfMm,
      }),
    );
    return {
      materialKey,
      material: material.material,
      materialName: SHEET_MATERIALS[material.material].name,
      thicknessMm: material.thicknessMm,
      sheetMm: { lengthMm, widthMm },
      itemKey,
      plan,
      cuts: plan.sheets.reduce((sum, s) => sum + s.cuts.length, 0),
      ...(settings.yardCuts ? { yardCutList: yardCutList(plan) } : {}),
    };
  });
}
