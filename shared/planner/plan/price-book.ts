/** The suppliers' price lists, as the plan reads them. */
export interface Supplier {
  name: string;
  deliveryMinor: number;
  cuttingChargePerCutMinor?: number;
  items: readonly { itemKey: string; priceMinor: number }[];
}

/** Prices looked up by item key. */
export interface PriceBook {
  suppliers: readonly Supplier[];
  /** The lowest price of an item and who charges it (the first listed, on a tie); undefined when nobody sells it. */
  cheapest(itemKey: string): { supplier: string; priceMinor: number } | undefined;
  /** One supplier's price of an item; undefined when it does not sell it. */
  priceAt(supplier: string, itemKey: string): number | undefined;
}

/** A price book over the suppliers given (none when there is no pricing). */
export function priceBook(suppliers: readonly Supplier[] = []): PriceBook {
  const bySupplier = new Map(suppliers.map((s) => [s.name, new Map(s.items.map((i) => [i.itemKey, i.priceMinor]))]));
  return {
    suppliers,
    cheapest(itemKey) {
      let best: { supplier: string; priceMinor: number } | undefined;
      for (const s of suppliers) {
        const priceMinor = bySupplier.get(s.name)!.get(itemKey);
        if (priceMinor !== undefined && (best === undefined || priceMinor < best.priceMinor)) {
          best = { supplier: s.name, priceMinor };
        }
      }
      return best;
    },
    priceAt: (supplier, itemKey) => bySupplier.get(supplier)?.get(itemKey),
  };
}

/**
 * Prices to plan the cutting with: in "cheapest-per-item" mode the lowest price of each key when every key has one,
 * so the packer can trade long lengths against short; otherwise none, and the plan uses the least material.
 */
export function planningPrices(book: PriceBook, keys: readonly string[], mode: string): number[] | undefined {
  if (mode !== 'cheapest-per-item' || book.suppliers.length === 0) return undefined;
  const prices = keys.map((k) => book.cheapest(k)?.priceMinor);
  return prices.every((p) => p !== undefined) ? prices : undefined;
}
