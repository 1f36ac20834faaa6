import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole, requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  memberIdParamSchema,
  memberReviewsQuerySchema,
  reviewDecisionSchema,
  reviewIdParamSchema,
  reviewInputSchema,
  reviewModerationQuerySchema,
  reviewOrderIdParamSchema,
  type MemberReviewsQuery,
  type ReviewDecisionInput,
  type ReviewInput,
  type ReviewModerationQuery,
} from '../../../shared/schemas/reviews';
import { listingActorOf } from '../listings/listing-actor';
import { memberProfile, memberReviews } from './member-reviews.service';
import { orderReviews, reviewOrder } from './order-reviews.service';
import { hideReview, listReviewsForModeration, unhideReview } from './review-moderation.service';

const idOf = (res: Parameters<typeof input>[0]) => input<{ id: number }>(res, 'params').id;

/** Mounted at /orders: the two sides of a paid-out order rate each other. */
export function orderReviewsRouter(ctx: AppContext): Router {
  const router = Router();
  const orderId = validate(reviewOrderIdParamSchema, 'params');

  router.get('/:id/reviews', requireSignedIn, orderId, async (req, res) => {
    res.json(await orderReviews(ctx, listingActorOf(req), idOf(res)));
  });

  router.post('/:id/review', requireSignedIn, orderId, validate(reviewInputSchema), async (req, res) => {
    res.status(201).json(await reviewOrder(ctx, listingActorOf(req), idOf(res), input<ReviewInput>(res)));
  });

  return router;
}

/** Mounted at /members: public profiles and the reviews shown on them. */
export function membersRouter(ctx: AppContext): Router {
  const router = Router();
  const memberId = validate(memberIdParamSchema, 'params');

  router.get('/:id', memberId, async (_req, res) => {
    res.json({ member: await memberProfile(ctx, idOf(res)) });
  });

  router.get('/:id/reviews', memberId, validate(memberReviewsQuerySchema, 'query'), async (_req, res) => {
    res.json(await memberReviews(ctx, idOf(res), input<MemberReviewsQuery>(res, 'query')));
  });

  return router;
}

/** Mounted at /moderation: moderators list reviews and hide abusive ones (or show them again). */
export function reviewModerationRouter(ctx: AppContext): Router {
  const router = Router();
  const moderator = requireRole('moderator');
  const reviewId = validate(reviewIdParamSchema, 'params');
  const decision = validate(reviewDecisionSchema);

  router.get('/reviews', moderator, validate(reviewModerationQuerySchema, 'query'), async (_req, res) => {
    res.json(await listReviewsForModeration(ctx, input<ReviewModerationQuery>(res, 'query')));
  });

  router.post('/reviews/:id/hide', moderator, reviewId, decision, async (req, res) => {
    const { reason } = input<ReviewDecisionInput>(res);
    res.json({ review: await hideReview(ctx, listingActorOf(req), idOf(res), reason) });
  });

  router.post('/reviews/:id/unhide', moderator, reviewId, decision, async (req, res) => {
    const { reason } = input<ReviewDecisionInput>(res);
    res.json({ review: await unhideReview(ctx, listingActorOf(req), idOf(res), reason) });
  });

  return router;
}
