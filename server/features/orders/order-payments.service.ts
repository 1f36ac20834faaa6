import Stripe from 'stripe';
import type { EntityManager } from 'typeorm';
import { ORDER_STATE_LABELS } from '../../../shared/orders/states';
import { TEST_CARDS, type AuthenticatePaymentInput, type PayOrderInput } from '../../../shared/schemas/checkout';
import type { PaymentAttemptResult } from '../../../shared/types/orders';
import type { AppContext } from '../../app-context';
import type { Config } from '../../config';
import { conflict, forbidden, serviceUnavailable, validationFailed } from '../../http/errors';
import { loadOrderFor, type OrderViewer } from './order-access';
import { dueNow } from './order-due';
import { OrderPayment } from './order-payment.entity';
import type { Order } from './order.entity';
import { orderViewOf, presentPayment } from './order.presenter';
import { OUTCOME_WORDS, applyAnswer, outcomeOf, type ProviderAnswer } from './payment-outcomes';

/**
 * Whether the payments client talks to the local fake (its host is configured): only then are the provider's test
 * cards offered and the approval step answered by the server. A real deployment talks to the provider itself and
 * takes a payment method from the provider's card element in the browser instead.
 */
export const localPayments = (config: Config): boolean => Boolean(config.stripe.host);

/** One key per order, purpose and attempt: a retried request replays the first answer and never charges twice. */
export const idempotencyKey = (p: Pick<OrderPayment, 'orderId' | 'purpose' | 'attempt'>) =>
  `order-${p.orderId}-${p.purpose}-${p.attempt}`;

const UNREACHABLE =
  'We could not reach the card provider. Press Pay again: if the first try went through, you will not be charged twice.';

/** Lock the buyer's order and find (or start) the attempt to send; an attempt still waiting is reused. */
async function attemptToSend(m: EntityManager, viewer: OrderViewer, orderId: number) {
  const { order, role } = await loadOrderFor(m, viewer, orderId, { lock: true });
  if (role !== 'buyer') throw forbidden('Only the buyer pays for an order.');
  const due = dueNow(order);
  if (!due)
    throw conflict(
      'order_state',
      `This order is “${ORDER_STATE_LABELS[order.state]}”, so there is nothing to pay now.`,
    );
  const latest = await m.findOne(OrderPayment, {
    where: { orderId, purpose: due.purpose },
    order: { attempt: 'DESC' },
  });
  // 'started': its answer was lost or is still on its way, so the same key is sent again (the provider replays).
  if (latest && latest.status !== 'failed' && latest.status !== 'cancelled') return { order, payment: latest };
  const payment = await m.save(
    m.create(OrderPayment, {
      orderId,
      purpose: due.purpose,
      attempt: (latest?.attempt ?? 0) + 1,
      amountMinor: due.amountMinor,
      currency: order.currency,
      status: 'started',
      intentId: null,
      failureCode: null,
    }),
  );
  return { order, payment };
}

/** Create and confirm the attempt's intent at the provider with its idempotency key. */
async function sendAttempt(ctx: AppContext, order: Order, payment: OrderPayment, method: string) {
  try {
    const intent = await ctx.payments.paymentIntents.create(
      {
        amount: payment.amountMinor,
        currency: order.currency.toLowerCase(),
        payment_method: method,
        confirm: true,
        automatic_payment_methods: { enabled: true, allow_redirects: 'never' },
        metadata: { order_id: String(order.id), purpose: payment.purpose, attempt: String(payment.attempt) },
        transfer_group: `order-${order.id}`,
        description: `Benchwright order ${order.id}`,
      },
      { idempotencyKey: idempotencyKey(payment) },
    );
    return { kind: 'intent', intent } satisfies ProviderAnswer;
  } catch (error) {
    if (error instanceof Stripe.errors.StripeCardError) {
      const code = error.decline_code ?? error.code ?? 'card_declined';
      return { kind: 'declined', code, intentId: error.payment_intent?.id ?? null } satisfies ProviderAnswer;
    }
    if (error instanceof Stripe.errors.StripeIdempotencyError)
      throw conflict(
        'payment_in_progress',
        'Your last try with another card may still be going through. Press Pay again with the same card, or wait a minute and reload.',
      );
    if (error instanceof Stripe.errors.StripeInvalidRequestError && error.param === 'payment_method')
      throw validationFailed({ paymentMethod: 'That card cannot be used. Choose another.' });
    ctx.logger.warn({ err: error, orderId: order.id, attempt: payment.attempt }, 'payment request failed');
    throw serviceUnavailable(UNREACHABLE);
  }
}

