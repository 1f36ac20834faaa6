import { lengthText as len } from '../text/lengths';
import { PlannerInputError } from './errors';
import { requireInteger, requirePieceCount, requirePricesAllOrNone, requireUniqueIds } from './input-checks';
import type { StockCuttingInput, StockLength } from './stock-types';
import { DEFAULT_KERF_MM, UK_STOCK_LENGTHS_MM } from './trade-defaults';

/** One piece to cut: a single unit of a part's quantity. */
export interface LinearPiece {
  partId: string;
  length: number;
  label?: string;
}

/** Checked input in the form the packers use. */
export interface LinearProblem {
  /** Every piece, longest first (ties by part id, so plans are repeatable). */
  pieces: LinearPiece[];
  /** Stock on sale, shortest first, one entry per length (the cheapest when a length is listed twice). */
  stock: StockLength[];
  kerf: number;
  trim: number;
  priced: boolean;
  /** Usable mm on the longest stock length (its length less the end trim). */
  maxRoom: number;
}

/** Checks the input and expands it into pieces; throws {@link PlannerInputError} naming what to fix. */
export function toLinearProblem(input: StockCuttingInput): LinearProblem {
  const kerf = input.kerf ?? DEFAULT_KERF_MM;
  const trim = input.trimPerStock ?? 0;
  requireInteger(kerf, 'The saw kerf (mm)', 0);
  requireInteger(trim, 'The end trim per bar (mm)', 0);
  const stock = normaliseStock(input.stock ?? UK_STOCK_LENGTHS_MM.map((length) => ({ length })), trim);
  const priced = requirePricesAllOrNone(
    stock.map((s) => s.priceMinor),
    'stock length',
  );
  const maxRoom = stock[stock.length - 1]!.length - trim;

  requireUniqueIds(input.parts.map((p) => p.id));
  for (const part of input.parts) {
    requireInteger(part.length, `The length of part "${part.id}" (mm)`, 1, part.id);
    requireInteger(part.quantity, `The quantity of part "${part.id}"`, 0, part.id);
    if (part.quantity > 0 && part.length > maxRoom) {
      throw new PlannerInputError(
        'part-too-long',
        `The ${part.label?.toLowerCase() ?? `part "${part.id}"`} is ${len(part.length)} long but the longest timber on sale gives ` +
          `${len(maxRoom)}; ` +
          'add a longer stock length or split the part into two with a joint.',
        part.id,
      );
    }
  }
  requirePieceCount(input.parts.map((p) => p.quantity));

  const pieces: LinearPiece[] = [];
  for (const part of input.parts) {
    for (let i = 0; i < part.quantity; i++) pieces.push({ partId: part.id, length: part.length, label: part.label });
  }
  pieces.sort((a, b) => b.length - a.length || (a.partId < b.partId ? -1 : a.partId > b.partId ? 1 : 0));
  return { pieces, stock, kerf, trim, priced, maxRoom };
}

function normaliseStock(stock: readonly StockLength[], trim: number): StockLength[] {
  if (stock.length === 0) throw new PlannerInputError('invalid-input', 'Add at least one stock length to cut from.');
  const byLength = new Map<number, StockLength>();
  for (const s of stock) {
    requireInteger(s.length, 'A stock length (mm)', trim + 1);
    const known = byLength.get(s.length);
    if (!known || (s.priceMinor ?? Infinity) < (known.priceMinor ?? Infinity)) byLength.set(s.length, { ...s });
  }
  return [...byLength.values()].sort((a, b) => a.length - b.length);
}
