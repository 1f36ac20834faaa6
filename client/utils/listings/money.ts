/** Prices are held in whole pence (or cent); people type and read them in pounds (or euros). */

/** 15000 → "150", 14950 → "149.50"; empty for no amount. */
export function moneyForInput(minor: number | null | undefined): string {
  if (minor === null || minor === undefined) return '';
  return minor % 100 === 0 ? String(minor / 100) : (minor / 100).toFixed(2);
}

/** What a typed money box holds once read. */
export type TypedMoney = { ok: true; value: number | null } | { ok: false; message: string };

/** Read "150", "£149.50" or "1,200" into pence; empty is `null`. */
export function readTypedMoney(text: string): TypedMoney {
  const cleaned = text
    .trim()
    .replace(/^[£€]/, '')
    .replace(/,(?=\d{3}(\D|$))/g, '')
    .trim();
  if (cleaned === '') return { ok: true, value: null };
  if (!/^\d+(\.\d{1,2})?$/.test(cleaned))
    return { ok: false, message: `Write the amount in pounds with at most two decimals, e.g. 150 or 149.50.` };
  const [whole, part = ''] = cleaned.split('.');
  return { ok: true, value: Number(whole) * 100 + Number(part.padEnd(2, '0')) };
}
