import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import type { User } from '../../server/features/users/user.entity';
import type { ReviewView } from '../../shared/types/reviews';
import { buildUser } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { buildPaidOutOrder } from '../support/order-factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let mod: TestAgent;
let visitor: TestAgent;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator', displayName: 'Ivo Ballast' });
  mod = await signedInAs(app, moderator);
  visitor = await browserLikeAgent(app);
});
afterAll(() => app.close());

/** Three buyers rate `seller` with these stars, one order each; answers the reviews' ids in the same order. */
async function ratedSeller(stars: number[]) {
  const seller = await buildUser(app.ctx.dataSource, { displayName: 'Peggy Trestle' });
  const ids: number[] = [];
  for (const [i, s] of stars.entries()) {
    const buyer = await buildUser(app.ctx.dataSource, { displayName: `Buyer ${i + 1}` });
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const res = await (
      await signedInAs(app, buyer)
    )
      .post(`/api/orders/${order.id}/review`)
      .send({ stars: s, text: `Rated ${s} by buyer ${i + 1}.` })
      .expect(201);
    ids.push(res.body.mine.id);
  }
  return { seller, ids };
}

const profile = async (id: number) => (await visitor.get(`/api/members/${id}`).expect(200)).body.member;
const publicStars = async (id: number) =>
  ((await visitor.get(`/api/members/${id}/reviews`).expect(200)).body.items as ReviewView[]).map((r) => r.stars);

describe('a member’s rating', () => {
  it('averages the shown reviews to one decimal, and drops a hidden one from the list and the average', async () => {
    const { seller, ids } = await ratedSeller([5, 4, 2]);
    // (5 + 4 + 2) / 3 = 3.666… → 3.7; without the 2: (5 + 4) / 2 = 4.5 (arithmetic mean, common practice, no source)
    expect((await profile(seller.id)).rating).toEqual({ average: 3.7, count: 3 });
    expect(await publicStars(seller.id)).toEqual([2, 4, 5]);

    const hidden = await mod
      .post(`/api/moderation/reviews/${ids[2]}/hide`)
      .send({ reason: 'Insults the seller rather than describing the sale.' })
      .expect(200);

    expect(hidden.body.review).toMatchObject({
      id: ids[2],
      stars: 2,
      subject: { id: seller.id, displayName: 'Peggy Trestle' },
      hiddenBy: { id: moderator.id, displayName: 'Ivo Ballast' },
      hiddenReason: 'Insults the seller rather than describing the sale.',
    });
    expect((await profile(seller.id)).rating).toEqual({ average: 4.5, count: 2 });
    expect(await publicStars(seller.id)).toEqual([4, 5]);

    await mod.post(`/api/moderation/reviews/${ids[2]}/unhide`).send({ reason: 'Appeal upheld.' }).expect(200);
    expect((await profile(seller.id)).rating).toEqual({ average: 3.7, count: 3 });
    expect(await publicStars(seller.id)).toEqual([2, 4, 5]);
  });

  it('shows on search results and on the listing, from the seller’s running totals', async () => {
    const { seller } = await ratedSeller([5, 4, 2]);
    const listing = await buildListedListing(app.ctx, seller, moderator, { title: 'Rated seller’s fiddle yard' });

    const search = await visitor.get('/api/listings').query({ seller: seller.id }).expect(200);
    const one = await visitor.get(`/api/listings/${listing.id}`).expect(200);

    expect(search.body.items.map((i: { id: number }) => i.id)).toEqual([listing.id]);
    expect(search.body.items[0].sellerRating).toEqual({ average: 3.7, count: 3 });
    expect(one.body.listing.sellerRating).toEqual({ average: 3.7, count: 3 });
  });

  it('is empty for a seller nobody has rated', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const listing = await buildListedListing(app.ctx, seller, moderator);

    const one = await visitor.get(`/api/listings/${listing.id}`).expect(200);

    expect(one.body.listing.sellerRating).toEqual({ average: null, count: 0 });
  });
});

describe('GET /api/members/:id and /reviews', () => {
  it('pages the reviews newest first with the author, their side, the stars, the text and the date', async () => {
    const { seller } = await ratedSeller([3, 5, 4]);

    const first = await visitor.get(`/api/members/${seller.id}/reviews`).query({ pageSize: 2 }).expect(200);
    const second = await visitor.get(`/api/members/${seller.id}/reviews`).query({ pageSize: 2, page: 2 }).expect(200);

    expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(first.body.items.map((r: ReviewView) => r.stars)).toEqual([4, 5]);
    expect(second.body.items.map((r: ReviewView) => r.stars)).toEqual([3]);
    expect(first.body.items[0]).toEqual({
      id: expect.any(Number),
      author: { id: expect.any(Number), displayName: 'Buyer 3' },
      authorRole: 'buyer',
      stars: 4,
      text: 'Rated 4 by buyer 3.',
      at: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
    });
  });

  it('shows a member’s name, start date and rating, and never their e-mail', async () => {
    const member = await buildUser(app.ctx.dataSource, { displayName: 'Dora Baseboard', role: 'builder' });

    const body = await profile(member.id);

    expect(body).toEqual({
      id: member.id,
      displayName: 'Dora Baseboard',
      memberSince: member.createdAt.toISOString(),
      builder: true,
      rating: { average: null, count: 0 },
    });
  });

  it('answers 404 for an unknown or suspended member', async () => {
    const suspended = await buildUser(app.ctx.dataSource, { suspendedReason: 'Fraud' });

    await visitor.get('/api/members/999999999').expect(404);
    await visitor.get(`/api/members/${suspended.id}`).expect(404);
    await visitor.get(`/api/members/${suspended.id}/reviews`).expect(404);
  });
});

