import type { Design } from '@barwright/contracts';
import { rosetteRadius } from './rosette';
import type { EngineWarning } from './types';

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

/**
 * The smallest radius of curvature of the crests (convex parts) of a sampled graph between samples
 * from and to: 0 when a crest is sharp at the sampling resolution (radius under two steps),
 * Infinity when the graph has no crest.
 */
export function minCrestRadius(y: ArrayLike<number>, step: number, from = 1, to = y.length - 2): number {
  let least = Infinity;
  const flat = 1e-9; // bends below this (1/mm) are rounding noise on a straight stretch
  for (let i = Math.max(1, from); i <= Math.min(to, y.length - 2); i++) {
    const bend = (y[i + 1] - 2 * y[i] + y[i - 1]) / (step * step);
    if (bend < -flat) least = Math.min(least, -graphCurvatureRadius(y, i, step));
  }
  return least < 2 * step ? 0 : least;
}

export interface DetailLossInput {
  /** Cutter-centre heights, bar edge heights and follower heights at the same nodes (mm). */
  cutter: ArrayLike<number>;
  follower: ArrayLike<number>;
  step: number;
  cutterRadius: number;
  followerRadius: number;
  /** Nodes to examine (away from the bar's ends, where the follower runs out of bar). */
  from: number;
  to: number;
  /** Period on the bar (mm): zones repeating every period are reported once. */
  period: number;
}

/**
 * Where the engraved line loses the rosette's detail. The follower reads the cutter path back,
 * shifted by rf − rc on flat stretches; the difference D = F − (rf − rc) − y says where it does not:
 * - at a crest narrower than the cutter the cutter leaves a sharp ridge which the follower rounds
 *   (D < 0, r·(sec β − 1) for a sharp crest of flank angle β): 'detail-lost-follower';
 * - at a valley narrower than the cutter, when the follower is smaller than the cutter, the valley is
 *   cut wider than the follower could read (D < 0): 'detail-lost-cutter';
 * - at a valley the follower is too large to reach into (D > 0): 'detail-lost-follower'.
 * With rf = rc valleys come back exactly. Zones smaller than 0.1 % of the path's height (or 0.1 µm) are not reported.
 */
export function detailLossWarnings(input: DetailLossInput): EngineWarning[] {
  const { cutter: y, follower: f, step, from, to } = input;
  const offset = input.followerRadius - input.cutterRadius;
  let top = -Infinity;
  for (let i = from; i <= to; i++) top = Math.max(top, y[i]);
  const threshold = Math.max(1e-4, 1e-3 * top);
  const zones: { from: number; to: number; worst: number; diff: number }[] = [];
  for (let i = from; i <= to; i++) {
    const diff = f[i] - offset - y[i];
    if (Math.abs(diff) <= threshold) continue;
    const last = zones[zones.length - 1];
    if (last && last.to === i - 1) {
      last.to = i;
      if (Math.abs(diff) > Math.abs(last.diff)) [last.worst, last.diff] = [i, diff];
    } else zones.push({ from: i, to: i, worst: i, diff });
  }
  const firstPeriodEnd = from * step + input.period;
  const repeats = to * step - from * step > input.period;
  return zones
    .filter((z) => !repeats || z.from * step < firstPeriodEnd)
    .map((z) => describeLoss(z, input, y[z.worst] > top / 2, repeats));
}

function describeLoss(
  zone: { from: number; to: number; worst: number; diff: number },
  input: DetailLossInput,
  atCrest: boolean,
  repeats: boolean,
): EngineWarning {
  const at = { xFrom: zone.from * input.step, xTo: zone.to * input.step };
  const amount = Math.abs(zone.diff);
  const radius = Math.abs(graphCurvatureRadius(input.cutter, zone.worst, input.step));
  const where = `at x ${fixed(at.xFrom)}–${fixed(at.xTo)} mm${repeats ? `, and every ${fixed(input.period)} mm along the bar` : ''}`;
  const shape = `radius of curvature ${fixed(radius)} mm`;
  if (atCrest) {
    const message = `The follower rounds a crest of the bar ${where}: the cutter path's crest (${shape}) is narrower than the cutter (radius ${fixed(input.cutterRadius)} mm), and the engraved line loses ${fixed(amount)} mm there.`;
    return { code: 'detail-lost-follower', message, at, amount };
  }
  if (zone.diff < 0) {
    const message = `A valley of the cutter path ${where} (${shape}) is narrower than the cutter (radius ${fixed(input.cutterRadius)} mm) can cut for a follower of radius ${fixed(input.followerRadius)} mm: the engraved line loses ${fixed(amount)} mm there.`;
    return { code: 'detail-lost-cutter', message, at, amount };
  }
  const message = `The follower (radius ${fixed(input.followerRadius)} mm) cannot reach the bottom of a bar valley ${where}: the engraved line misses ${fixed(amount)} mm of its depth.`;
  return { code: 'detail-lost-follower', message, at, amount };
}

function fixed(v: number): number {
  return +v.toFixed(4);
}
