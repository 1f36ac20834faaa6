/**
 * Stripe's documented test PaymentMethods (https://docs.stripe.com/testing) that the fake
 * understands. Passing one of these ids creates a new `pm_…` PaymentMethod, as Stripe does.
 */
export type CardOutcome =
  { kind: 'succeed' } | { kind: 'decline'; declineCode: string; message: string } | { kind: 'authenticate' };

export interface TestCard {
  brand: string;
  last4: string;
  funding: string;
  country: string;
  outcome: CardOutcome;
}

export const TEST_CARDS: Readonly<Record<string, TestCard>> = {
  pm_card_visa: { brand: 'visa', last4: '4242', funding: 'credit', country: 'US', outcome: { kind: 'succeed' } },
  pm_card_mastercard: {
    brand: 'mastercard',
    last4: '4444',
    funding: 'credit',
    country: 'US',
    outcome: { kind: 'succeed' },
  },
  pm_card_chargeDeclined: {
    brand: 'visa',
    last4: '0002',
    funding: 'credit',
    country: 'US',
    outcome: { kind: 'decline', declineCode: 'generic_decline', message: 'Your card was declined.' },
  },
  pm_card_chargeDeclinedInsufficientFunds: {
    brand: 'visa',
    last4: '9995',
    funding: 'credit',
    country: 'US',
    outcome: { kind: 'decline', declineCode: 'insufficient_funds', message: 'Your card has insufficient funds.' },
  },
  pm_card_authenticationRequired: {
    brand: 'visa',
    last4: '3184',
    funding: 'credit',
    country: 'US',
    outcome: { kind: 'authenticate' },
  },
};
