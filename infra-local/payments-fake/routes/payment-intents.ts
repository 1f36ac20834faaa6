import { Router } from 'express';
import { checkChargeAmount, checkCurrency } from '../domain/amounts';
import { resolvePaymentMethod } from '../domain/payment-methods';
import {
  CANCELABLE,
  CONFIRMABLE,
  checkRedirectRequirement,
  confirmIntent,
  finishAuthentication,
  unexpectedState,
} from '../domain/payment-flow';
import { invalidRequest, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { newId, randomToken } from '../ids';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { PaymentIntent } from '../types';

const EXPANDABLE = ['latest_charge', 'payment_method'] as const;
const UPDATABLE_STATUSES = ['requires_payment_method', 'requires_confirmation', 'requires_action'];

function findIntent(ctx: ApiContext): PaymentIntent {
  const id = ctx.path.id ?? '';
  const intent = ctx.store.state.paymentIntents[id];
  if (!intent) throw notFound('payment_intent', id, 'intent');
  return intent;
}

function create(ctx: ApiContext): PaymentIntent {
  const p = new Params(ctx.raw, [
    'amount',
    'currency',
    'metadata',
    'payment_method',
    'confirm',
    'capture_method',
    'transfer_group',
    'description',
    'automatic_payment_methods',
    'payment_method_types',
    'return_url',
    'receipt_email',
  ]);
  const amount = p.requiredInt('amount');
  const currency = p.currency();
  checkCurrency(currency);
  checkChargeAmount(amount, currency);
  const captureMethod =
    p.oneOf('capture_method', ['automatic', 'automatic_async', 'manual'] as const) ?? 'automatic_async';
  if (captureMethod === 'manual') {
    throw invalidRequest(
      'capture_method=manual (separate authorisation and capture) is not modelled by the payments fake.',
      {
        param: 'capture_method',
      },
    );
  }
  const apmParams = p.object('automatic_payment_methods', ['enabled', 'allow_redirects']);
  const paymentMethodTypes = p.stringArray('payment_method_types');
  if (apmParams && paymentMethodTypes) {
    throw invalidRequest(
      'You may only specify one of these parameters: automatic_payment_methods, payment_method_types.',
      {
        code: 'parameters_exclusive',
        param: 'automatic_payment_methods',
      },
    );
  }
  if (paymentMethodTypes && paymentMethodTypes.some((type) => type !== 'card')) {
    throw invalidRequest('The payments fake supports only payment_method_types[]=card.', {
      param: 'payment_method_types',
    });
  }
  let automaticPaymentMethods: PaymentIntent['automatic_payment_methods'] = null;
  if (apmParams) {
    const enabled = apmParams.bool('enabled');
    if (enabled === undefined) {
      throw invalidRequest('Missing required param: automatic_payment_methods[enabled].', {
        param: 'automatic_payment_methods[enabled]',
        code: 'parameter_missing',
      });
    }
    const allowRedirects = apmParams.oneOf('allow_redirects', ['always', 'never'] as const);
    automaticPaymentMethods = enabled ? { enabled, allow_redirects: allowRedirects ?? 'always' } : { enabled };
  } else if (!paymentMethodTypes) {
    // Since API version 2023-08-16 automatic payment methods are on unless payment_method_types is given.
    automaticPaymentMethods = { enabled: true, allow_redirects: 'always' };
  }
  const confirm = p.bool('confirm') ?? false;
  const returnUrl = p.string('return_url');
  if (returnUrl !== undefined && !confirm) {
    throw invalidRequest('return_url can only be passed when confirm=true.', { param: 'return_url' });
  }
  const paymentMethodId = p.string('payment_method');
  if (confirm && !paymentMethodId) {
    throw invalidRequest(
      "You cannot confirm this PaymentIntent because it's missing a payment method. To confirm the PaymentIntent, provide a `payment_method`.",
      { code: 'payment_intent_unexpected_state', param: 'payment_method' },
    );
  }
  const metadata = p.metadata() ?? {};
  const description = p.nullableString('description') ?? null;
  const transferGroup = p.nullableString('transfer_group') ?? null;
  const receiptEmail = p.nullableString('receipt_email') ?? null;
  const paymentMethod = paymentMethodId ? resolvePaymentMethod(ctx, paymentMethodId) : null;

  const id = newId('pi');
  const intent: PaymentIntent = {
    id,
    object: 'payment_intent',
    amount,
    amount_capturable: 0,
    amount_received: 0,
    application: null,
    application_fee_amount: null,
    automatic_payment_methods: automaticPaymentMethods,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: captureMethod,
    client_secret: `${id}_secret_${randomToken(25)}`,
    confirmation_method: 'automatic',
    created: ctx.now(),
    currency,
    customer: null,
    description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata,
    next_action: null,
    on_behalf_of: null,
    payment_method: paymentMethod?.id ?? null,
    payment_method_types: paymentMethodTypes ?? ['card'],
    receipt_email: receiptEmail,
    setup_future_usage: null,
    shipping: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: paymentMethod ? 'requires_confirmation' : 'requires_payment_method',
    transfer_data: null,
    transfer_group: transferGroup,
  };
  if (confirm) checkRedirectRequirement(intent, returnUrl);
  ctx.store.state.paymentIntents[id] = intent;
  ctx.emit('payment_intent.created', intent);
  if (confirm) confirmIntent(ctx, intent);
  return intent;
}

function retrieve(ctx: ApiContext): PaymentIntent {
  new Params(ctx.raw, ['client_secret']);
  return findIntent(ctx);
}

function update(ctx: ApiContext): PaymentIntent {
  const intent = findIntent(ctx);
  const p = new Params(ctx.raw, [
    'metadata',
    'payment_method',
    'description',
    'amount',
    'currency',
    'transfer_group',
    'receipt_email',
  ]);
  const changesPayment = p.has('amount') || p.has('currency') || p.has('payment_method');
  if (changesPayment && !UPDATABLE_STATUSES.includes(intent.status)) {
    throw unexpectedState(
      intent,
      `You cannot update this PaymentIntent's amount, currency or payment_method because it has a status of ${intent.status}.`,
    );
  }
  const currency = p.has('currency') ? p.currency() : intent.currency;
  checkCurrency(currency);
  const amount = p.int('amount') ?? intent.amount;
  checkChargeAmount(amount, currency);
  const metadata = p.metadata(intent.metadata);
  const description = p.nullableString('description');
  const transferGroup = p.nullableString('transfer_group');
  const receiptEmail = p.nullableString('receipt_email');
  const paymentMethodId = p.nullableString('payment_method');
  const paymentMethod =
    paymentMethodId === undefined || paymentMethodId === null
      ? paymentMethodId
      : resolvePaymentMethod(ctx, paymentMethodId);

  intent.amount = amount;
  intent.currency = currency;
  if (metadata !== undefined) intent.metadata = metadata;
  if (description !== undefined) intent.description = description;
  if (transferGroup !== undefined) intent.transfer_group = transferGroup;
  if (receiptEmail !== undefined) intent.receipt_email = receiptEmail;
  if (paymentMethod !== undefined) {
    intent.payment_method = paymentMethod?.id ?? null;
    intent.next_action = null;
    intent.status = paymentMethod ? 'requires_confirmation' : 'requires_payment_method';
  }
  return intent;
}

function confirm(ctx: ApiContext): PaymentIntent {
  const intent = findIntent(ctx);
  const p = new Params(ctx.raw, ['payment_method', 'return_url']);
  if (intent.status === 'succeeded') {
    throw unexpectedState(
      intent,
      'You cannot confirm this PaymentIntent because it has already succeeded after being previously confirmed.',
    );
  }
  if (!CONFIRMABLE.includes(intent.status)) {
    throw unexpectedState(
      intent,
      `You cannot confirm this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be confirmed: ${CONFIRMABLE.join(', ')}.`,
    );
  }
  const returnUrl = p.string('return_url');
  const paymentMethodId = p.string('payment_method');
  checkRedirectRequirement(intent, returnUrl);
  if (paymentMethodId) intent.payment_method = resolvePaymentMethod(ctx, paymentMethodId).id;
  confirmIntent(ctx, intent);
  return intent;
}

function cancel(ctx: ApiContext): PaymentIntent {
  const intent = findIntent(ctx);
  const p = new Params(ctx.raw, ['cancellation_reason']);
  const reason = p.oneOf('cancellation_reason', [
    'duplicate',
    'fraudulent',
    'requested_by_customer',
    'abandoned',
  ] as const);
  if (!CANCELABLE.includes(intent.status)) {
    throw unexpectedState(
      intent,
      `You cannot cancel this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be canceled: ${CANCELABLE.join(', ')}.`,
    );
  }
  intent.status = 'canceled';
  intent.canceled_at = ctx.now();
  intent.cancellation_reason = reason ?? null;
  intent.next_action = null;
  ctx.emit('payment_intent.canceled', intent);
  return intent;
}

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS]);
  return paginate(newestFirst(ctx.store.state.paymentIntents), p, '/v1/payment_intents', 'payment_intent');
}

