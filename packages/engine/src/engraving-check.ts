import { formatLength, formatLengthRange } from './length-format';
import type { DetailLossInput } from './detail-loss';
import { extremesOf } from './path-repeat';
import type { EngineWarning } from './types';

/** The same nodes and radii the detail-loss check reads. */
export type EngravingCheckInput = DetailLossInput;

/**
 * The engraved line is the follower path (from its lowest point); the pattern the rosette asked for
 * is the cutter path (from its lowest point). With a follower of another radius than the cutter the
 * follower reads the parallel curve of the path at rf − rc, not the path: crests and valleys change
 * shape. Warns ('follower-radius') when the two differ by more than 0.1 % of the path's height (or
 * 0.1 µm): by how much at worst, where, and how many places a period.
 */
export function followerRadiusWarnings(input: EngravingCheckInput): EngineWarning[] {
  const { cutter: y, follower: f, from, to, step } = input;
  if (input.followerRadius === input.cutterRadius || to <= from) return [];
  // Over a tiled bar the extremes are read over one repeat (path-repeat.ts); the zones below still walk the whole stretch.
  const yLow = extremesOf(y, input.repeat, from, to + 1).low;
  const fLow = extremesOf(f, input.repeat, from, to + 1).low;
  // The scale is the path's height along the whole bar: the examined stretch can be short of a period.
  const { low, high } = extremesOf(y, input.repeat);
  const height = high - low;
  const threshold = Math.max(1e-4, 1e-3 * height);
  const zones: { from: number; to: number }[] = [];
  let worst = 0;
  let worstAt = -1;
  for (let i = from; i <= to; i++) {
    const diff = Math.abs(f[i] - fLow - (y[i] - yLow));
    if (diff <= threshold) continue;
    const last = zones[zones.length - 1];
    if (last && last.to === i - 1) last.to = i;
    else zones.push({ from: i, to: i });
    if (diff > worst) [worst, worstAt] = [diff, zones.length - 1];
  }
  if (worstAt < 0) return [];
  const perPeriod = input.period / step;
  const periodic = (to - from) * step > input.period;
  const onePeriod = periodic ? zones.filter((z) => z.from > from && z.from - from <= perPeriod) : zones;
  const inOnePeriod = Math.max(1, onePeriod.length);
  const toMm = (z: { from: number; to: number }) => ({ xFrom: z.from * step, xTo: z.to * step });
  const at = toMm(zones[worstAt]);
  const len = (mm: number) => formatLength(mm, input.units);
  const size = input.followerRadius < input.cutterRadius ? 'smaller' : 'larger';
  const often = periodic ? `, and every ${len(input.period)} along the bar (${inOnePeriod} such place${inOnePeriod > 1 ? 's' : ''} a period)` : '';
  const share = +((100 * worst) / height).toPrecision(2);
  const message =
    `The follower (radius ${len(input.followerRadius)}) is ${size} than the cutter (radius ${len(input.cutterRadius)}), so the engraved line is not the cutter path: ` +
    `it differs by up to ${len(worst)} (${share} % of the path's height) at x ${formatLengthRange(at.xFrom, at.xTo, input.units)}${often}. ` +
    `A follower of the cutter's radius reads the path back as cut.`;
  return [{ code: 'follower-radius', message, at, amount: worst, count: inOnePeriod, first: toMm(zones[0]), zones: (onePeriod.length ? onePeriod : zones).slice(0, 100).map(toMm) }];
}
