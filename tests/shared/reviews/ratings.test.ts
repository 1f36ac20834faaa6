import { describe, expect, it } from 'vitest';
import { describeRating, describeStars, ratingSummary } from '../../../shared/reviews/ratings';

describe('ratingSummary', () => {
  // The arithmetic mean rounded half up to one decimal place (common practice, no source).
  it.each([
    [5 + 4 + 2, 3, 3.7], // 11 / 3 = 3.666…
    [5 + 4, 2, 4.5],
    [5, 1, 5],
    [4 * 9 + 5 * 3, 12, 4.3], // 51 / 12 = 4.25 → half up
    [89, 20, 4.5], // 4.45 → half up, not 4.4 through a binary fraction
    [7, 3, 2.3], // 2.333…
  ])('averages a sum of %i over %i ratings as %f', (sum, count, average) => {
    expect(ratingSummary(sum, count)).toEqual({ average, count });
  });

  it('has no average before the first rating', () => {
    expect(ratingSummary(0, 0)).toEqual({ average: null, count: 0 });
  });
});

describe('describeRating', () => {
  it.each([
    [{ average: 4.7, count: 12 }, '4.7 from 12 ratings'],
    [{ average: 5, count: 1 }, '5.0 from 1 rating'],
    [{ average: null, count: 0 }, 'No ratings yet'],
  ])('puts %j as “%s”', (rating, words) => {
    expect(describeRating(rating)).toBe(words);
  });
});

describe('describeStars', () => {
  it('names the stars in words', () => {
    expect(describeStars(1)).toBe('1 star: Poor');
    expect(describeStars(4)).toBe('4 stars: Good');
  });
});
