import { z } from 'zod';
import { REVIEW_LIMITS as R } from '../reviews/ratings';
import { pageField, pageSizeField, plainTextField } from './listing-fields';

const starsMessage = `Choose from ${R.starsMin} to ${R.starsMax} stars.`;

/** POST /api/orders/:id/review: one rating per side of a paid-out order. */
export const reviewInputSchema = z.strictObject({
  stars: z
    .number({ error: starsMessage })
    .int({ error: starsMessage })
    .min(R.starsMin, { error: starsMessage })
    .max(R.starsMax, { error: starsMessage }),
  text: plainTextField('review', R.textMin, R.textMax),
});
export type ReviewInput = z.infer<typeof reviewInputSchema>;

/** A whole-number id in a route, with a message naming what was not found. */
const idOf = (what: string) =>
  z.coerce
    .number({ error: `Unknown ${what}.` })
    .int({ error: `Unknown ${what}.` })
    .positive({ error: `Unknown ${what}.` })
    .max(4_294_967_295, { error: `Unknown ${what}.` });

/** Route parameter `:id` of an order being rated. */
export const reviewOrderIdParamSchema = z.strictObject({ id: idOf('order') });
/** Route parameter `:id` of a member. */
export const memberIdParamSchema = z.strictObject({ id: idOf('member') });
/** Route parameter `:id` of a review. */
export const reviewIdParamSchema = z.strictObject({ id: idOf('review') });

/** GET /api/members/:id/reviews: newest first. */
export const memberReviewsQuerySchema = z.strictObject({
  page: pageField,
  pageSize: pageSizeField(50, 10),
});
export type MemberReviewsQuery = z.infer<typeof memberReviewsQuerySchema>;

export const REVIEW_VISIBILITY = ['all', 'shown', 'hidden'] as const;
export type ReviewVisibility = (typeof REVIEW_VISIBILITY)[number];

/** GET /api/moderation/reviews: newest first, optionally only the shown or only the hidden ones. */
export const reviewModerationQuerySchema = z.strictObject({
  visibility: z.enum(REVIEW_VISIBILITY, { error: 'Choose all, shown or hidden.' }).default('all'),
  page: pageField,
  pageSize: pageSizeField(100, 20),
});
export type ReviewModerationQuery = z.infer<typeof reviewModerationQuerySchema>;

/** POST /api/moderation/reviews/:id/hide and /unhide: the moderator says why, for the audit trail. */
export const reviewDecisionSchema = z.strictObject({
  reason: plainTextField('reason', R.reasonMin, R.reasonMax),
});
export type ReviewDecisionInput = z.infer<typeof reviewDecisionSchema>;
