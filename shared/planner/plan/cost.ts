import type { PriceBook } from './price-book';
import type { ShoppingItem } from './shopping';
import { cheapestPerItem, cheapestSupplier, type CostLine } from './supplier-choice';

/** What the materials cost, bought the way chosen. All money in integer minor units (pence). */
export interface MaterialsCost {
  mode: 'cheapest-per-item' | 'cheapest-supplier';
  lines: CostLine[];
  /** Keys of items no supplier prices: the total leaves them out. */
  unpriced: string[];
  suppliersUsed: string[];
  itemsMinor: number;
  /** One delivery charge per supplier used. */
  deliveryMinor: number;
  cuttingMinor: number;
  totalMinor: number;
  /** False when some item is unpriced. */
  complete: boolean;
}

/** Prices the shopping list: per item from the cheapest, or all from the one cheapest supplier. */
export function materialsCost(
  items: readonly ShoppingItem[],
  book: PriceBook,
  mode: MaterialsCost['mode'],
): MaterialsCost {
  const lines = mode === 'cheapest-per-item' ? cheapestPerItem(items, book) : cheapestSupplier(items, book);
  const suppliersUsed = [...new Set(lines.flatMap((l) => (l.supplier === null ? [] : [l.supplier])))];
  const deliveryMinor = book.suppliers
    .filter((s) => suppliersUsed.includes(s.name))
    .reduce((sum, s) => sum + s.deliveryMinor, 0);
  const itemsMinor = lines.reduce((sum, l) => sum + l.totalMinor, 0);
  const cuttingMinor = lines.reduce((sum, l) => sum + l.cuttingMinor, 0);
  const unpriced = lines.filter((l) => l.supplier === null).map((l) => l.itemKey);
  return {
    mode,
    lines,
    unpriced,
    suppliersUsed,
    itemsMinor,
    deliveryMinor,
    cuttingMinor,
    totalMinor: itemsMinor + deliveryMinor + cuttingMinor,
    complete: unpriced.length === 0,
  };
}
