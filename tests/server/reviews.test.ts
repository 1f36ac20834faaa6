import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Review } from '../../server/features/reviews/review.entity';
import { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { buildOrder, buildPaidOutOrder } from '../support/order-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

const GOOD = { stars: 5, text: 'Well packed and exactly as described; the fiddle yard joined first time.' };

async function parties() {
  const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Nell Fishplate' });
  const seller = await buildUser(app.ctx.dataSource, { displayName: 'Amos Chair' });
  return { buyer, seller };
}

const tally = async (id: number) => {
  const user = await app.ctx.dataSource.getRepository(User).findOneByOrFail({ id });
  return { count: user.ratingCount, sum: user.ratingSum };
};

describe('POST /api/orders/:id/review', () => {
  it('lets the buyer rate the seller once the order is paid out, and counts it on the seller', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);

    const res = await (await signedInAs(app, buyer)).post(`/api/orders/${order.id}/review`).send(GOOD).expect(201);

    expect(res.body).toMatchObject({ orderId: order.id, side: 'buyer', canReview: false, theirs: null });
    expect(res.body.mine).toMatchObject({
      author: { id: buyer.id, displayName: 'Nell Fishplate' },
      authorRole: 'buyer',
      stars: 5,
      text: GOOD.text,
      hidden: false,
    });
    expect(await tally(seller.id)).toEqual({ count: 1, sum: 5 });
    expect(await tally(buyer.id)).toEqual({ count: 0, sum: 0 });
  });

  it('lets the seller rate the buyer too, and each side sees the other’s review', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    await (await signedInAs(app, buyer)).post(`/api/orders/${order.id}/review`).send(GOOD).expect(201);

    const sellerAgent = await signedInAs(app, seller);
    const res = await sellerAgent
      .post(`/api/orders/${order.id}/review`)
      .send({ stars: 4, text: 'Paid promptly and collected on time.' })
      .expect(201);

    expect(res.body).toMatchObject({ side: 'seller', mine: { authorRole: 'seller', stars: 4 } });
    expect(res.body.theirs).toMatchObject({ authorRole: 'buyer', stars: 5 });
    expect(await tally(buyer.id)).toEqual({ count: 1, sum: 4 });
  });

  it('answers 409 when the same side rates the order a second time, and keeps the first rating', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const agent = await signedInAs(app, buyer);
    await agent.post(`/api/orders/${order.id}/review`).send(GOOD).expect(201);

    const res = await agent.post(`/api/orders/${order.id}/review`).send({ stars: 1, text: 'Changed my mind.' });

    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'already_reviewed' });
    expect(res.body.error.message).toMatch(/already rated/);
    expect(await tally(seller.id)).toEqual({ count: 1, sum: 5 });
  });

  it('counts one rating when the same side sends two at the same moment', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const agent = await signedInAs(app, buyer);

    const statuses = await Promise.all(
      [5, 3].map((stars) =>
        agent
          .post(`/api/orders/${order.id}/review`)
          .send({ stars, text: 'Sent twice.' })
          .then((r) => r.status),
      ),
    );

    expect(statuses.sort()).toEqual([201, 409]);
    expect(await app.ctx.dataSource.getRepository(Review).countBy({ orderId: order.id })).toBe(1);
    expect((await tally(seller.id)).count).toBe(1);
  });

  it.each(['paid_held', 'sent', 'received', 'problem_raised', 'cancelled', 'refunded'] as const)(
    'answers 409 with the order’s state while it is %s',
    async (state) => {
      const { buyer, seller } = await parties();
      const order = await buildOrder(app.ctx.dataSource, buyer, seller, { state });

      const res = await (await signedInAs(app, buyer)).post(`/api/orders/${order.id}/review`).send(GOOD);

      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('order_not_paid_out');
      expect(res.body.error.message).toMatch(/once the seller has been paid out/);
      expect(await tally(seller.id)).toEqual({ count: 0, sum: 0 });
    },
  );

  it('answers 404 to a member who is neither the buyer nor the seller, and 401 to a visitor', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const stranger = await signedInAs(app, await buildUser(app.ctx.dataSource));

    await stranger.post(`/api/orders/${order.id}/review`).send(GOOD).expect(404);
    await stranger.get(`/api/orders/${order.id}/reviews`).expect(404);
    await (await browserLikeAgent(app)).post(`/api/orders/${order.id}/review`).send(GOOD).expect(401);
    expect(await tally(seller.id)).toEqual({ count: 0, sum: 0 });
  });

  it('answers 403 to a moderator looking after a problem on the order, who is not one of its sides', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller, { problemRaisedAt: new Date() });
    const moderator = await signedInAs(app, await buildUser(app.ctx.dataSource, { role: 'moderator' }));

    const res = await moderator.post(`/api/orders/${order.id}/review`).send(GOOD);

    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe('Only the buyer and the seller of this order can rate it.');
  });

  it.each([
    ['no stars', { stars: 0, text: 'Fine.' }, 'stars', 'Choose from 1 to 5 stars.'],
    ['six stars', { stars: 6, text: 'Fine.' }, 'stars', 'Choose from 1 to 5 stars.'],
    ['half a star', { stars: 3.5, text: 'Fine.' }, 'stars', 'Choose from 1 to 5 stars.'],
    ['stars left out', { text: 'Fine.' }, 'stars', 'Choose from 1 to 5 stars.'],
    [
      '501 characters of text',
      { stars: 4, text: 'x'.repeat(501) },
      'text',
      'The review must be at most 500 characters.',
    ],
    ['only spaces', { stars: 4, text: '  ' }, 'text', 'The review must be at least 3 characters.'],
    ['text left out', { stars: 4 }, 'text', 'Write the review.'],
  ])('answers 422 with a message beside the field for %s', async (_case, body, field, message) => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);

    const res = await (await signedInAs(app, buyer)).post(`/api/orders/${order.id}/review`).send(body);

    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', fields: { [field]: message } });
  });

  it('accepts exactly 500 characters of text, stored as plain text', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const text = `<b>bold</b> ${'y'.repeat(488)}`;
    expect(text).toHaveLength(500);

    const res = await (await signedInAs(app, buyer)).post(`/api/orders/${order.id}/review`).send({ stars: 2, text });

    expect(res.status).toBe(201);
    expect(res.body.mine.text).toBe(text);
  });
});

describe('GET /api/orders/:id/reviews', () => {
  it('tells a side of an unfinished order that it cannot rate yet', async () => {
    const { buyer, seller } = await parties();
    const order = await buildOrder(app.ctx.dataSource, buyer, seller, { state: 'sent' });

    const res = await (await signedInAs(app, seller)).get(`/api/orders/${order.id}/reviews`).expect(200);

    expect(res.body).toEqual({ orderId: order.id, side: 'seller', canReview: false, mine: null, theirs: null });
  });

  it('invites a side of a paid-out order to rate it', async () => {
    const { buyer, seller } = await parties();
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);

    const res = await (await signedInAs(app, buyer)).get(`/api/orders/${order.id}/reviews`).expect(200);

    expect(res.body).toMatchObject({ side: 'buyer', canReview: true, mine: null });
  });
});
