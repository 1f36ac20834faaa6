import { toCsv } from './csv';
import type { CuttingListRow } from './cutting/types';
import type { Plan } from './plan-types';
import type { CostLine } from './plan/supplier-choice';

const CUTTING_HEADER = [
  'Part',
  'Kind',
  'Material',
  'Section or thickness',
  'Length (mm)',
  'Width (mm)',
  'Quantity',
  'Boards',
];

function materialCells(row: CuttingListRow): [string, string] {
  const m = row.material;
  return m.type === 'timber'
    ? [`timber ${m.sectionId}`, `${m.widthMm} × ${m.thicknessMm} mm`]
    : [`sheet ${m.material}`, `${m.thicknessMm} mm`];
}

/** The cutting list as CSV: one line per row, with how many each board takes. */
export function cuttingListCsv(plan: Pick<Plan, 'cuttingList'>): string {
  const lines = plan.cuttingList.map((row) => [
    row.name,
    row.kind,
    ...materialCells(row),
    row.lengthMm,
    row.widthMm ?? '',
    row.quantity,
    row.boards.map((b) => `${b.boardName} × ${b.quantity}`).join('; '),
  ]);
  return toCsv([CUTTING_HEADER, ...lines]);
}

const SHOPPING_HEADER = [
  'Item key',
  'Item',
  'Quantity',
  'Unit',
  'Supplier',
  'Unit price (minor units)',
  'Total (minor units)',
];

/**
 * The shopping list as CSV: one line per item, with the supplier and prices when the plan is costed, then lines for
 * delivery, cutting and the materials total. Money stays in integer minor units, as the plan holds it.
 */
export function shoppingListCsv(plan: Pick<Plan, 'shoppingList' | 'cost'>): string {
  const materials = plan.cost?.materials ?? null;
  const byKey = new Map<string, CostLine>((materials?.lines ?? []).map((l) => [l.itemKey, l]));
  const lines: (string | number)[][] = plan.shoppingList.map((item) => {
    const cost = byKey.get(item.itemKey);
    return [
      item.itemKey,
      item.description,
      item.quantity,
      item.unit,
      cost?.supplier ?? '',
      cost?.unitPriceMinor ?? '',
      cost?.supplier ? cost.totalMinor : '',
    ];
  });
  if (materials !== null) {
    lines.push(['', 'Delivery', '', '', materials.suppliersUsed.join('; '), '', materials.deliveryMinor]);
    lines.push(['', 'Cutting', '', '', '', '', materials.cuttingMinor]);
    lines.push(['', 'Materials total', '', '', '', '', materials.totalMinor]);
  }
  return toCsv([SHOPPING_HEADER, ...lines]);
}
