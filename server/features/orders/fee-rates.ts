import type { EntityManager } from 'typeorm';
import type { FeeRates } from '../../../shared/orders/money';
import { FeeSchedule } from './fee-schedule.entity';

/** The rates that apply to an order made now: the newest fee schedule (the migration writes the first). */
export async function currentFeeRates(m: EntityManager): Promise<FeeRates> {
  const [newest] = await m.find(FeeSchedule, { order: { id: 'DESC' }, take: 1 });
  if (!newest) throw new Error('no fee schedule: run the migrations');
  return { commissionBps: newest.commissionBps, buyerFeeBps: newest.buyerFeeBps };
}
