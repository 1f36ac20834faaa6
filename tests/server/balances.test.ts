import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { MoneyMovement } from '../../server/features/orders/money-movement.entity';
import type { Order } from '../../server/features/orders/order.entity';
import type { BalancesView } from '../../shared/types/order-aftercare';
import { buildUser } from '../support/factories';
import { buildOrder } from '../support/order-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
}, 60_000);
afterAll(() => app.close());

const movement = (order: Order, kind: MoneyMovement['kind'], amountMinor: number) =>
  app.ctx.dataSource.getRepository(MoneyMovement).insert({
    orderId: order.id,
    kind,
    amountMinor,
    currency: 'GBP',
    providerId: `${kind}_${order.id}_${amountMinor}`,
  });

describe('GET /api/payouts/balances', () => {
  it('sums held, ready and paid-out money from the seller’s own sales only', async () => {
    const ds = app.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Quarry Road Timber' });
    const buyer = await buildUser(ds);
    const at = (state: Order['state'], itemMinor: number) => buildOrder(ds, buyer, seller, { state, itemMinor });
    // Payouts at the default 800 bp commission (shared/orders/money.ts): 15 000 → 13 800, 20 000 → 18 400,
    // 10 000 → 9 200.
    await at('paid_held', 15_000);
    await at('sent', 20_000);
    await at('received', 10_000);
    const paidOut = await at('paid_out', 15_000);
    await movement(paidOut, 'transfer', 13_800);
    const refunded = await at('refunded', 20_000);
    await movement(refunded, 'transfer', 18_400);
    await movement(refunded, 'transfer_reversal', 18_400);
    await at('cancelled', 20_000);
    await at('lapsed', 20_000);
    // The seller's own purchase, and another seller's sale, are not theirs to be paid.
    await buildOrder(ds, seller, buyer, { state: 'paid_held', itemMinor: 50_000 });
    await buildOrder(ds, buyer, await buildUser(ds), { state: 'received', itemMinor: 50_000 });

    const body = (await (await signedInAs(app, seller)).get('/api/payouts/balances').expect(200)).body as BalancesView;
    expect(body.totals).toEqual([
      { currency: 'GBP', heldMinor: 13_800 + 18_400, readyMinor: 9_200, paidOutMinor: 13_800 },
    ]);
    expect(body.account).toEqual({ connected: false, ready: false });
    expect(body.recent).toHaveLength(7);
    expect(body.recent[0]).toMatchObject({ state: 'lapsed', otherParty: 'Test Modeller' });
  });

  it('shows nothing owed to a member who has sold nothing', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const body = (await agent.get('/api/payouts/balances').expect(200)).body as BalancesView;
    expect(body).toEqual({ account: { connected: false, ready: false }, totals: [], recent: [] });
  });
});
