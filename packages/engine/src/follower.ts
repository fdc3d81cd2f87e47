import { upperDiscEnvelope } from './disc-envelope';

/**
 * The path of the follower's centre, a disc of radius rf riding on top of the bar edge sampled every
 * `step` mm: the upper envelope of the disc over the edge (dilation). Only the bar's own samples
 * carry the follower, so pass the edge over the bar's length and no further.
 */
export function followerPath(edge: Float64Array, step: number, followerRadius: number): Float64Array {
  return upperDiscEnvelope(edge, step, followerRadius);
}

/**
 * The follower's height at x (mm) over edge points (xs, ys), by brute force over the points within
 * reach: for single points off the uniform grid (the bar's end).
 */
export function followerAt(x: number, xs: ArrayLike<number>, ys: ArrayLike<number>, followerRadius: number): number {
  let best = -Infinity;
  for (let j = 0; j < xs.length; j++) {
    const d = x - xs[j];
    const reach = followerRadius * followerRadius - d * d;
    if (reach >= 0) best = Math.max(best, ys[j] + Math.sqrt(reach));
  }
  return best;
}
