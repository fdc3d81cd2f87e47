import * as z from 'zod';
import type { RatingSummary } from './entries';

/**
 * Ratings: one per member per entry, 1–5 stars, changeable and removable; an entry's author
 * cannot rate it (403).
 *   PUT    /api/entries/:id/rating   RatingBody → RatingAnswer
 *   DELETE /api/entries/:id/rating   → RatingAnswer (myStars null)
 */
export const STARS_MIN = 1;
export const STARS_MAX = 5;
/** Ratings at or above this count as positive for the Wilson score ("top" sort). */
export const POSITIVE_STARS = 4;

export const ratingBody = z.strictObject({
  stars: z
    .number({ error: 'must be a number of stars' })
    .int('must be a whole number of stars')
    .min(STARS_MIN, `must be at least ${STARS_MIN}`)
    .max(STARS_MAX, `must be at most ${STARS_MAX}`),
});
export type RatingBody = z.input<typeof ratingBody>;

export interface RatingAnswer {
  rating: RatingSummary;
  myStars: number | null;
}
