import type { Design } from '@barwright/contracts';
import { rosetteRadius } from './rosette';

/**
 * Signed radius of curvature of the rosette at θ (rad), in its length unit: positive where the
 * rosette is convex, negative where it curves inward (a valley a rubber must reach into).
 * Polar form ρ = (r² + r'²)^{3/2} / (r² + 2r'² − r·r''), derivatives by central differences at a step
 * of 1/1000 rad of the fastest layer's wave, where truncation and rounding errors balance (about 1e-7).
 * For a sine layer at its crest this is (R0+a)²/(R0+a+aN²), at its valley (R0−a)²/(R0−a−aN²).
 */
export function rosetteCurvatureRadius(rosette: Design['rosette'], theta: number): number {
  const radius = rosetteRadius(rosette);
  const lobes = Math.max(1, ...rosette.layers.map((l) => l.lobes));
  const d = 1e-3 / lobes;
  const before = radius(theta - d);
  const r = radius(theta);
  const after = radius(theta + d);
  const r1 = (after - before) / (2 * d);
  const r2 = (after - 2 * r + before) / (d * d);
  return (r * r + r1 * r1) ** 1.5 / (r * r + 2 * r1 * r1 - r * r2);
}

/**
 * Signed radius of curvature of a sampled graph y(x) at sample i (three-point, step h): negative at
 * crests (y'' < 0), positive in valleys, ±Infinity where straight.
 */
export function graphCurvatureRadius(y: ArrayLike<number>, i: number, step: number): number {
  const slope = (y[i + 1] - y[i - 1]) / (2 * step);
  const bend = (y[i + 1] - 2 * y[i] + y[i - 1]) / (step * step);
  return (1 + slope * slope) ** 1.5 / bend;
}
