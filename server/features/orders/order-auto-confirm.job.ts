import { In, LessThanOrEqual } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { OrderJob } from './order-jobs';
import { settleOrderMoney } from './order-money';
import { autoConfirm } from './order-moves.service';
import { Order } from './order.entity';

const BATCH = 20;

/** Confirm receipt of handed-over orders whose confirmation period has run out with no problem raised. */
export async function autoConfirmDueOrders(ctx: AppContext, now = new Date()): Promise<number> {
  const due = await ctx.dataSource.getRepository(Order).find({
    select: { id: true },
    where: { state: In(['sent', 'ready_to_collect']), confirmBy: LessThanOrEqual(now) },
    order: { confirmBy: 'ASC' },
    take: BATCH,
  });
  let confirmed = 0;
  for (const { id } of due) {
    try {
      if (await autoConfirm(ctx, id, now)) confirmed += 1;
    } catch (error) {
      ctx.logger.warn({ err: error, orderId: id }, 'receipt not confirmed automatically yet');
    }
  }
  return confirmed;
}

/**
 * Orders whose money is not yet where their state says: a refund still owed (cancelled, refunded, or part refunded
 * and received), or a payout due to a seller whose account is ready. A failed provider call after a move leaves
 * such an order behind; this finds it and tries again (every step is idempotent).
 */
export async function sweepOrderMoney(ctx: AppContext): Promise<number> {
  const rows = (await ctx.dataSource.query(
    `SELECT o.id FROM orders o
      LEFT JOIN payout_accounts a ON a.user_id = o.seller_id
     WHERE (o.state IN ('cancelled', 'refunded') AND (o.transferred_minor > 0 OR o.refunded_minor <
              (SELECT COALESCE(SUM(p.amount_minor), 0) FROM order_payments p
                WHERE p.order_id = o.id AND p.status = 'succeeded')))
        OR (o.state = 'received' AND (a.ready = 1 OR o.payout_minor = 0
              OR o.item_minor + o.delivery_minor - o.commission_minor - o.payout_minor > o.refunded_minor))
     ORDER BY o.id LIMIT ${BATCH}`,
  )) as { id: number }[];
  for (const { id } of rows) await settleOrderMoney(ctx, Number(id));
  return rows.length;
}

export const orderAutoConfirmJob: OrderJob = { name: 'order-auto-confirm', everyMs: 60_000, run: autoConfirmDueOrders };
export const orderMoneySweepJob: OrderJob = { name: 'order-money-sweep', everyMs: 60_000, run: sweepOrderMoney };
