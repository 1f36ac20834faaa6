import { PlannerInputError } from './errors';
import { MAX_PIECES_PER_PLAN } from './trade-defaults';

/** Throws unless `value` is an integer of at least `min`; `what` names the field in the message. */
export function requireInteger(value: number, what: string, min: number, partId?: string): void {
  if (!Number.isInteger(value) || value < min) {
    const rule = min === 0 ? 'a whole number of zero or more' : `a whole number of at least ${min}`;
    throw new PlannerInputError('invalid-input', `${what} must be ${rule} (got ${value}).`, partId);
  }
}

/** Throws when a part id is empty or used twice; the planner reports parts by id, so each must be unique. */
export function requireUniqueIds(ids: readonly string[]): void {
  const seen = new Set<string>();
  for (const id of ids) {
    if (id.trim() === '') throw new PlannerInputError('invalid-input', 'Every part needs a name or number (id).');
    if (seen.has(id)) {
      throw new PlannerInputError('invalid-input', `Part "${id}" is listed twice; merge the rows or rename one.`, id);
    }
    seen.add(id);
  }
}

/** Throws unless every stock item has a price or none has; a plan cannot compare priced and unpriced stock. */
export function requirePricesAllOrNone(prices: readonly (number | undefined)[], what: string): boolean {
  const priced = prices.filter((p) => p !== undefined);
  if (priced.length !== 0 && priced.length !== prices.length) {
    throw new PlannerInputError('invalid-input', `Give a price for every ${what}, or for none.`);
  }
  for (const price of priced) requireInteger(price, `The price of a ${what} (minor units)`, 0);
  return priced.length === prices.length && prices.length > 0;
}

/** Throws when the parts add up to more pieces than one plan may hold. */
export function requirePieceCount(quantities: readonly number[]): void {
  const total = quantities.reduce((sum, q) => sum + q, 0);
  if (total > MAX_PIECES_PER_PLAN) {
    throw new PlannerInputError(
      'too-many-pieces',
      `The parts list asks for ${total} pieces; plan at most ${MAX_PIECES_PER_PLAN} at a time by splitting the list.`,
    );
  }
}
