import type { CreateOrderInput } from '@shared/schemas/checkout';
import type { CheckoutPreview, OrderView, PaymentAttemptResult } from '@shared/types/orders';
import { http } from './http';

/** What the module would cost for each way it can reach the buyer, before they give any detail. */
export function getCheckout(listingId: number, signal?: AbortSignal): Promise<CheckoutPreview> {
  return http.get<CheckoutPreview>('/api/orders/checkout', { listing: listingId }, signal);
}

/** Start buying: reserves the module for the buyer and answers the new (or already open) order. */
export function createOrder(input: CreateOrderInput): Promise<OrderView> {
  return http.post<OrderView>('/api/orders', input);
}

/** An order as the signed-in person may see it. */
export function getOrder(id: number, signal?: AbortSignal): Promise<OrderView> {
  return http.get<OrderView>(`/api/orders/${id}`, undefined, signal);
}

/** Pay what the order is due now with a payment method (locally: one of the test cards). */
export function payOrder(id: number, paymentMethod: string): Promise<PaymentAttemptResult> {
  return http.post<PaymentAttemptResult>(`/api/orders/${id}/payments`, { paymentMethod });
}

/** Answer the bank's approval step (locally the server passes the answer on to the payments fake). */
export function approvePayment(id: number, outcome: 'success' | 'failure'): Promise<PaymentAttemptResult> {
  return http.post<PaymentAttemptResult>(`/api/orders/${id}/payments/authenticate`, { outcome });
}

/** Give up an unpaid order: the module is offered to others at once. */
export function giveUpOrder(id: number): Promise<OrderView> {
  return http.post<OrderView>(`/api/orders/${id}/give-up`);
}
