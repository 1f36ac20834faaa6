/** Characters that make a spreadsheet read a cell as a formula (OWASP CSV injection guidance). */
const FORMULA_START = /^[=+\-@\t\r]/;

/** Characters that make a cell need quoting (RFC 4180). */
const NEEDS_QUOTES = /[",\r\n]/;

/**
 * One cell, safe to open in a spreadsheet: text starting with = + - @, a tab or a carriage return gets a leading
 * apostrophe so it is never run as a formula (OWASP CSV injection guidance); then a cell holding a quote, comma or
 * line break is wrapped in quotes with its quotes doubled (RFC 4180). Numbers are written as they are.
 */
export function csvCell(value: string | number): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const neutral = FORMULA_START.test(value) ? `'${value}` : value;
  return NEEDS_QUOTES.test(neutral) ? `"${neutral.replaceAll('"', '""')}"` : neutral;
}

/** Rows as CSV: cells escaped by {@link csvCell}, lines ended CRLF as RFC 4180 asks. */
export function toCsv(rows: readonly (readonly (string | number)[])[]): string {
  return rows.map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}
