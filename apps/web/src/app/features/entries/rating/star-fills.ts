import { STARS_MAX } from '@barwright/contracts';

export type StarFill = 'full' | 'half' | 'empty';

/** How five stars show a mean of 1–5: rounded to the nearest half star; no stars filled without ratings. */
export function starFills(mean: number | null): StarFill[] {
  const halves = mean === null ? 0 : Math.round(Math.min(STARS_MAX, Math.max(0, mean)) * 2);
  return Array.from({ length: STARS_MAX }, (_, i) => (halves >= 2 * (i + 1) ? 'full' : halves === 2 * i + 1 ? 'half' : 'empty'));
}

/** "1 star", "4 stars". */
export const starsText = (n: number) => (n === 1 ? '1 star' : `${n} stars`);
