import { formatLength } from '@barwright/engine/length-format';
import { type RatingSummary, type Units } from '@barwright/contracts';

// The names of waves, materials and phase schedules live in the contracts, one table for the whole app.
export { MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES } from '@barwright/contracts';

/** A cutter diameter given in mm, in the reader's units, a stock inch size named: "4.76 mm", "0.188 in (3/16)". */
export function cutterText(mm: number, units: Units): string {
  return formatLength(mm, units, { fraction: true });
}

/** The mean to one decimal with the count beside it: "4.3 of 5 (12 ratings)", "No ratings yet". */
export function ratingText(rating: Pick<RatingSummary, 'count' | 'mean'>): string {
  if (rating.count === 0 || rating.mean === null) return 'No ratings yet';
  return `${rating.mean.toFixed(1)} of 5 (${countText(rating.count, 'rating')})`;
}

/** "1 remix", "3 remixes", "no comments". */
export function countText(n: number, noun: string, plural = `${noun}s`): string {
  if (n === 0) return `no ${plural}`;
  return `${n.toLocaleString('en')} ${n === 1 ? noun : plural}`;
}

