import type { PriceBook, Supplier } from './price-book';
import type { ShoppingItem } from './shopping';

/** An item with the supplier it is bought from and its price; supplier null when nobody prices it. */
export interface CostLine {
  itemKey: string;
  description: string;
  quantity: number;
  unit: ShoppingItem['unit'];
  supplier: string | null;
  unitPriceMinor: number | null;
  /** quantity × unit price, minor units (0 when unpriced). */
  totalMinor: number;
  /** The supplier's charge for cutting these sheets, minor units. */
  cuttingMinor: number;
}

function line(item: ShoppingItem, supplier: Supplier | undefined, price: number | undefined): CostLine {
  const priced = supplier !== undefined && price !== undefined;
  return {
    itemKey: item.itemKey,
    description: item.description,
    quantity: item.quantity,
    unit: item.unit,
    supplier: priced ? supplier.name : null,
    unitPriceMinor: priced ? price : null,
    totalMinor: priced ? price * item.quantity : 0,
    cuttingMinor: priced ? (supplier.cuttingChargePerCutMinor ?? 0) * (item.cuts ?? 0) : 0,
  };
}

/** Each item from whoever prices it lowest (the first listed, on a tie). */
export function cheapestPerItem(items: readonly ShoppingItem[], book: PriceBook): CostLine[] {
  return items.map((item) => {
    const best = book.cheapest(item.itemKey);
    const supplier = book.suppliers.find((s) => s.name === best?.supplier);
    return line(item, supplier, best?.priceMinor);
  });
}

/**
 * Everything from one supplier: the one that prices the most items, then costs least in all (delivery and cutting
 * included), then comes first in the list.
 */
export function cheapestSupplier(items: readonly ShoppingItem[], book: PriceBook): CostLine[] {
  let best: { lines: CostLine[]; missing: number; total: number } | undefined;
  for (const supplier of book.suppliers) {
    const lines = items.map((item) => line(item, supplier, book.priceAt(supplier.name, item.itemKey)));
    const missing = lines.filter((l) => l.supplier === null).length;
    const total = lines.reduce((sum, l) => sum + l.totalMinor + l.cuttingMinor, supplier.deliveryMinor);
    if (best === undefined || missing < best.missing || (missing === best.missing && total < best.total)) {
      best = { lines, missing, total };
    }
  }
  return best?.lines ?? items.map((item) => line(item, undefined, undefined));
}
