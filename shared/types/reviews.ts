import type { RatingSummary, ReviewRole } from '../reviews/ratings';
import type { Page } from './user';

export type { RatingSummary, ReviewRole } from '../reviews/ratings';

/** A review as anyone sees it on a member's profile. `text` is plain text: show it as text, never as HTML. */
export interface ReviewView {
  id: number;
  author: { id: number; displayName: string };
  /** The author's side of the order. */
  authorRole: ReviewRole;
  stars: number;
  text: string;
  at: string;
}

/** The reviews of one order as either of its two sides sees them. */
export interface OrderReviewsView {
  orderId: number;
  /** Which side the viewer is on. */
  side: ReviewRole;
  /** True while the viewer may still rate: the order is paid out and they have not rated it. */
  canReview: boolean;
  /** The viewer's own review; `hidden` when a moderator hid it. */
  mine: (ReviewView & { hidden: boolean }) | null;
  /** The other side's review of the viewer, unless a moderator hid it. */
  theirs: ReviewView | null;
}

/** A member as anyone sees them on their profile page. */
export interface MemberProfileView {
  id: number;
  displayName: string;
  memberSince: string;
  /** Approved builders take build orders. */
  builder: boolean;
  rating: RatingSummary;
}

/** A review as moderators see it: with the order, who it is about, and whether (and why) it is hidden. */
export interface ModerationReviewView extends ReviewView {
  orderId: number;
  subject: { id: number; displayName: string };
  hiddenAt: string | null;
  hiddenBy: { id: number; displayName: string } | null;
  hiddenReason: string | null;
}

export type ReviewPage = Page<ReviewView>;
