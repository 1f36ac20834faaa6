import type TestAgent from 'supertest/lib/agent';
import { PayoutAccount } from '../../server/features/orders/payout-account.entity';
import type { OrderView } from '../../shared/types/orders';
import { saleFixture, startOrder, type Sale } from './checkout-fixtures';
import { eventually, type PayingApp } from './paying-app';

/**
 * The worked example of the fee arithmetic: a £240 module brought by the seller for £35, at the default 8 %
 * commission and no buyer's fee.
 */
export const WORKED_EXAMPLE = {
  priceMinor: 24_000,
  handling: { collection: true, delivery: { withinKm: 40, priceMinor: 3_500 }, courier: null },
};

export interface PaidSale extends Sale {
  order: OrderView;
}

/** The order as one side sees it now. */
export const orderAs = async (agent: TestAgent, id: number) =>
  (await agent.get(`/api/orders/${id}`).expect(200)).body as OrderView;

/** A module bought through the API (delivered by the seller) and paid with the good test card: `paid_held`. */
export async function paidSale(paying: PayingApp, listing = WORKED_EXAMPLE): Promise<PaidSale> {
  const sale = await saleFixture(paying.app, listing);
  const started = await startOrder(sale, 'seller_delivery');
  await sale.buyerAgent.post(`/api/orders/${started.id}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  const order = await eventually(
    () => orderAs(sale.buyerAgent, started.id),
    (o) => o.state === 'paid_held',
  );
  return { ...sale, order };
}

/** Make a move through the API as `agent`; answers the response for the caller's checks. */
export const move = (agent: TestAgent, orderId: number, path: string, body: object = {}) =>
  agent.post(`/api/orders/${orderId}/${path}`).send(body);

/**
 * Connect the seller's payout account through the API; with `finish`, complete the provider's onboarding as the
 * seller would on its page (the fake then sends account.updated to the app).
 */
export async function connectPayouts(paying: PayingApp, sale: Sale, finish = true): Promise<string> {
  const res = await sale.sellerAgent.post('/api/payouts/account').send({}).expect(200);
  const url = new URL((res.body as { url: string }).url);
  const row = await paying.app.ctx.dataSource.getRepository(PayoutAccount).findOneByOrFail({ userId: sale.seller.id });
  if (finish) {
    const done = await fetch(`${url.origin}${url.pathname}${url.search}`, { method: 'POST', redirect: 'manual' });
    if (done.status !== 303) throw new Error(`onboarding answered ${done.status}`);
  }
  return row.accountId;
}
