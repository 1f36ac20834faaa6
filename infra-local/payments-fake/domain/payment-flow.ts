import { cardError, docUrl, invalidRequest, type StripeApiError } from '../errors';
import type { ApiContext } from '../http/context';
import type { PaymentIntent, PaymentIntentStatus, PaymentMethod } from '../types';
import { adjustBalance } from './balance';
import { createCharge } from './charges';
import { testCardOf } from './payment-methods';

export const CONFIRMABLE: readonly PaymentIntentStatus[] = [
  'requires_payment_method',
  'requires_confirmation',
  'requires_action',
];

export const CANCELABLE: readonly PaymentIntentStatus[] = [
  'requires_payment_method',
  'requires_capture',
  'requires_confirmation',
  'requires_action',
  'processing',
];

export function unexpectedState(intent: PaymentIntent, message: string): StripeApiError {
  return invalidRequest(message, {
    code: 'payment_intent_unexpected_state',
    payment_intent: structuredClone(intent),
  });
}

/**
 * Server-side confirmation with automatic payment methods that allow redirects needs a
 * `return_url`, exactly as in Stripe; `automatic_payment_methods[allow_redirects]=never` avoids it.
 */
export function checkRedirectRequirement(intent: PaymentIntent, returnUrl: string | undefined): void {
  const apm = intent.automatic_payment_methods;
  if (apm?.enabled && apm.allow_redirects !== 'never' && !returnUrl) {
    throw invalidRequest(
      'This PaymentIntent is configured to accept payment methods enabled in your Dashboard, some of which may require a full page redirect to succeed. If you do not want to accept redirect-based payment methods, set `automatic_payment_methods[enabled]` to `true` and `automatic_payment_methods[allow_redirects]` to `never` when creating Setup Intents and Payment Intents.',
      { param: 'return_url' },
    );
  }
}

function storedPaymentMethod(ctx: ApiContext, intent: PaymentIntent): PaymentMethod {
  const paymentMethod = intent.payment_method ? ctx.store.state.paymentMethods[intent.payment_method] : undefined;
  if (!paymentMethod) {
    throw invalidRequest(
      "You cannot confirm this PaymentIntent because it's missing a payment method. To confirm the PaymentIntent, provide a `payment_method`.",
      { code: 'payment_intent_unexpected_state', param: 'payment_method', payment_intent: structuredClone(intent) },
    );
  }
  return paymentMethod;
}

/** Runs one confirmation attempt; a decline throws Stripe's 402 card error after updating state. */
export function confirmIntent(ctx: ApiContext, intent: PaymentIntent): void {
  const paymentMethod = storedPaymentMethod(ctx, intent);
  const { outcome } = testCardOf(ctx, paymentMethod);
  switch (outcome.kind) {
    case 'succeed':
      succeedIntent(ctx, intent, paymentMethod);
      return;
    case 'authenticate':
      intent.status = 'requires_action';
      intent.next_action = {
        type: 'use_stripe_sdk',
        use_stripe_sdk: {
          type: 'three_d_secure_redirect',
          stripe_js: `${ctx.baseUrl}/v1/payment_intents/${intent.id}/_fake/authenticate`,
          source: `src_${intent.id.slice(3)}`,
        },
      };
      intent.last_payment_error = null;
      ctx.emit('payment_intent.requires_action', intent);
      return;
    case 'decline': {
      const charge = createCharge(ctx, intent, paymentMethod, {
        succeeded: false,
        declineCode: outcome.declineCode,
        message: outcome.message,
      });
      intent.status = 'requires_payment_method';
      intent.payment_method = null;
      intent.next_action = null;
      intent.latest_charge = charge.id;
      intent.last_payment_error = {
        type: 'card_error',
        code: 'card_declined',
        decline_code: outcome.declineCode,
        message: outcome.message,
        doc_url: docUrl('card_declined'),
        charge: charge.id,
        payment_method: structuredClone(paymentMethod),
        payment_method_type: 'card',
      };
      ctx.emit('charge.failed', charge);
      ctx.emit('payment_intent.payment_failed', intent);
      throw cardError(intent.last_payment_error, structuredClone(intent));
    }
  }
}

export function succeedIntent(ctx: ApiContext, intent: PaymentIntent, paymentMethod: PaymentMethod): void {
  const charge = createCharge(ctx, intent, paymentMethod, { succeeded: true });
  intent.status = 'succeeded';
  intent.amount_received = intent.amount;
  intent.latest_charge = charge.id;
  intent.last_payment_error = null;
  intent.next_action = null;
  adjustBalance(ctx.store, intent.currency, intent.amount);
  ctx.emit('charge.succeeded', charge);
  ctx.emit('payment_intent.succeeded', intent);
}

/** Completes a pending 3-D Secure challenge (fake-only; Stripe.js does this in a real browser). */
export function finishAuthentication(ctx: ApiContext, intent: PaymentIntent, success: boolean): void {
  const paymentMethod = storedPaymentMethod(ctx, intent);
  if (success) {
    succeedIntent(ctx, intent, paymentMethod);
    return;
  }
  intent.status = 'requires_payment_method';
  intent.payment_method = null;
  intent.next_action = null;
  intent.last_payment_error = {
    type: 'invalid_request_error',
    code: 'payment_intent_authentication_failure',
    message:
      'The provided PaymentMethod has failed authentication. You can provide payment_method_data or a new PaymentMethod to attempt to fulfill this PaymentIntent again.',
    doc_url: docUrl('payment_intent_authentication_failure'),
    payment_method: structuredClone(paymentMethod),
    payment_method_type: 'card',
  };
  ctx.emit('payment_intent.payment_failed', intent);
}
