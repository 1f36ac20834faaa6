import { IsNull, Not, type EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { ReviewModerationQuery } from '../../../shared/schemas/reviews';
import type { ModerationReviewView } from '../../../shared/types/reviews';
import type { Page } from '../../../shared/types/user';
import { conflict, notFound } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { countRating, uncountRating } from './rating-tally';
import { Review } from './review.entity';
import { presentReviewForModerator } from './review.presenter';

const relations = { author: true, subject: true, hiddenBy: true } as const;

const VISIBILITY = {
  all: {},
  shown: { hiddenAt: IsNull() },
  hidden: { hiddenAt: Not(IsNull()) },
} as const;

/** Recent reviews for moderators, newest first, optionally only the shown or only the hidden ones. */
export async function listReviewsForModeration(
  ctx: AppContext,
  query: ReviewModerationQuery,
): Promise<Page<ModerationReviewView>> {
  const [rows, total] = await ctx.dataSource.getRepository(Review).findAndCount({
    where: VISIBILITY[query.visibility],
    relations,
    order: { id: 'DESC' },
    skip: (query.page - 1) * query.pageSize,
    take: query.pageSize,
  });
  return { items: rows.map(presentReviewForModerator), total, page: query.page, pageSize: query.pageSize };
}

async function lockReview(m: EntityManager, actor: ListingActor, id: number): Promise<Review> {
  const review = await m.getRepository(Review).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!review) throw notFound('That review');
  if (review.authorId === actor.id || review.subjectId === actor.id)
    throw conflict('own_review', 'Another moderator must decide on a review you wrote or one about you.');
  return review;
}

async function view(ctx: AppContext, id: number): Promise<ModerationReviewView> {
  return presentReviewForModerator(
    await ctx.dataSource.getRepository(Review).findOneOrFail({ where: { id }, relations }),
  );
}

/** Hide an abusive review: it leaves the public list and its subject's rating; the reason goes to the audit log. */
export async function hideReview(ctx: AppContext, actor: ListingActor, id: number, reason: string) {
  await ctx.transaction(async (m) => {
    const review = await lockReview(m, actor, id);
    if (review.hiddenAt) throw conflict('review_hidden', 'This review is already hidden.');
    await m.update(Review, { id }, { hiddenAt: new Date(), hiddenById: actor.id, hiddenReason: reason });
    await uncountRating(m, review.subjectId, review.stars);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'review.hidden',
      targetType: 'review',
      targetId: id,
      detail: { reason, orderId: review.orderId, subjectId: review.subjectId, stars: review.stars },
      ip: actor.ip,
    });
  });
  return view(ctx, id);
}

/** Show a hidden review again: it counts towards its subject's rating once more. */
export async function unhideReview(ctx: AppContext, actor: ListingActor, id: number, reason: string) {
  await ctx.transaction(async (m) => {
    const review = await lockReview(m, actor, id);
    if (!review.hiddenAt) throw conflict('review_shown', 'This review is not hidden.');
    await m.update(Review, { id }, { hiddenAt: null, hiddenById: null, hiddenReason: null });
    await countRating(m, review.subjectId, review.stars);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'review.shown',
      targetType: 'review',
      targetId: id,
      detail: { reason, orderId: review.orderId, subjectId: review.subjectId, stars: review.stars },
      ip: actor.ip,
    });
  });
  return view(ctx, id);
}