/** Record the provider's answer under the order's lock and tell the buyer the outcome. */
async function finishAttempt(
  ctx: AppContext,
  viewer: OrderViewer,
  orderId: number,
  paymentId: number,
  answer: ProviderAnswer | null,
): Promise<PaymentAttemptResult> {
  return ctx.transaction(async (m) => {
    const { order, role } = await loadOrderFor(m, viewer, orderId, { lock: true });
    const payment = await m.findOneByOrFail(OrderPayment, { id: paymentId });
    if (answer) {
      applyAnswer(payment, answer);
      await m.save(payment);
    }
    const outcome = outcomeOf(payment);
    return {
      outcome,
      message: OUTCOME_WORDS[outcome],
      payment: presentPayment(payment),
      order: await orderViewOf(m, order, role),
    };
  });
}

/**
 * Pay what the order is due now (the full price, a deposit or a balance) with a payment method. A decline leaves
 * the order waiting for payment and a new attempt can follow; a retried request for an attempt whose answer was
 * lost sends the same idempotency key, so the provider replays its first answer instead of charging again.
 */
export async function requestPayment(
  ctx: AppContext,
  viewer: OrderViewer,
  orderId: number,
  input: PayOrderInput,
): Promise<PaymentAttemptResult> {
  if (localPayments(ctx.config) && !TEST_CARDS.some((card) => card.id === input.paymentMethod))
    throw validationFailed({ paymentMethod: 'Choose one of the test cards.' });
  const { order, payment } = await ctx.transaction((m) => attemptToSend(m, viewer, orderId));
  if (payment.status !== 'started') return finishAttempt(ctx, viewer, orderId, payment.id, null);
  const answer = await sendAttempt(ctx, order, payment, input.paymentMethod);
  return finishAttempt(ctx, viewer, orderId, payment.id, answer);
}

/**
 * The buyer's answer to their bank's approval step. Locally the fake plays the bank: the server tells it the
 * buyer's answer. With the real provider this step happens in the provider's window in the browser instead.
 */
export async function authenticatePayment(
  ctx: AppContext,
  viewer: OrderViewer,
  orderId: number,
  input: AuthenticatePaymentInput,
): Promise<PaymentAttemptResult> {
  if (!localPayments(ctx.config)) throw conflict('not_local', 'Approve the payment in the window your bank opened.');
  const payment = await ctx.transaction(async (m) => {
    const { role } = await loadOrderFor(m, viewer, orderId);
    if (role !== 'buyer') throw forbidden('Only the buyer pays for an order.');
    const waiting = await m.findOne(OrderPayment, {
      where: { orderId, status: 'needs_authentication' },
      order: { id: 'DESC' },
    });
    if (!waiting?.intentId) throw conflict('nothing_to_approve', 'No payment is waiting for your approval.');
    return waiting;
  });
  let answer: ProviderAnswer;
  try {
    await ctx.payments.rawRequest('POST', `/v1/payment_intents/${payment.intentId}/_fake/authenticate`, {
      outcome: input.outcome,
    });
    answer = { kind: 'intent', intent: await ctx.payments.paymentIntents.retrieve(payment.intentId!) };
  } catch (error) {
    ctx.logger.warn({ err: error, orderId }, 'payment approval not passed on');
    throw serviceUnavailable(UNREACHABLE);
  }
  return finishAttempt(ctx, viewer, orderId, payment.id, answer);
}
