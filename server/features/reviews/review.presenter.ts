import { ratingSummary, type RatingSummary } from '../../../shared/reviews/ratings';
import type { MemberProfileView, ModerationReviewView, ReviewView } from '../../../shared/types/reviews';
import type { User } from '../users/user.entity';
import type { Review } from './review.entity';

const person = (user: User | null | undefined, id: number) => ({ id, displayName: user?.displayName ?? '' });

/** A member's rating from the running totals on their row; nothing for a member not loaded. */
export function ratingOf(user: Pick<User, 'ratingSum' | 'ratingCount'> | null | undefined): RatingSummary {
  return user ? ratingSummary(user.ratingSum, user.ratingCount) : ratingSummary(0, 0);
}

/** A review as anyone sees it (load it with its author). */
export function presentReview(r: Review): ReviewView {
  return {
    id: r.id,
    author: person(r.author, r.authorId),
    authorRole: r.authorRole,
    stars: r.stars,
    text: r.text,
    at: r.createdAt.toISOString(),
  };
}

/** A review as moderators see it (load it with its author, subject and the moderator who hid it). */
export function presentReviewForModerator(r: Review): ModerationReviewView {
  return {
    ...presentReview(r),
    orderId: r.orderId,
    subject: person(r.subject, r.subjectId),
    hiddenAt: r.hiddenAt?.toISOString() ?? null,
    hiddenBy: r.hiddenById === null ? null : person(r.hiddenBy, r.hiddenById),
    hiddenReason: r.hiddenReason,
  };
}

/** What anyone sees of a member on their profile page: never their e-mail or account state. */
export function presentMember(user: User): MemberProfileView {
  return {
    id: user.id,
    displayName: user.displayName,
    memberSince: user.createdAt.toISOString(),
    builder: user.role === 'builder',
    rating: ratingOf(user),
  };
}
