import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import type { User } from '../../server/features/users/user.entity';
import { ORDER_STATES, canMoveOrder, type OrderMove, type OrderState } from '../../shared/orders/states';
import { buildUser } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { buildOrder } from '../support/order-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let buyer: User;
let seller: User;
let agents: Record<'buyer' | 'seller' | 'moderator' | 'stranger', TestAgent>;

beforeAll(async () => {
  app = await startTestApp();
  const ds = app.ctx.dataSource;
  buyer = await buildUser(ds, { displayName: 'Wren Baseboards' });
  seller = await buildUser(ds, { displayName: 'Copperfield Light Railway Group' });
  const moderator = await buildUser(ds, { role: 'moderator' });
  const stranger = await buildUser(ds);
  agents = {
    buyer: await signedInAs(app, buyer),
    seller: await signedInAs(app, seller),
    moderator: await signedInAs(app, moderator),
    stranger: await signedInAs(app, stranger),
  };
}, 60_000);
afterAll(() => app.close());

/** Every move a person makes, the route that makes it, who may make it and a body it accepts. */
const PERSON_MOVES: { move: OrderMove; path: string; as: keyof typeof agents; body: object }[] = [
  { move: 'send', path: 'send', as: 'seller', body: {} },
  { move: 'offerCollection', path: 'offer-collection', as: 'seller', body: {} },
  { move: 'confirmReceipt', path: 'confirm-receipt', as: 'buyer', body: {} },
  { move: 'cancel', path: 'cancel', as: 'buyer', body: {} },
  {
    move: 'raiseProblem',
    path: 'problem',
    as: 'seller',
    body: { reason: 'The buyer has not answered for a fortnight.' },
  },
  { move: 'settleRefund', path: 'settle', as: 'moderator', body: { outcome: 'refund', note: 'Refund agreed.' } },
  {
    move: 'settlePartRefund',
    path: 'settle',
    as: 'moderator',
    body: { outcome: 'part_refund', note: 'One cross member split.', refundMinor: 1_000 },
  },
  { move: 'settleRelease', path: 'settle', as: 'moderator', body: { outcome: 'release', note: 'As described.' } },
];

/** An order in `state`; a problem date is set so that moderators may see it in any state. */
const orderIn = (state: OrderState) =>
  buildOrder(app.ctx.dataSource, buyer, seller, { state, problemRaisedAt: new Date() });

const attempt = (o: Order, m: (typeof PERSON_MOVES)[number]) =>
  agents[m.as]
    .post(m.as === 'moderator' ? `/api/order-problems/${o.id}/settle` : `/api/orders/${o.id}/${m.path}`)
    .send(m.body);

describe('the order transition table, walked through the API', () => {
  for (const state of ORDER_STATES) {
    it(`from “${state}” allows exactly the moves the table lists and answers 409 to the others`, async () => {
      const standing = await orderIn(state);
      for (const m of PERSON_MOVES) {
        if (canMoveOrder(state, m.move)) {
          const fresh = await orderIn(state);
          const res = await attempt(fresh, m);
          expect(res.status, `${m.move} from ${state}: ${JSON.stringify(res.body)}`).toBe(200);
          expect(res.body.order.state).not.toBe(state);
        } else {
          const res = await attempt(standing, m);
          expect(res.status, `${m.move} from ${state}`).toBe(409);
          expect(res.body.error.code).toBe('order_state');
          expect(res.body.error.message).toMatch(
            /^This order is “.+”, so it cannot be .+\. That is possible only when/,
          );
        }
      }
      const unchanged = await app.ctx.dataSource.getRepository(Order).findOneByOrFail({ id: standing.id });
      expect(unchanged.state).toBe(state);
    });
  }
});

describe('who may move an order', () => {
  it('answers 404 to a member who is neither its buyer nor its seller', async () => {
    const order = await orderIn('paid_held');
    const res = await agents.stranger.post(`/api/orders/${order.id}/send`).send({}).expect(404);
    expect(res.body.error.message).toBe('That order was not found.');
  });

  it('answers 403 when the buyer marks the order as sent', async () => {
    const order = await orderIn('paid_held');
    const res = await agents.buyer.post(`/api/orders/${order.id}/send`).send({}).expect(403);
    expect(res.body.error.message).toBe('Only the seller can say this order is marked as sent.');
  });

  it('answers 403 when the seller confirms receipt', async () => {
    const order = await orderIn('sent');
    const res = await agents.seller.post(`/api/orders/${order.id}/confirm-receipt`).send({}).expect(403);
    expect(res.body.error.message).toBe('Only the buyer can say this order is confirmed as received.');
  });

  it('answers 404 to a moderator for an order without a problem, and 403 to a member settling one', async () => {
    const quiet = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'sent' });
    await agents.moderator
      .post(`/api/order-problems/${quiet.id}/settle`)
      .send({ outcome: 'release', note: 'Nothing to see.' })
      .expect(404);
    const troubled = await orderIn('problem_raised');
    await agents.buyer
      .post(`/api/order-problems/${troubled.id}/settle`)
      .send({ outcome: 'refund', note: 'I would like it.' })
      .expect(403);
  });

  it('refuses a part refund larger than the item and delivery with a message on the amount', async () => {
    const order = await orderIn('problem_raised');
    const res = await agents.moderator
      .post(`/api/order-problems/${order.id}/settle`)
      .send({ outcome: 'part_refund', note: 'Too much.', refundMinor: order.itemMinor + order.deliveryMinor + 1 })
      .expect(422);
    expect(res.body.error.fields.refundMinor).toMatch(/at most £\d+\.\d\d, the item and delivery together/);
  });

  it('asks for a reason before a problem is raised', async () => {
    const order = await orderIn('sent');
    const res = await agents.buyer.post(`/api/orders/${order.id}/problem`).send({ reason: 'bad' }).expect(422);
    expect(res.body.error.fields.reason).toMatch(/at least 10 characters/);
  });
});

describe('problems', () => {
  it('records who raised a problem and when, mails both sides, and lists it for moderators oldest first', async () => {
    const ds = app.ctx.dataSource;
    const [ownBuyer, ownSeller] = [await buildUser(ds, { displayName: 'Wren Baseboards' }), await buildUser(ds)];
    const order = await buildOrder(ds, ownBuyer, ownSeller, { state: 'sent' });
    const reason = 'The fiddle yard arrived with two cracked cross members.';
    const res = await (
      await signedInAs(app, ownBuyer)
    )
      .post(`/api/orders/${order.id}/problem`)
      .send({ reason })
      .expect(200);
    expect(res.body.order.state).toBe('problem_raised');
    const entry = res.body.order.history.at(-1);
    expect(entry).toMatchObject({ move: 'raiseProblem', by: 'buyer', byName: 'Wren Baseboards', note: reason });
    expect(Date.now() - new Date(entry.at).getTime()).toBeLessThan(60_000);
    for (const person of [ownBuyer, ownSeller])
      expect((await waitForMail(person.email, 'Problem raised:')).text).toContain('two cracked cross members');

    const list = (await agents.moderator.get('/api/order-problems').expect(200)).body.problems as {
      id: number;
      problemRaisedAt: string;
      reason: string | null;
      raisedBy: string | null;
    }[];
    expect(list.find((p) => p.id === order.id)).toMatchObject({ reason, raisedBy: 'buyer' });
    const times = list.map((p) => p.problemRaisedAt);
    expect(times).toEqual([...times].sort());
    await agents.buyer.get('/api/order-problems').expect(403);
  });
});
