/**
 * Periodic monotone cubic Hermite interpolation (Fritsch–Carlson slopes), period 2π.
 *
 * Chosen for measured rosettes because it never overshoots the readings: a dial-indicator table
 * has some noise, and an interpolant that overshoots (Catmull-Rom, natural splines) would invent
 * crests and valleys the cutter then copies onto the bar. Unlike linear interpolation it is C¹,
 * so the curvature analysis is not fooled by kinks at every reading.
 */
const TWO_PI = 2 * Math.PI;

/** Interpolates readings (angles in radians, strictly increasing in [0, 2π), values) periodically. */
export function periodicMonotoneSpline(angles: readonly number[], values: readonly number[]): (t: number) => number {
  const n = angles.length;
  const knots = Float64Array.from({ length: n + 1 }, (_, i) => (i < n ? angles[i] : angles[0] + TWO_PI));
  const ys = Float64Array.from({ length: n + 1 }, (_, i) => values[i % n]);
  const slopes = monotoneSlopes(knots, ys);
  return (t: number) => {
    let u = (t - knots[0]) % TWO_PI;
    if (u < 0) u += TWO_PI;
    u += knots[0];
    const i = intervalOf(knots, u);
    const h = knots[i + 1] - knots[i];
    const s = (u - knots[i]) / h;
    const s2 = s * s;
    const s3 = s2 * s;
    return (
      (2 * s3 - 3 * s2 + 1) * ys[i] + (s3 - 2 * s2 + s) * h * slopes[i] + (-2 * s3 + 3 * s2) * ys[i + 1] + (s3 - s2) * h * slopes[i + 1]
    );
  };
}

/** Fritsch–Carlson slopes on a closed (periodic) table: zero at local extrema, harmonic means elsewhere. */
function monotoneSlopes(knots: Float64Array, ys: Float64Array): Float64Array {
  const n = knots.length - 1;
  const secant = new Float64Array(n);
  for (let i = 0; i < n; i++) secant[i] = (ys[i + 1] - ys[i]) / (knots[i + 1] - knots[i]);
  const slopes = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) {
    const before = secant[(i - 1 + n) % n];
    const after = secant[i];
    if (before * after <= 0) continue;
    const hBefore = knots[i === 0 ? n : i] - knots[i === 0 ? n - 1 : i - 1];
    const hAfter = knots[i + 1] - knots[i];
    // Weighted harmonic mean (Fritsch–Butland form), which keeps each piece monotone.
    const w1 = 2 * hAfter + hBefore;
    const w2 = hAfter + 2 * hBefore;
    slopes[i] = (w1 + w2) / (w1 / before + w2 / after);
  }
  slopes[n] = slopes[0];
  return slopes;
}

/** Index i with knots[i] <= u < knots[i + 1] (binary search; u is inside the table's span). */
function intervalOf(knots: Float64Array, u: number): number {
  let lo = 0;
  let hi = knots.length - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (knots[mid] <= u) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}