/** Fake-only: finish a 3-D Secure challenge that Stripe.js would show in a browser. */
function fakeAuthenticate(ctx: ApiContext): PaymentIntent {
  const intent = findIntent(ctx);
  const p = new Params(ctx.raw, ['outcome']);
  const outcome = p.oneOf('outcome', ['success', 'failure'] as const);
  if (!outcome)
    throw invalidRequest('Missing required param: outcome.', { param: 'outcome', code: 'parameter_missing' });
  if (intent.status !== 'requires_action') {
    throw unexpectedState(
      intent,
      `This PaymentIntent has a status of ${intent.status}; only requires_action can be authenticated.`,
    );
  }
  finishAuthentication(ctx, intent, outcome === 'success');
  return intent;
}

export function paymentIntentRoutes(runtime: Runtime): Router {
  const router = Router();
  const expandable = { expandable: EXPANDABLE };
  router.post('/v1/payment_intents', apiRoute(runtime, create, expandable));
  router.get('/v1/payment_intents', apiRoute(runtime, list, { expandable: EXPANDABLE.map((f) => `data.${f}`) }));
  router.get('/v1/payment_intents/:id', apiRoute(runtime, retrieve, expandable));
  router.post('/v1/payment_intents/:id', apiRoute(runtime, update, expandable));
  router.post('/v1/payment_intents/:id/confirm', apiRoute(runtime, confirm, expandable));
  router.post('/v1/payment_intents/:id/cancel', apiRoute(runtime, cancel, expandable));
  router.post('/v1/payment_intents/:id/_fake/authenticate', apiRoute(runtime, fakeAuthenticate, expandable));
  return router;
}
