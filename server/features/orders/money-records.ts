import type { EntityManager } from 'typeorm';
import { MoneyMovement, type MovementKind } from './money-movement.entity';
import { Order } from './order.entity';

/** A refund, transfer or reversal as the provider reported it, for one order. */
export interface ProviderMovement {
  kind: Exclude<MovementKind, 'charge'>;
  /** re_…, tr_… or trr_… */
  providerId: string;
  amountMinor: number;
  currency: string;
}

/**
 * Record money that moved at the provider, once: the unique provider id makes a second insert (a retried request
 * replayed by its idempotency key, or the webhook for the same object) change nothing. Only a first insert moves
 * the order's running totals, so they always equal the sums of the recorded rows. `order` must be held with a row
 * lock (lockOrder) in the same transaction; its fields are updated in place so a later save keeps them.
 * Answers whether this call recorded it.
 */
export async function recordMovement(m: EntityManager, order: Order, movement: ProviderMovement): Promise<boolean> {
  // A plain INSERT IGNORE: its affectedRows says whether this call recorded the row (0 for a duplicate).
  const result = (await m.query(
    'INSERT IGNORE INTO money_movements (order_id, kind, provider_id, amount_minor, currency) VALUES (?, ?, ?, ?, ?)',
    [order.id, movement.kind, movement.providerId, movement.amountMinor, movement.currency.toUpperCase()],
  )) as { affectedRows?: number };
  const inserted = result.affectedRows === 1;
  if (!inserted) return false;
  if (movement.kind === 'refund') order.refundedMinor += movement.amountMinor;
  // transferredMinor is what the seller holds now: transfers less their reversals.
  if (movement.kind === 'transfer') order.transferredMinor += movement.amountMinor;
  if (movement.kind === 'transfer_reversal')
    order.transferredMinor = Math.max(0, order.transferredMinor - movement.amountMinor);
  await m.update(Order, order.id, { refundedMinor: order.refundedMinor, transferredMinor: order.transferredMinor });
  return true;
}

/** How many movements of `kind` are recorded for an order (numbers the next idempotency key). */
export const countMovements = (m: EntityManager, orderId: number, kind: MovementKind): Promise<number> =>
  m.count(MoneyMovement, { where: { orderId, kind } });
