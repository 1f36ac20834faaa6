import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { MoneyMovement } from '../../server/features/orders/money-movement.entity';
import { autoConfirmDueOrders, sweepOrderMoney } from '../../server/features/orders/order-auto-confirm.job';
import { Order } from '../../server/features/orders/order.entity';
import { connectPayouts, move, orderAs, paidSale } from '../support/aftercare-fixtures';
import { waitForMail } from '../support/inbox';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';

vi.setConfig({ testTimeout: 40_000 });

let paying: PayingApp;
beforeAll(async () => {
  paying = await startPayingApp();
});
afterAll(() => paying.close());

const transfersFor = async (orderId: number) =>
  (await paying.provider.transfers.list({ transfer_group: `order-${orderId}`, limit: 100 })).data;
const movements = (orderId: number) =>
  paying.app.ctx.dataSource.getRepository(MoneyMovement).findBy({ orderId, kind: 'transfer' });

describe('paying the seller', () => {
  it('pays the worked example once the buyer confirms receipt: £240 + £35 at 8 % is £22 commission and £253 payout', async () => {
    const sale = await paidSale(paying);
    const account = await connectPayouts(paying, sale);
    await eventually(
      async () => (await sale.sellerAgent.get('/api/payouts/account').expect(200)).body.account,
      (a: { ready: boolean }) => a.ready,
    );

    // Worked example: seller's gross = 24 000 + 3 500 = 27 500 p; commission = 27 500 × 800 / 10 000 = 2 200 p
    // (£22); payout = 27 500 − 2 200 = 25 300 p (£253). Source: shared/orders/money.ts rules (ours).
    const seen = await orderAs(sale.sellerAgent, sale.order.id);
    expect(seen.amounts).toMatchObject({ itemMinor: 24_000, deliveryMinor: 3_500, totalMinor: 27_500 });
    expect(seen.sellerMoney).toMatchObject({ commissionBps: 800, commissionMinor: 2_200, payoutMinor: 25_300 });

    const sent = await move(sale.sellerAgent, sale.order.id, 'send', { note: 'Van on Tuesday morning' }).expect(200);
    expect(sent.body.order.state).toBe('sent');
    const onItsWay = await waitForMail(sale.buyer.email, 'On its way:');
    expect(onItsWay.text).toContain('Van on Tuesday morning');

    const confirmed = await move(sale.buyerAgent, sale.order.id, 'confirm-receipt').expect(200);
    expect(confirmed.body.order.state).toBe('paid_out');

    const [transfer, ...others] = await transfersFor(sale.order.id);
    expect(others).toHaveLength(0);
    expect(transfer).toMatchObject({ amount: 25_300, currency: 'gbp', destination: account });
    const [charge] = await paying.chargesFor(sale.order.id);
    expect(transfer!.source_transaction).toBe(charge!.id);

    const after = await orderAs(sale.sellerAgent, sale.order.id);
    expect(after.sellerMoney).toMatchObject({ payoutMinor: 25_300, transferredMinor: 25_300 });
    expect(after.history.map((h) => [h.move, h.by, h.byName])).toEqual([
      ['create', 'buyer', 'Ada Sidebottom'],
      ['pay', 'payments', null],
      ['send', 'seller', 'Hollin Bridge Sidings'],
      ['confirmReceipt', 'buyer', 'Ada Sidebottom'],
      ['payOut', 'system', null],
    ]);
    expect((await waitForMail(sale.seller.email, 'Receipt confirmed:')).text).toContain('arrived as described');
    expect((await waitForMail(sale.seller.email, 'Payout sent:')).text).toContain('£253.00');
  });

  it('keeps a received order waiting until the payout account is ready, then pays it exactly once', async () => {
    const sale = await paidSale(paying);
    await connectPayouts(paying, sale, false);
    await move(sale.sellerAgent, sale.order.id, 'offer-collection', { note: 'Garage at the back' }).expect(200);
    expect((await waitForMail(sale.buyer.email, 'Ready to collect:')).text).toContain('Garage at the back');
    const received = await move(sale.buyerAgent, sale.order.id, 'confirm-receipt').expect(200);
    expect(received.body.order).toMatchObject({ state: 'received', stateLabel: 'Received: payout due' });
    await sweepOrderMoney(paying.app.ctx);
    expect(await transfersFor(sale.order.id)).toHaveLength(0);

    // The seller finishes onboarding: the provider's account.updated event makes the account ready and pays out.
    const { url } = (await sale.sellerAgent.post('/api/payouts/account').send({}).expect(200)).body as { url: string };
    expect((await fetch(url, { method: 'POST', redirect: 'manual' })).headers.get('location')).toMatch(
      /\/my\/balances\?connected=1$/,
    );
    await eventually(
      () => orderAs(sale.sellerAgent, sale.order.id),
      (o) => o.state === 'paid_out',
    );
    await sweepOrderMoney(paying.app.ctx);
    await sale.sellerAgent.get('/api/payouts/account').expect(200);
    expect(await transfersFor(sale.order.id)).toHaveLength(1);
    expect(await movements(sale.order.id)).toHaveLength(1);
    await waitForMail(sale.seller.email, 'Payout sent:');
  });

  it('confirms receipt automatically once the confirmation period has passed, and not before', async () => {
    const due = await paidSale(paying);
    const notYet = await paidSale(paying);
    await connectPayouts(paying, due);
    await move(due.sellerAgent, due.order.id, 'send').expect(200);
    await move(notYet.sellerAgent, notYet.order.id, 'send').expect(200);
    const orders = paying.app.ctx.dataSource.getRepository(Order);
    await orders.update(due.order.id, { confirmBy: new Date(Date.now() - 60_000) });

    expect(await autoConfirmDueOrders(paying.app.ctx)).toBeGreaterThanOrEqual(1);

    const done = await orderAs(due.sellerAgent, due.order.id);
    expect(done.state).toBe('paid_out');
    expect(done.history.find((h) => h.move === 'autoConfirm')).toMatchObject({ by: 'system', byName: null });
    expect((await waitForMail(due.seller.email, 'Receipt confirmed:')).text).toContain('No problem was raised');
    expect((await orderAs(notYet.sellerAgent, notYet.order.id)).state).toBe('sent');
  });

  it('makes one payout account per seller however often they connect', async () => {
    const sale = await paidSale(paying);
    const first = await connectPayouts(paying, sale, false);
    const second = await connectPayouts(paying, sale, false);
    expect(second).toBe(first);
    expect((await sale.sellerAgent.get('/api/payouts/account').expect(200)).body.account).toEqual({
      connected: true,
      ready: false,
    });
    expect((await sale.buyerAgent.get('/api/payouts/account').expect(200)).body.account).toEqual({
      connected: false,
      ready: false,
    });
  });
});
