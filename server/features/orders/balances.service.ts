import type { EntityManager } from 'typeorm';
import { HELD_STATES } from '../../../shared/orders/states';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { BalanceTotals } from '../../../shared/types/order-aftercare';
import { MoneyMovement } from './money-movement.entity';
import { Order } from './order.entity';

interface Row {
  currency: string;
  amount: string | number | null;
}

const byCurrency = (rows: Row[]) => new Map(rows.map((r) => [r.currency, Number(r.amount ?? 0)]));

/**
 * A seller's money per currency: held (buyers have paid, the seller's share waits for receipt), ready (receipt
 * settled, not yet transferred) and paid out (transfers less reversals, summed from what the provider did).
 */
export async function sellerBalances(m: EntityManager, sellerId: number): Promise<BalanceTotals[]> {
  const held = (await m
    .getRepository(Order)
    .createQueryBuilder('o')
    .select('o.currency', 'currency')
    .addSelect('SUM(o.payout_minor)', 'amount')
    .where('o.seller_id = :sellerId AND o.state IN (:...held)', { sellerId, held: HELD_STATES })
    .groupBy('o.currency')
    .getRawMany()) as Row[];
  const ready = (await m
    .getRepository(Order)
    .createQueryBuilder('o')
    .select('o.currency', 'currency')
    .addSelect('SUM(o.payout_minor - o.transferred_minor)', 'amount')
    .where("o.seller_id = :sellerId AND o.state = 'received'", { sellerId })
    .groupBy('o.currency')
    .getRawMany()) as Row[];
  const paid = (await m
    .getRepository(MoneyMovement)
    .createQueryBuilder('mm')
    .innerJoin(Order, 'o', 'o.id = mm.order_id')
    .select('mm.currency', 'currency')
    .addSelect(
      "SUM(CASE mm.kind WHEN 'transfer' THEN mm.amount_minor WHEN 'transfer_reversal' THEN -mm.amount_minor ELSE 0 END)",
      'amount',
    )
    .where("o.seller_id = :sellerId AND mm.kind IN ('transfer', 'transfer_reversal')", { sellerId })
    .groupBy('mm.currency')
    .getRawMany()) as Row[];
  const heldBy = byCurrency(held);
  const readyBy = byCurrency(ready);
  const paidBy = byCurrency(paid);
  const currencies = [...new Set([...heldBy.keys(), ...readyBy.keys(), ...paidBy.keys()])].sort();
  return currencies.map((currency) => ({
    currency: currency as Currency,
    heldMinor: heldBy.get(currency) ?? 0,
    readyMinor: readyBy.get(currency) ?? 0,
    paidOutMinor: paidBy.get(currency) ?? 0,
  }));
}
