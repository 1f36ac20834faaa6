import { invalidRequest } from '../errors';

/** Stripe's minimum charge amounts in minor units (https://docs.stripe.com/currencies#minimum-and-maximum-charge-amounts). */
const MINIMUM_AMOUNTS: Readonly<Record<string, number>> = { gbp: 30, eur: 50, usd: 50 };
const MAXIMUM_AMOUNT = 99_999_999;

export const SUPPORTED_CURRENCIES = Object.keys(MINIMUM_AMOUNTS);

export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(amount / 100);
  } catch {
    return `${amount} ${currency}`;
  }
}

export function checkCurrency(currency: string, param = 'currency'): void {
  if (!SUPPORTED_CURRENCIES.includes(currency)) {
    throw invalidRequest(
      `Invalid currency: ${currency}. The payments fake supports ${SUPPORTED_CURRENCIES.join(', ')}.`,
      { param },
    );
  }
}

export function checkChargeAmount(amount: number, currency: string, param = 'amount'): void {
  const minimum = MINIMUM_AMOUNTS[currency] ?? 50;
  if (amount < minimum) {
    throw invalidRequest(`Amount must be at least ${formatMoney(minimum, currency)} ${currency}`, {
      param,
      code: 'amount_too_small',
    });
  }
  if (amount > MAXIMUM_AMOUNT) {
    throw invalidRequest(`Amount must be no more than ${formatMoney(MAXIMUM_AMOUNT, currency)}`, {
      param,
      code: 'amount_too_large',
    });
  }
}

export function checkPositiveAmount(amount: number, param = 'amount'): void {
  if (amount <= 0) throw invalidRequest('This value must be greater than or equal to 1.', { param });
}
