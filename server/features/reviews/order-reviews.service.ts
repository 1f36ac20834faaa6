import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { ORDER_STATE_LABELS } from '../../../shared/orders/states';
import type { ReviewRole } from '../../../shared/reviews/ratings';
import type { ReviewInput } from '../../../shared/schemas/reviews';
import type { OrderReviewsView } from '../../../shared/types/reviews';
import { conflict, forbidden } from '../../http/errors';
import type { ListingActor } from '../listings/listing-actor';
import { loadOrderFor } from '../orders/order-access';
import type { Order } from '../orders/order.entity';
import { countRating } from './rating-tally';
import { Review } from './review.entity';
import { presentReview } from './review.presenter';

const isDuplicate = (error: unknown) => (error as { code?: string } | null)?.code === 'ER_DUP_ENTRY';

/**
 * Load the order for one of its two sides. Whoever may not see the order gets its 404 (order access); a moderator
 * who may look at it (a problem was raised on it) is told plainly that only its two sides rate it.
 */
async function loadForSide(
  m: EntityManager,
  actor: ListingActor,
  orderId: number,
  lock = false,
): Promise<{ order: Order; side: ReviewRole }> {
  const { order, role } = await loadOrderFor(m, actor, orderId, { lock });
  if (role === 'moderator') throw forbidden('Only the buyer and the seller of this order can rate it.');
  return { order, side: role };
}

async function view(m: EntityManager, order: Order, side: ReviewRole, actorId: number): Promise<OrderReviewsView> {
  const reviews = await m.getRepository(Review).find({ where: { orderId: order.id }, relations: { author: true } });
  const mine = reviews.find((r) => r.authorId === actorId) ?? null;
  const theirs = reviews.find((r) => r.authorId !== actorId && r.hiddenAt === null) ?? null;
  return {
    orderId: order.id,
    side,
    canReview: order.state === 'paid_out' && !mine,
    mine: mine ? { ...presentReview(mine), hidden: mine.hiddenAt !== null } : null,
    theirs: theirs ? presentReview(theirs) : null,
  };
}

/** The order's reviews as one of its two sides sees them. */
export async function orderReviews(ctx: AppContext, actor: ListingActor, orderId: number): Promise<OrderReviewsView> {
  const m = ctx.dataSource.manager;
  const { order, side } = await loadForSide(m, actor, orderId);
  return view(m, order, side, actor.id);
}

/**
 * One side rates the other, once, after the order is paid out. The order's row lock makes a second, simultaneous
 * rating by the same side wait and then find the first; the unique key on (order, author) is the last guard. The
 * subject's running rating is raised in the same transaction.
 */
export async function reviewOrder(
  ctx: AppContext,
  actor: ListingActor,
  orderId: number,
  input: ReviewInput,
): Promise<OrderReviewsView> {
  await ctx.transaction(async (m) => {
    const { order, side } = await loadForSide(m, actor, orderId, true);
    if (order.state !== 'paid_out')
      throw conflict(
        'order_not_paid_out',
        `This order is “${ORDER_STATE_LABELS[order.state]}”. You can rate it once the seller has been paid out.`,
      );
    if (await m.existsBy(Review, { orderId, authorId: actor.id }))
      throw conflict('already_reviewed', 'You have already rated this order. Each side rates an order once.');
    const subjectId = side === 'buyer' ? order.sellerId : order.buyerId;
    try {
      await m.insert(Review, { orderId, authorId: actor.id, subjectId, authorRole: side, ...input });
    } catch (error) {
      if (isDuplicate(error))
        throw conflict('already_reviewed', 'You have already rated this order. Each side rates an order once.');
      throw error;
    }
    await countRating(m, subjectId, input.stars);
  });
  return orderReviews(ctx, actor, orderId);
}
