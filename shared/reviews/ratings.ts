/** Limits and words for the ratings both sides of a paid-out order may leave. */
export const REVIEW_LIMITS = {
  starsMin: 1,
  starsMax: 5,
  textMin: 3,
  textMax: 500,
  reasonMin: 3,
  reasonMax: 500,
} as const;

/** Which side of the order wrote a review. */
export const REVIEW_ROLES = ['buyer', 'seller'] as const;
export type ReviewRole = (typeof REVIEW_ROLES)[number];

/** The words beside each number of stars, so a rating never depends on reading the symbols. */
export const STAR_LABELS: Record<number, string> = {
  1: 'Poor',
  2: 'Disappointing',
  3: 'Fair',
  4: 'Good',
  5: 'Excellent',
};

/** A member's rating as shown on cards and profiles: the average to one decimal, and how many it is from. */
export interface RatingSummary {
  /** Null until the first (shown) rating. */
  average: number | null;
  count: number;
}

/**
 * The average of `count` ratings adding up to `sum`, rounded half up to one decimal place (3.666… → 3.7). The
 * rounding works on a whole number of tenths, so 4.45 never becomes 4.4 through binary fractions.
 */
export function ratingSummary(sum: number, count: number): RatingSummary {
  if (count <= 0) return { average: null, count: 0 };
  return { average: Math.round((sum * 10) / count) / 10, count };
}

/** "4.7 from 12 ratings", "5.0 from 1 rating", or "No ratings yet". */
export function describeRating(rating: RatingSummary): string {
  if (rating.average === null || rating.count === 0) return 'No ratings yet';
  return `${rating.average.toFixed(1)} from ${rating.count} rating${rating.count === 1 ? '' : 's'}`;
}

/** "4 stars: Good" */
export function describeStars(stars: number): string {
  return `${stars} star${stars === 1 ? '' : 's'}: ${STAR_LABELS[stars] ?? ''}`;
}
