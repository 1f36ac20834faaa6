import dayjs from 'dayjs';
import 'dayjs/locale/en-gb';

dayjs.locale('en-gb');

const numberFormat = new Intl.NumberFormat('en-GB');

/** A date as people in Britain write it: "7 Mar 2026". Empty text for no date. */
export function formatDate(iso: string | null | undefined): string {
  return iso ? dayjs(iso).format('D MMM YYYY') : '';
}

/** A date and time: "7 Mar 2026, 14:05" (24-hour clock). Empty text for no date. */
export function formatDateTime(iso: string | null | undefined): string {
  return iso ? dayjs(iso).format('D MMM YYYY, HH:mm') : '';
}

/** Money held as integer minor units (pence), shown in its currency: 12345, 'GBP' → "£123.45". */
export function formatMoney(minorUnits: number, currency = 'GBP'): string {
  const format = new Intl.NumberFormat('en-GB', { style: 'currency', currency });
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minorUnits / 10 ** digits);
}

/** A count with thousands separators: 12345 → "12,345". */
export function formatCount(value: number): string {
  return numberFormat.format(value);
}

/** A wait in words, rounded up: 45 → "45 seconds", 90 → "2 minutes", 3600 → "1 hour". */
export function formatWait(seconds: number): string {
  const unit = (count: number, word: string) => `${count} ${word}${count === 1 ? '' : 's'}`;
  if (seconds < 60) return unit(Math.max(1, Math.ceil(seconds)), 'second');
  if (seconds < 3600) return unit(Math.ceil(seconds / 60), 'minute');
  return unit(Math.ceil(seconds / 3600), 'hour');
}
