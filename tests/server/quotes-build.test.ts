import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BUILD_STAGE_LABELS } from '../../shared/schemas/quotes';
import type { BuildView } from '../../shared/types/quotes';
import { waitForMail } from '../support/inbox';
import { eventually, startPayingApp, type PayingApp } from '../support/paying-app';
import { askBoth, quoteAsDrafted, quoteWorld, type QuoteParty, type QuoteWorld } from './quotes-fixture';

let paying: PayingApp;
let world: QuoteWorld;

beforeAll(async () => {
  paying = await startPayingApp();
  world = await quoteWorld(paying.app);
}, 60_000);
afterAll(() => paying?.close());

const build = async (who: QuoteParty, id: number) =>
  (await who.agent.get(`/api/builds/${id}`).expect(200)).body.build as BuildView;

/** An accepted quote from the near builder: the build order's id. */
async function acceptedOrder(): Promise<number> {
  const requestId = await askBoth(world);
  const quoteId = await quoteAsDrafted(world.near, requestId);
  const res = await world.buyer.agent
    .post(`/api/quotes/${quoteId}/accept`)
    .send({ handover: 'collection' })
    .expect(201);
  return res.body.orderId as number;
}

async function pay(orderId: number, state: string): Promise<void> {
  await world.buyer.agent.post(`/api/orders/${orderId}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(200);
  await eventually(
    () => build(world.buyer, orderId),
    (b) => b.state === state,
  );
}

describe('a build order from deposit to balance', { timeout: 30_000 }, () => {
  it('takes the deposit, records the stages (e-mailing the buyer at each), asks for the balance when ready, and holds it once paid', async () => {
    const id = await acceptedOrder();
    const first = await build(world.buyer, id);
    expect(first).toMatchObject({ state: 'awaiting_deposit', viewerRole: 'buyer', nextStages: [] });
    expect(first.due).toEqual({ purpose: 'deposit', amountMinor: first.depositMinor });
    expect(first.depositMinor + first.balanceMinor).toBe(first.totalMinor);

    await pay(id, 'in_build');
    await waitForMail(world.buyer.user.email, 'Deposit paid:');
    await waitForMail(world.near.user.email, 'Deposit paid, start the build:');
    expect((await build(world.near, id)).nextStages).toEqual(['materials_bought', 'ready']);
    const noted = await world.near.agent
      .post(`/api/builds/${id}/stages`)
      .send({ stage: 'materials_bought', note: 'Ply and 2x1 in the workshop.' })
      .expect(200);
    expect(noted.body.build.stages).toMatchObject([
      { stage: 'materials_bought', note: 'Ply and 2x1 in the workshop.' },
    ]);
    await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'frames_built' }).expect(200);
    const ready = await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'ready' }).expect(200);
    expect(ready.body.build).toMatchObject({ state: 'awaiting_balance', nextStages: [] });
    expect((ready.body.build as BuildView).stages.map((s) => s.stage)).toEqual([
      'materials_bought',
      'frames_built',
      'ready',
    ]);
    await waitForMail(world.buyer.user.email, `Build progress: ${BUILD_STAGE_LABELS.materials_bought}`);
    await waitForMail(world.buyer.user.email, `Build progress: ${BUILD_STAGE_LABELS.frames_built}`);
    await waitForMail(world.buyer.user.email, 'Your boards are built: balance of');
    const due = await build(world.buyer, id);
    expect(due.due).toEqual({ purpose: 'balance', amountMinor: due.balanceMinor });

    await pay(id, 'paid_held');
    expect((await build(world.buyer, id)).due).toBeNull();
    expect((await paying.chargesFor(id)).map((c) => c.amount).sort((a, b) => a - b)).toEqual(
      [due.depositMinor, due.balanceMinor].sort((a, b) => a - b),
    );
  });

  it('answers 409 for a stage before the deposit is paid, or out of order, or recorded twice', async () => {
    const id = await acceptedOrder();
    const early = await world.near.agent
      .post(`/api/builds/${id}/stages`)
      .send({ stage: 'materials_bought' })
      .expect(409);
    expect(early.body.error.code).toBe('order_state');
    await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'ready' }).expect(409);
    await pay(id, 'in_build');
    const skipped = await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'frames_built' }).expect(409);
    expect(skipped.body.error.code).toBe('stage_order');
    await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'materials_bought' }).expect(200);
    await world.near.agent.post(`/api/builds/${id}/stages`).send({ stage: 'materials_bought' }).expect(409);
  });

  it('answers 403 when the buyer records a stage, and 404 to anyone not party to the order', async () => {
    const id = await acceptedOrder();
    await world.buyer.agent.post(`/api/builds/${id}/stages`).send({ stage: 'materials_bought' }).expect(403);
    await world.second.agent.get(`/api/builds/${id}`).expect(404);
    await world.second.agent.post(`/api/builds/${id}/stages`).send({ stage: 'ready' }).expect(404);
  });
});
