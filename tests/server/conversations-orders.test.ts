import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import type { OrderState } from '../../shared/orders/states';
import type { FlaggedThreadView, ThreadView } from '../../shared/types/conversations';
import { buildUser } from '../support/factories';
import { linkIn, waitForMail } from '../support/inbox';
import { buildListedListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let seller: User;
let listing: Listing;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Ivy Dropper' });
  listing = await buildListedListing(app.ctx, seller, moderator, { title: 'Scenic module with viaduct' });
});
afterAll(() => app.close());

/** An order row from a fresh buyer for the listing (arrange step; the order lifecycle has its own tests). */
async function buildOrder(state: OrderState, problemRaisedAt: Date | null = null) {
  const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Rufus Crossing' });
  const repo = app.ctx.dataSource.getRepository(Order);
  const order = await repo.save(
    repo.create({
      kind: 'module',
      state,
      listingId: listing.id,
      buyerId: buyer.id,
      sellerId: seller.id,
      currency: 'GBP',
      handover: 'collection',
      itemMinor: 25_000,
      deliveryMinor: 0,
      buyerFeeMinor: 0,
      totalMinor: 25_000,
      commissionBps: 0,
      buyerFeeBps: 0,
      commissionMinor: 0,
      payoutMinor: 25_000,
      problemRaisedAt,
    }),
  );
  return { order, seller, buyer, listing };
}

describe('the thread about an order', () => {
  it('is opened by the first message and shared by the buyer and the seller', async () => {
    const { order, seller, buyer } = await buildOrder('paid_held');
    const buyerAgent = await signedInAs(app, buyer);
    const sellerAgent = await signedInAs(app, seller);

    const empty = await sellerAgent.get(`/api/conversations/orders/${order.id}`).expect(200);
    expect(empty.body).toMatchObject({ thread: null, about: { orderId: order.id, other: { id: buyer.id } } });

    const first = await sellerAgent
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'Collection on Saturday morning suits me.' })
      .expect(201);
    const second = await buyerAgent
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'Saturday at ten, then.' })
      .expect(201);

    expect(second.body.conversationId).toBe(first.body.conversationId);
    const thread = (await buyerAgent.get(`/api/conversations/orders/${order.id}`).expect(200)).body
      .thread as ThreadView;
    expect(thread.conversation).toMatchObject({ kind: 'order', order: { id: order.id, state: 'paid_held' } });
    expect(thread.messages.map((m) => m.body)).toEqual([
      'Collection on Saturday morning suits me.',
      'Saturday at ten, then.',
    ]);
    const mail = await waitForMail(buyer.email, `about order ${order.id}: Scenic module with viaduct`);
    expect(linkIn(mail, `/messages/${first.body.conversationId}`)).toBeTruthy();
  });

  it('answers 404 to members who are not party to the order', async () => {
    const { order, seller } = await buildOrder('paid_held');
    const sellerAgent = await signedInAs(app, seller);
    const { body } = await sellerAgent
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'Private to the order' })
      .expect(201);
    const stranger = await signedInAs(app, await buildUser(app.ctx.dataSource));

    await stranger.get(`/api/conversations/orders/${order.id}`).expect(404);
    await stranger.post(`/api/conversations/orders/${order.id}/messages`).send({ body: 'Hi' }).expect(404);
    await stranger.get(`/api/conversations/${body.conversationId}`).expect(404);
  });

  it('stays closed to moderators while no problem has been raised', async () => {
    const { order, buyer } = await buildOrder('sent');
    const { body } = await (
      await signedInAs(app, buyer)
    )
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'Has it been posted?' })
      .expect(201);
    const mod = await signedInAs(app, moderator);

    await mod.get(`/api/conversations/${body.conversationId}`).expect(404);
    await mod.get(`/api/conversations/orders/${order.id}`).expect(404);
  });

  it('shows a moderator an order with a problem before anyone has written, without a way to write', async () => {
    const { order, seller } = await buildOrder('problem_raised', new Date());
    const mod = await signedInAs(app, moderator);

    const res = await mod.get(`/api/conversations/orders/${order.id}`).expect(200);

    expect(res.body).toMatchObject({ thread: null, about: { orderId: order.id, you: 'moderator' } });
    expect(res.body.about.other.id).not.toBe(seller.id);
    await mod.post(`/api/conversations/orders/${order.id}/messages`).send({ body: 'Hello' }).expect(404);
  });

  it('opens to a moderator once a problem is raised, and stays open after it is settled, read-only', async () => {
    const { order, buyer, seller } = await buildOrder('sent');
    const { body } = await (
      await signedInAs(app, buyer)
    )
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'One end plate arrived split; ring me on 07700 900123.' })
      .expect(201);
    await app.ctx.dataSource
      .getRepository(Order)
      .update({ id: order.id }, { state: 'problem_raised', problemRaisedAt: new Date() });
    const mod = await signedInAs(app, moderator);

    const thread = (await mod.get(`/api/conversations/${body.conversationId}`).expect(200)).body as ThreadView;
    expect(thread.conversation.you).toBe('moderator');
    expect(thread.messages[0]!.contactDetails).toEqual([{ kind: 'phone', match: '07700 900123' }]);
    expect((await mod.get(`/api/conversations/orders/${order.id}`).expect(200)).body.thread.conversation.id).toBe(
      body.conversationId,
    );
    const write = await mod.post(`/api/conversations/${body.conversationId}/messages`).send({ body: 'Hello' });
    expect(write.status).toBe(403);
    await mod.post(`/api/conversations/${body.conversationId}/read`).send({ lastMessageId: 1 }).expect(404);

    await app.ctx.dataSource.getRepository(Order).update({ id: order.id }, { state: 'refunded' });
    await mod.get(`/api/conversations/${body.conversationId}`).expect(200);
    // The members themselves never see the moderators' marker.
    const own = (await (await signedInAs(app, seller)).get(`/api/conversations/${body.conversationId}`)).body;
    expect(own.messages[0].contactDetails).toBeUndefined();
  });
});

describe('contact details shared in messages', () => {
  it('lists for moderators who shared which e-mail address or phone number, and refuses members', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Wendell Gauge' });
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Pip Turnout' });
    const buyerAgent = await signedInAs(app, buyer);
    const sent = await buyerAgent
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: 'Write to pip.turnout@example.test instead' })
      .expect(201);
    await buyerAgent.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'Thanks!' }).expect(201);

    const mod = await signedInAs(app, moderator);
    const items = (await mod.get('/api/conversations/flagged').expect(200)).body.items as FlaggedThreadView[];
    const found = items.find((t) => t.conversation.id === sent.body.conversationId);
    expect(found).toMatchObject({
      readable: false,
      conversation: {
        kind: 'listing',
        buyer: { displayName: 'Pip Turnout' },
        seller: { displayName: 'Wendell Gauge' },
      },
      flags: [
        {
          messageId: sent.body.message.id,
          sender: { id: buyer.id, displayName: 'Pip Turnout' },
          details: [{ kind: 'email', match: 'pip.turnout@example.test' }],
        },
      ],
    });
    expect(JSON.stringify(found)).not.toContain('Thanks!');
    await buyerAgent.get('/api/conversations/flagged').expect(403);
    expect(sent.body.message.contactDetails).toBeUndefined();
  });
});
