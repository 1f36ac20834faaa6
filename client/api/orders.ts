import type { OrderSide, SettleProblemInput } from '@shared/schemas/order-aftercare';
import type { OrderProblemSummary, OrderSummary } from '@shared/types/order-aftercare';
import type { OrderView } from '@shared/types/orders';
import type { Page } from '@shared/types/user';
import { http } from './http';

type Moved = Promise<{ order: OrderView }>;

/** The signed-in person's purchases or sales, newest first. */
export function listOrders(side: OrderSide, page = 1, signal?: AbortSignal): Promise<Page<OrderSummary>> {
  return http.get<Page<OrderSummary>>('/api/orders', { side, page }, signal);
}

/** Where the browser downloads an order's receipt (a PDF made by the server for the viewer's side). */
export const receiptUrl = (orderId: number) => `/api/orders/${orderId}/receipt.pdf`;

/** The seller has sent the module (a note such as a tracking number is optional). */
export const sendOrder = (id: number, note?: string): Moved =>
  http.post(`/api/orders/${id}/send`, note ? { note } : {});

/** The seller says the module is ready to collect. */
export const offerCollection = (id: number, note?: string): Moved =>
  http.post(`/api/orders/${id}/offer-collection`, note ? { note } : {});

/** The buyer confirms it arrived as described; the seller's payout falls due. */
export const confirmReceipt = (id: number): Moved => http.post(`/api/orders/${id}/confirm-receipt`, {});

/** Either side cancels before hand-over; the buyer gets everything back. */
export const cancelOrder = (id: number, reason?: string): Moved =>
  http.post(`/api/orders/${id}/cancel`, reason ? { reason } : {});

/** Either side reports a problem; a moderator settles it. */
export const raiseProblem = (id: number, reason: string): Moved => http.post(`/api/orders/${id}/problem`, { reason });

/** Orders with a problem raised, oldest first (moderators). */
export async function openProblems(signal?: AbortSignal): Promise<OrderProblemSummary[]> {
  return (await http.get<{ problems: OrderProblemSummary[] }>('/api/order-problems', undefined, signal)).problems;
}

/** A moderator's decision on a problem. */
export const settleProblem = (id: number, input: SettleProblemInput): Moved =>
  http.post(`/api/order-problems/${id}/settle`, input);
