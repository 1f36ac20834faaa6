/** Basis points as a percentage for people: 3000 → "30 %". */
export const formatPercent = (bps: number): string => `${+(bps / 100).toFixed(2)} %`;

/** A quantity with its unit, or nothing for a lump sum. */
export const formatQuantity = (quantity: number | null, unit: string | null): string =>
  quantity === null ? '' : `${quantity} ${unit ?? ''}`.trim();

/** One editable line of a quote: its key (where it came from), its words, and its amount as typed in pounds. */
export interface EditableLine {
  key: string;
  label: string;
  amount: string;
  /** "8.42 m at £45.00", shown while the amount is the rate card's own. */
  basis: string;
}
