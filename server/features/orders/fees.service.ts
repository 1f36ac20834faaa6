import type { EntityManager } from 'typeorm';
import type { FeeRatesInput } from '../../../shared/schemas/order-aftercare';
import type { FeeRatesView, FeeScheduleView } from '../../../shared/types/order-aftercare';
import { recordAudit } from '../audit/audit.service';
import { FeeSchedule } from './fee-schedule.entity';

const present = (row: FeeSchedule): FeeRatesView => ({
  commissionBps: row.commissionBps,
  buyerFeeBps: row.buyerFeeBps,
  since: row.createdAt.toISOString(),
});

/** The rates that apply to orders made now (the newest schedule; the migration writes the first). */
export async function currentFees(m: EntityManager): Promise<FeeRatesView> {
  const [newest] = await m.find(FeeSchedule, { order: { id: 'DESC' }, take: 1 });
  if (!newest) throw new Error('no fee schedule: run the migrations');
  return present(newest);
}

/** The rates now and the last few before them, with who set each. */
export async function feeSchedule(m: EntityManager): Promise<FeeScheduleView> {
  const rows = await m.find(FeeSchedule, { relations: { setBy: true }, order: { id: 'DESC' }, take: 20 });
  if (!rows[0]) throw new Error('no fee schedule: run the migrations');
  return {
    current: present(rows[0]),
    history: rows.map((row) => ({ ...present(row), id: row.id, setBy: row.setBy?.displayName ?? null })),
  };
}

/**
 * New rates for orders made from now on. A new row is added and the old ones kept, so every order keeps the rates
 * it was made with (they are copied onto the order) and the history shows who changed what.
 */
export async function setFees(
  m: EntityManager,
  admin: { id: number; ip: string },
  rates: FeeRatesInput,
): Promise<FeeScheduleView> {
  const before = await currentFees(m);
  await m.insert(FeeSchedule, { ...rates, setById: admin.id });
  await recordAudit(m, {
    actorId: admin.id,
    action: 'fees.set',
    targetType: 'fee_schedule',
    detail: {
      from: { commissionBps: before.commissionBps, buyerFeeBps: before.buyerFeeBps },
      to: rates,
    },
    ip: admin.ip,
  });
  return feeSchedule(m);
}
