import type { OrderState } from '../../../shared/orders/states';
import type { PaymentPurpose } from './order-payment.entity';
import type { Order } from './order.entity';

/** The states in which the buyer owes a card payment, and what that payment is for. */
const DUE_PURPOSE: Partial<Record<OrderState, PaymentPurpose>> = {
  awaiting_payment: 'full',
  awaiting_deposit: 'deposit',
  awaiting_balance: 'balance',
};

/** What the buyer must pay now, or null when nothing is due in the order's state. */
export function dueNow(
  order: Pick<Order, 'state' | 'totalMinor' | 'depositMinor'>,
): { purpose: PaymentPurpose; amountMinor: number } | null {
  const purpose = DUE_PURPOSE[order.state];
  if (!purpose) return null;
  return { purpose, amountMinor: amountFor(order, purpose) };
}

/** The amount of a payment for `purpose`: the whole total, the deposit, or the rest after the deposit. */
export function amountFor(order: Pick<Order, 'totalMinor' | 'depositMinor'>, purpose: PaymentPurpose): number {
  if (purpose === 'deposit') return order.depositMinor;
  if (purpose === 'balance') return order.totalMinor - order.depositMinor;
  return order.totalMinor;
}
