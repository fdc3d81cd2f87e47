/**
 * Columns for `count` cards, at most `max`: the most columns whose last row does not hold a lone
 * card, so one card never sits by itself in a row built for four (pure).
 * 1 → 1, 2 → 2, 3 → 3, 4 → 4, 5 → 3, 6 → 4, 7 → 4, 8 → 4, 9 → 3, 10 → 4.
 */
export function showcaseColumns(count: number, max = 4): number {
  if (count <= 1) return 1;
  if (count <= max) return count;
  for (let cols = max; cols >= 2; cols--) if (count % cols !== 1) return cols;
  return max;
}
