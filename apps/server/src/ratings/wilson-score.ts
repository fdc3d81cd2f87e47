/**
 * Lower bound of the Wilson score interval for a binomial proportion (E. B. Wilson, "Probable
 * inference, the law of succession, and statistical inference", JASA 22, 1927), the ranking
 * described in E. Miller, "How Not To Sort By Average Rating" (2009):
 *
 *   (p̂ + z²/2n − z·√(p̂(1 − p̂)/n + z²/4n²)) / (1 + z²/n),   p̂ = positive / n
 *
 * With few ratings the bound stays low, so one 5-star rating does not outrank a hundred mostly
 * good ones. Here "positive" is a rating of 4 or 5 stars.
 */

/** The standard normal quantile for a two-sided 95 % interval, Φ⁻¹(0.975). */
export const Z_95 = 1.959963984540054;

/** The Wilson lower bound of positive/total at quantile z; 0 when there are no ratings. */
export function wilsonLowerBound(positive: number, total: number, z = Z_95): number {
  if (total <= 0) return 0;
  const p = positive / total;
  const z2 = z * z;
  const centre = p + z2 / (2 * total);
  const spread = z * Math.sqrt((p * (1 - p)) / total + z2 / (4 * total * total));
  return (centre - spread) / (1 + z2 / total);
}
