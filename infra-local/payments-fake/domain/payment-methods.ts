import { noSuchParam } from '../errors';
import type { ApiContext } from '../http/context';
import { newId, randomToken } from '../ids';
import type { PaymentMethod } from '../types';
import { TEST_CARDS, type TestCard } from './test-cards';

/**
 * Resolves a `payment_method` parameter: a documented test id (`pm_card_visa`) creates a new
 * PaymentMethod like Stripe does; a stored `pm_…` id is reused; anything else is refused.
 */
export function resolvePaymentMethod(ctx: ApiContext, id: string, param = 'payment_method'): PaymentMethod {
  const stored = ctx.store.state.paymentMethods[id];
  if (stored) return stored;
  const card = TEST_CARDS[id];
  if (!card) throw noSuchParam('PaymentMethod', id, param);
  const paymentMethod: PaymentMethod = {
    id: newId('pm'),
    object: 'payment_method',
    billing_details: { address: null, email: null, name: null, phone: null },
    card: {
      brand: card.brand,
      country: card.country,
      exp_month: 12,
      exp_year: new Date().getUTCFullYear() + 3,
      fingerprint: randomToken(16),
      funding: card.funding,
      last4: card.last4,
    },
    created: ctx.now(),
    customer: null,
    livemode: false,
    metadata: {},
    type: 'card',
  };
  ctx.store.state.paymentMethods[paymentMethod.id] = paymentMethod;
  ctx.store.state.paymentMethodOrigins[paymentMethod.id] = id;
  return paymentMethod;
}

/** The test card behaviour behind a stored PaymentMethod. */
export function testCardOf(ctx: ApiContext, paymentMethod: PaymentMethod): TestCard {
  const origin = ctx.store.state.paymentMethodOrigins[paymentMethod.id];
  const card = origin ? TEST_CARDS[origin] : undefined;
  if (!card) throw new Error(`payment method ${paymentMethod.id} has no known test card behind it`);
  return card;
}
