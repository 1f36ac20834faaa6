import type { PaymentError, PaymentIntent, PaymentMethod } from './types';

export type StripeErrorType = 'api_error' | 'card_error' | 'idempotency_error' | 'invalid_request_error';

/** The body Stripe returns under `error`. */
export interface StripeErrorBody {
  type: StripeErrorType;
  message: string;
  code?: string;
  decline_code?: string;
  doc_url?: string;
  param?: string;
  charge?: string;
  payment_intent?: PaymentIntent;
  payment_method?: PaymentMethod;
}

/** Thrown by handlers; rendered as Stripe's error object with the given HTTP status. */
export class StripeApiError extends Error {
  readonly status: number;
  readonly body: StripeErrorBody;

  constructor(status: number, body: StripeErrorBody) {
    super(body.message);
    this.name = 'StripeApiError';
    this.status = status;
    this.body = body.code && !body.doc_url ? { ...body, doc_url: docUrl(body.code) } : body;
  }
}

export function docUrl(code: string): string {
  return `https://stripe.com/docs/error-codes/${code.replace(/_/g, '-')}`;
}

export function invalidRequest(
  message: string,
  extra: { param?: string; code?: string; payment_intent?: PaymentIntent } = {},
): StripeApiError {
  return new StripeApiError(400, { type: 'invalid_request_error', message, ...extra });
}

/** A parameter names an object that does not exist (400, like Stripe). */
export function noSuchParam(kind: string, id: string, param: string): StripeApiError {
  return invalidRequest(`No such ${kind}: '${id}'`, { param, code: 'resource_missing' });
}

/** The object in the URL does not exist (404, like Stripe). */
export function notFound(kind: string, id: string, param = 'id'): StripeApiError {
  return new StripeApiError(404, {
    type: 'invalid_request_error',
    code: 'resource_missing',
    message: `No such ${kind}: '${id}'`,
    param,
  });
}

export function unauthenticated(message: string): StripeApiError {
  return new StripeApiError(401, { type: 'invalid_request_error', message });
}

export function idempotencyError(message: string): StripeApiError {
  return new StripeApiError(400, { type: 'idempotency_error', message });
}

/** A card decline: HTTP 402 with the failed intent and charge attached, as Stripe does. */
export function cardError(paymentError: PaymentError, paymentIntent: PaymentIntent): StripeApiError {
  return new StripeApiError(402, {
    type: 'card_error',
    code: paymentError.code,
    ...(paymentError.decline_code ? { decline_code: paymentError.decline_code } : {}),
    doc_url: paymentError.doc_url,
    message: paymentError.message,
    ...(paymentError.charge ? { charge: paymentError.charge } : {}),
    payment_intent: paymentIntent,
    ...(paymentError.payment_method ? { payment_method: paymentError.payment_method } : {}),
  });
}

export function unrecognizedUrl(method: string, path: string): StripeApiError {
  return new StripeApiError(404, {
    type: 'invalid_request_error',
    message: `Unrecognized request URL (${method}: ${path}). This payments fake models only the endpoints listed in infra-local/payments-fake/README.md.`,
  });
}
