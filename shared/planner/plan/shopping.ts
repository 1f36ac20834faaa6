import {
  boltKey,
  BRACKET_KEY,
  CLAMP_KEY,
  DROPPER_WIRE_KEY,
  dowelKey,
  PVA_KEY,
  screwKey,
  timberKey,
  washerKey,
  wingNutKey,
  wireKey,
} from './item-keys';
import type { FixingsPlan } from './fixings';
import type { SheetStockPlan } from './sheets';
import type { StockSectionPlan } from './stock';
import type { WiringPlan } from './wiring';

/** One thing to buy. */
export interface ShoppingItem {
  /** Key the suppliers' prices are looked up by (see item-keys). */
  itemKey: string;
  description: string;
  quantity: number;
  /** What one of `quantity` is. */
  unit: 'length' | 'sheet' | 'each' | 'pair' | 'bottle' | 'metre';
  /** Saw cuts the supplier makes in these sheets, when it cuts them. */
  cuts?: number;
}

/** Everything to buy: timber lengths and sheets from the cutting plans, screws, join fixings, glue, brackets, wire. */
export function shoppingList(
  stock: readonly StockSectionPlan[],
  sheets: readonly SheetStockPlan[],
  fixings: FixingsPlan,
  wiring: WiringPlan,
  yardCuts: boolean,
): ShoppingItem[] {
  const items = new Map<string, ShoppingItem>();
  const add = (item: ShoppingItem) => {
    if (item.quantity <= 0) return;
    const known = items.get(item.itemKey);
    if (known === undefined) items.set(item.itemKey, { ...item });
    else known.quantity += item.quantity;
  };
  for (const section of stock) {
    for (const bar of section.plan.bars) {
      const size = `${section.widthMm} × ${section.thicknessMm} mm`;
      const description = `${section.nominal} timber (${size}), ${bar.stockLength} mm length`;
      add({ itemKey: timberKey(section.sectionId, bar.stockLength), description, quantity: 1, unit: 'length' });
    }
  }
  for (const s of sheets) {
    const description = `${s.materialName} ${s.thicknessMm} mm, ${s.sheetMm.lengthMm} × ${s.sheetMm.widthMm} mm sheet`;
    add({
      itemKey: s.itemKey,
      description,
      quantity: s.plan.sheetCount,
      unit: 'sheet',
      ...(yardCuts ? { cuts: s.cuts } : {}),
    });
  }
  for (const s of fixings.screwsToBuy) {
    const description = `Countersunk wood screw ${s.gaugeMm} × ${s.lengthMm} mm`;
    add({ itemKey: screwKey(s.gaugeMm, s.lengthMm), description, quantity: s.count, unit: 'each' });
  }
  joinItems(fixings).forEach(add);
  add({ itemKey: PVA_KEY, description: 'PVA wood glue, 1 kg bottle', quantity: fixings.glue.bottles, unit: 'bottle' });
  add({ itemKey: BRACKET_KEY, description: 'Shelf bracket', quantity: fixings.brackets, unit: 'each' });
  const bus = `Bus wire ${wiring.conductorName}`;
  add({ itemKey: wireKey(wiring.conductor), description: bus, quantity: Math.ceil(wiring.busWireM), unit: 'metre' });
  const dropper = 'Dropper wire (thin, for rail to bus)';
  add({ itemKey: DROPPER_WIRE_KEY, description: dropper, quantity: Math.ceil(wiring.dropperWireM), unit: 'metre' });
  return [...items.values()];
}

function joinItems(fixings: FixingsPlan): ShoppingItem[] {
  const joins = fixings.boardJoins;
  if (joins.method === 'clamps') {
    return [{ itemKey: CLAMP_KEY, description: 'Clamp for joining boards', quantity: joins.total, unit: 'each' }];
  }
  if (joins.bolt === undefined) {
    const pm = joins.method === 'pattern-makers-dowels';
    const description = pm ? 'Pattern-makers’ dowels (pair)' : 'Alignment dowels (pair)';
    return [{ itemKey: dowelKey(pm), description, quantity: joins.total, unit: 'pair' }];
  }
  const { diameterMm: d, lengthMm, washers, wingNuts } = joins.bolt;
  return [
    {
      itemKey: boltKey(d, lengthMm),
      description: `Coach bolt M${d} × ${lengthMm} mm`,
      quantity: joins.total,
      unit: 'each',
    },
    { itemKey: washerKey(d), description: `Washer M${d}`, quantity: washers, unit: 'each' },
    { itemKey: wingNutKey(d), description: `Wing nut M${d}`, quantity: wingNuts, unit: 'each' },
  ];
}