describe('moderating reviews', () => {
  it('lists recent reviews newest first, and only the hidden ones when asked', async () => {
    const { ids } = await ratedSeller([1, 5]);
    await mod.post(`/api/moderation/reviews/${ids[0]}/hide`).send({ reason: 'Abusive words.' }).expect(200);

    const all = await mod.get('/api/moderation/reviews').query({ pageSize: 100 }).expect(200);
    const hidden = await mod.get('/api/moderation/reviews').query({ visibility: 'hidden', pageSize: 100 }).expect(200);
    const shown = await mod.get('/api/moderation/reviews').query({ visibility: 'shown', pageSize: 100 }).expect(200);

    const allIds = all.body.items.map((r: { id: number }) => r.id);
    expect(allIds.indexOf(ids[1])).toBeLessThan(allIds.indexOf(ids[0]));
    expect(allIds).toEqual([...allIds].sort((a: number, b: number) => b - a));
    expect(hidden.body.items.map((r: { id: number }) => r.id)).toContain(ids[0]);
    expect(hidden.body.items.every((r: { hiddenAt: string | null }) => r.hiddenAt !== null)).toBe(true);
    expect(shown.body.items.map((r: { id: number }) => r.id)).not.toContain(ids[0]);
    expect(shown.body.items.map((r: { id: number }) => r.id)).toContain(ids[1]);
  });

  it('records hiding and showing again in the audit trail with the reason', async () => {
    const { ids } = await ratedSeller([2]);
    const id = ids[0]!;
    await mod.post(`/api/moderation/reviews/${id}/hide`).send({ reason: 'Names a third party.' }).expect(200);
    await mod.post(`/api/moderation/reviews/${id}/unhide`).send({ reason: 'Name removed on appeal.' }).expect(200);

    const events = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .find({ where: { targetType: 'review', targetId: String(id) }, order: { id: 'ASC' } });

    expect(events.map((e) => [e.action, e.actorId, e.detail?.reason])).toEqual([
      ['review.hidden', moderator.id, 'Names a third party.'],
      ['review.shown', moderator.id, 'Name removed on appeal.'],
    ]);
  });

  it('answers 409 when hiding a hidden review or showing a shown one, and leaves the rating alone', async () => {
    const { seller, ids } = await ratedSeller([3]);
    await mod.post(`/api/moderation/reviews/${ids[0]}/unhide`).send({ reason: 'Just checking.' }).expect(409);
    await mod.post(`/api/moderation/reviews/${ids[0]}/hide`).send({ reason: 'Abusive.' }).expect(200);

    const again = await mod.post(`/api/moderation/reviews/${ids[0]}/hide`).send({ reason: 'Abusive.' });

    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe('This review is already hidden.');
    expect((await profile(seller.id)).rating).toEqual({ average: null, count: 0 });
  });

  it('answers 422 without a reason, 404 for an unknown review, and 403 to members', async () => {
    const { ids } = await ratedSeller([4]);
    const member = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const noReason = await mod.post(`/api/moderation/reviews/${ids[0]}/hide`).send({});
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields).toEqual({ reason: 'Write the reason.' });
    await mod.post('/api/moderation/reviews/999999999/hide').send({ reason: 'Abusive.' }).expect(404);
    await member.post(`/api/moderation/reviews/${ids[0]}/hide`).send({ reason: 'Abusive.' }).expect(403);
    await member.get('/api/moderation/reviews').expect(403);
  });

  it('leaves a review about a moderator to another moderator', async () => {
    const buyer = await buildUser(app.ctx.dataSource);
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, moderator);
    const res = await (
      await signedInAs(app, buyer)
    )
      .post(`/api/orders/${order.id}/review`)
      .send({ stars: 1, text: 'Slow to reply.' })
      .expect(201);

    const own = await mod.post(`/api/moderation/reviews/${res.body.mine.id}/hide`).send({ reason: 'Unfair.' });

    expect(own.status).toBe(409);
    expect(own.body.error.code).toBe('own_review');
  });
});
