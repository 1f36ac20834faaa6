import type {
  MemberReviewsQuery,
  ReviewDecisionInput,
  ReviewInput,
  ReviewModerationQuery,
} from '@shared/schemas/reviews';
import type { MemberProfileView, ModerationReviewView, OrderReviewsView, ReviewPage } from '@shared/types/reviews';
import type { Page } from '@shared/types/user';
import { http } from './http';

/** The reviews of one order as the signed-in side sees them, and whether they may still rate it. */
export function orderReviews(orderId: number, signal?: AbortSignal): Promise<OrderReviewsView> {
  return http.get<OrderReviewsView>(`/api/orders/${orderId}/reviews`, {}, signal);
}

/** Rate the other side of a paid-out order (once). */
export function reviewOrder(orderId: number, input: ReviewInput): Promise<OrderReviewsView> {
  return http.post<OrderReviewsView>(`/api/orders/${orderId}/review`, input);
}

/** A member's public profile with their rating. */
export async function memberProfile(id: number, signal?: AbortSignal): Promise<MemberProfileView> {
  const { member } = await http.get<{ member: MemberProfileView }>(`/api/members/${id}`, {}, signal);
  return member;
}

/** The reviews shown on a member's profile, newest first. */
export function memberReviews(
  id: number,
  query: Partial<MemberReviewsQuery>,
  signal?: AbortSignal,
): Promise<ReviewPage> {
  return http.get<ReviewPage>(`/api/members/${id}/reviews`, { ...query }, signal);
}

/** Recent reviews for moderators, newest first. */
export function moderationReviews(query: Partial<ReviewModerationQuery>): Promise<Page<ModerationReviewView>> {
  return http.get<Page<ModerationReviewView>>('/api/moderation/reviews', { ...query });
}

/** Hide an abusive review from the profile and the rating. */
export function hideReview(id: number, input: ReviewDecisionInput): Promise<{ review: ModerationReviewView }> {
  return http.post(`/api/moderation/reviews/${id}/hide`, input);
}

/** Show a hidden review again. */
export function unhideReview(id: number, input: ReviewDecisionInput): Promise<{ review: ModerationReviewView }> {
  return http.post(`/api/moderation/reviews/${id}/unhide`, input);
}
