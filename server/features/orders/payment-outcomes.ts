import type Stripe from 'stripe';
import type { PaymentOutcome } from '../../../shared/types/orders';
import type { OrderPayment } from './order-payment.entity';

/** What the buyer reads for each outcome of a payment attempt. */
export const OUTCOME_WORDS: Record<PaymentOutcome, string> = {
  processing: 'Payment taken. Waiting for the card provider to confirm it; this takes a few seconds.',
  succeeded: 'Paid. The money is held by Benchwright until you have the module.',
  declined: 'Your card was declined. Nothing was taken. Try another card.',
  insufficient_funds: 'Your card does not have enough money for this. Nothing was taken. Try another card.',
  needs_authentication: 'Your bank asks you to approve this payment before it goes through.',
  authentication_failed: 'The payment was not approved, so nothing was taken. Try again or use another card.',
};

/** What the provider answered to an attempt: an intent, or a card decline (which carries no intent object here). */
export type ProviderAnswer =
  { kind: 'intent'; intent: Stripe.PaymentIntent } | { kind: 'declined'; code: string; intentId: string | null };

/** A failed payment's outcome from its stored failure code. */
function failedOutcome(code: string | null): PaymentOutcome {
  if (code === 'insufficient_funds') return 'insufficient_funds';
  if (code === 'payment_intent_authentication_failure') return 'authentication_failed';
  return 'declined';
}

/**
 * Record what the provider answered on the payment row, unless the payment's verified event got there first
 * (a succeeded or failed row is never changed back). A success is not recorded here: the order moves only on the
 * verified `payment_intent.succeeded` event, so until then the payment stays 'started' and the buyer waits.
 */
export function applyAnswer(payment: OrderPayment, answer: ProviderAnswer): void {
  if (payment.status === 'succeeded' || payment.status === 'failed' || payment.status === 'cancelled') return;
  if (answer.kind === 'declined') {
    payment.status = 'failed';
    payment.failureCode = answer.code;
    payment.intentId ??= answer.intentId;
    return;
  }
  const { intent } = answer;
  payment.intentId = intent.id;
  if (intent.status === 'requires_action') payment.status = 'needs_authentication';
  else if (intent.status === 'requires_payment_method') {
    payment.status = 'failed';
    payment.failureCode = intent.last_payment_error?.decline_code ?? intent.last_payment_error?.code ?? 'card_declined';
  } else if (intent.status === 'canceled') payment.status = 'cancelled';
  // Approved, or paid at once: it waits for the verified event like any other payment.
  else payment.status = 'started';
}

/** The outcome a payment row stands for now. */
export function outcomeOf(payment: OrderPayment): PaymentOutcome {
  switch (payment.status) {
    case 'succeeded':
      return 'succeeded';
    case 'needs_authentication':
      return 'needs_authentication';
    case 'failed':
    case 'cancelled':
      return failedOutcome(payment.failureCode);
    default:
      return 'processing';
  }
}
