import type { Store } from '../store';
import type { Balance, BalanceAmount } from '../types';

/**
 * The platform's balance. Funds from a successful charge are available at once (no pending
 * period, no Stripe fees); refunds and transfers take funds out, transfer reversals put them back.
 */
export function available(store: Store, currency: string): number {
  return store.state.balance[currency] ?? 0;
}

export function adjustBalance(store: Store, currency: string, delta: number): void {
  store.state.balance[currency] = available(store, currency) + delta;
}

export function balanceObject(store: Store): Balance {
  const currencies = [...new Set(['gbp', ...Object.keys(store.state.balance)])].sort();
  const amounts = (pick: (currency: string) => number): BalanceAmount[] =>
    currencies.map((currency) => ({ amount: pick(currency), currency, source_types: { card: pick(currency) } }));
  return {
    object: 'balance',
    available: amounts((currency) => available(store, currency)),
    connect_reserved: currencies.map((currency) => ({ amount: 0, currency })),
    livemode: false,
    pending: amounts(() => 0),
  };
}
