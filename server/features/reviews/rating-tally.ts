import type { EntityManager } from 'typeorm';

/**
 * Keep a member's running rating (users.rating_count and rating_sum) in step with their shown reviews. Called in
 * the same transaction that adds, hides or shows a review, so the two never disagree. Each statement is a single
 * atomic update of the row, so concurrent reviews of one member never lose a count.
 */
export async function countRating(m: EntityManager, subjectId: number, stars: number): Promise<void> {
  await m.query('UPDATE users SET rating_count = rating_count + 1, rating_sum = rating_sum + ? WHERE id = ?', [
    stars,
    subjectId,
  ]);
}

/** Take a hidden review out of its subject's rating. */
export async function uncountRating(m: EntityManager, subjectId: number, stars: number): Promise<void> {
  await m.query(
    'UPDATE users SET rating_count = rating_count - 1, rating_sum = rating_sum - ? WHERE id = ? AND rating_count > 0',
    [stars, subjectId],
  );
}
