import fc from 'fast-check';
import type { SheetCuttingInput, SheetStock } from '../../../../shared/planner/packing/sheet-types';
import type { StockCuttingInput } from '../../../../shared/planner/packing/stock-types';
import { UK_STOCK_LENGTHS_MM } from '../../../../shared/planner/packing/trade-defaults';

/**
 * Linear cutting problems on UK stock lengths (merchants' published lengths, multiples of 0.3 m (TRADE.md)),
 * kerf 0–6 mm, end trim 0–20 mm, priced or not; every part fits the longest stock chosen.
 */
export const linearInput: fc.Arbitrary<StockCuttingInput> = fc
  .record({
    stock: fc.subarray([...UK_STOCK_LENGTHS_MM], { minLength: 1 }),
    priced: fc.boolean(),
    kerf: fc.integer({ min: 0, max: 6 }),
    trimPerStock: fc.integer({ min: 0, max: 20 }),
  })
  .chain(({ stock, priced, kerf, trimPerStock }) => {
    const maxRoom = Math.max(...stock) - trimPerStock;
    const length = fc.oneof(
      fc.integer({ min: 1, max: maxRoom }),
      fc.integer({ min: Math.floor(maxRoom / 4), max: Math.floor(maxRoom / 2) + kerf }),
      fc.integer({ min: Math.floor(maxRoom / 2), max: maxRoom }),
    );
    return fc
      .record({
        lengths: fc.array(fc.record({ length, quantity: fc.integer({ min: 0, max: 6 }) }), { maxLength: 10 }),
        prices: fc.array(fc.integer({ min: 100, max: 4000 }), { minLength: stock.length, maxLength: stock.length }),
      })
      .map(({ lengths, prices }) => ({
        parts: lengths.map((p, i) => ({ id: `part-${i}`, ...p })),
        stock: stock.map((l, i) => (priced ? { length: l, priceMinor: prices[i]! } : { length: l })),
        kerf,
        trimPerStock,
      }));
  });

/** Standard 2440 × 1220 and birch 3050 × 1525 sheets (sheet sizes, published (TRADE.md)), alone or together. */
const sheetChoices: SheetStock[][] = [
  [{ width: 2440, height: 1220 }],
  [{ width: 3050, height: 1525 }],
  [
    { width: 2440, height: 1220 },
    { width: 3050, height: 1525 },
  ],
];

/**
 * Sheet cutting problems whose parts fit the smallest sheet chosen, with grain, rotation, kerf and prices varied.
 */
export const sheetInput: fc.Arbitrary<SheetCuttingInput> = fc
  .record({
    sheets: fc.constantFrom(...sheetChoices),
    priced: fc.boolean(),
    kerf: fc.integer({ min: 0, max: 5 }),
    allowRotation: fc.boolean(),
  })
  .chain(({ sheets, priced, kerf, allowRotation }) => {
    const maxWidth = Math.min(...sheets.map((s) => s.width));
    const maxHeight = Math.min(...sheets.map((s) => s.height));
    const part = fc.record({
      width: fc.oneof(fc.integer({ min: 1, max: maxWidth }), fc.integer({ min: 50, max: 800 })),
      height: fc.oneof(fc.integer({ min: 1, max: maxHeight }), fc.integer({ min: 50, max: 600 })),
      quantity: fc.integer({ min: 0, max: 5 }),
      grain: fc.constantFrom('along' as const, 'any' as const, undefined),
    });
    return fc.array(part, { maxLength: 8 }).map((parts) => ({
      parts: parts.map((p, i) => ({ id: `part-${i}`, ...p })),
      sheets: sheets.map((s, i) => (priced ? { ...s, priceMinor: 3000 + 2000 * i } : s)),
      kerf,
      allowRotation,
    }));
  });
