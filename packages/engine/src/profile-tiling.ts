import type { Design } from '@barwright/contracts';
import { barEdge, cutterHeights, invertHeights } from './bar';
import type { BarGrid } from './bar-grid';
import { cutterPlacement } from './cutter-placement';
import { followerPath } from './follower';
import { periodicEnvelope } from './period-profile';
import type { Companion } from './profile';
import { addEndToEdge, barPoints, followerOverBar, leadPaths, maxOf, minOf, newArray, type ArrayAllocator, type BarPaths } from './profile-paths';
import { rubberAt, trackRubber } from './rubber-track';

/** Fewest whole periods on the bar for tiling to be worth its set-up (below this the whole bar is cheap anyway). */
const MIN_PERIODS = 3;

/**
 * The bar's paths computed over one period and repeated along it, or undefined when the bar does not
 * allow it (then the whole bar is computed: fullBarPaths).
 *
 * Why it is the same bar: the grid's step divides the period exactly and the rubber is read once a
 * period (bar-grid.ts, rubber-track.ts), the lever ratio is constant, so the cutter path repeats
 * bit for bit at every node, the nodes the cutter runs past both ends included. The bar edge at a
 * node is the lowest of the cutter discs within rc, so it repeats too: one period's edge, computed
 * with rc wrapped round each end, is the edge at every node on the bar. The follower rides the
 * bar's own samples only, so it repeats except within rf of each end (and, when the bar's end lies
 * between nodes, within rc + rf of it, where the cutter at the end trims the edge): those stretches
 * are computed from the tiled edge as the whole computation does them. Heights are measured from
 * the lowest point on the bar, which lies in every period once the bar holds one.
 *
 * Not tiled: a cutter off the centre line or a rocking headstock (the displaced path is read back
 * by interpolation at positions that do not repeat bit for bit), and bars shorter than MIN_PERIODS
 * periods or than the follower's end stretches. Results agree with fullBarPaths to floating-point
 * noise (the envelopes' crossing points are computed from node indices that differ by whole
 * periods): profile-tiling.spec.ts.
 */
export function tiledBarPaths(d: Design, grid: BarGrid, companion: Companion | undefined, units: Design['units'], allocate: ArrayAllocator = newArray): BarPaths | undefined {
  const { step: h, lastNode, perPeriod: m } = grid;
  const rc = d.cutter.diameter / 2;
  const rf = d.follower.radius;
  const nodes = lastNode + 1;
  const offGrid = !grid.endOnGrid;
  const cutPad = Math.ceil(rc / h) + 1; // as fullBarPaths' margin without a placement
  const followPad = Math.ceil(rf / h) + 1;
  const headWidth = followPad;
  const tailWidth = followPad + (offGrid ? cutPad : 0);
  const headSpan = headWidth + followPad + 1;
  const tailSpan = tailWidth + followPad + 1;
  if (cutterPlacement(d) || nodes < MIN_PERIODS * m || nodes < headSpan + tailSpan) return undefined;

  // Nodes 0 … m: more than a period, so the rubber is read over one period with the same warnings as for the whole bar.
  const track = trackRubber(d, grid, 0, m, units);
  const sPeriod = track.s.subarray(0, m);
  const sEnd = offGrid ? rubberAt(d, grid, (2 * Math.PI * grid.length) / d.motion.travelPerRev) : NaN;
  const sMin = Math.min(minOf(sPeriod), offGrid ? sEnd : Infinity);
  let yPeriod = cutterHeights(sPeriod, d.motion.leverRatio, sMin);
  let yEnd = d.motion.leverRatio * (sEnd - sMin);
  if (companion === 'inverted' || companion === 'opposite') {
    const yMax = Math.max(maxOf(yPeriod), offGrid ? yEnd : -Infinity);
    yPeriod = invertHeights(yPeriod, yMax);
    yEnd = yMax - yEnd;
  }
  const edgePeriod = periodicEnvelope(yPeriod, cutPad, (y) => barEdge(y, h, rc));
  const cutterAt = (i: number) => yPeriod[((i % m) + m) % m];

  const x = barPoints(grid, allocate);
  const count = x.length;
  const cutter = allocate(count);
  const bar = allocate(count);
  tile(cutter, yPeriod, nodes);
  tile(bar, edgePeriod, nodes);
  if (offGrid) {
    cutter[count - 1] = yEnd;
    bar[count - 1] = addEndToEdge(bar, cutterAt, -cutPad, lastNode + cutPad, grid, rc, yEnd);
  }

  const follower = allocate(count);
  tile(follower, periodicEnvelope(edgePeriod, followPad, (y) => followerPath(y, h, rf)), nodes);
  // Near the ends the follower runs out of bar: its path there over the end stretches alone, which hold every sample within its reach.
  follower.set(followerPath(bar.subarray(0, headSpan), h, rf).subarray(0, headWidth));
  follower.set(followerPath(bar.subarray(nodes - tailSpan, nodes), h, rf).subarray(tailSpan - tailWidth), nodes - tailWidth);
  followerOverBar(bar, x, grid, rf, offGrid, follower);

  const leads = companion === undefined ? leadPaths(cutterAt, cutPad, grid, rc) : {};
  // Between the end stretches every path is the period copied (the cutter's end trims the edge within tailWidth of the end).
  const repeat = { every: m, from: headWidth, to: nodes - tailWidth };
  return { x, cutter, bar, follower, trackWarnings: track.warnings, onePeriod: sPeriod, leads, repeat };
}

/** Fills out[0 … n) with the period repeated from its first value. */
function tile(out: Float64Array, period: Float64Array, n: number): void {
  const m = Math.min(period.length, n);
  out.set(period.subarray(0, m));
  for (let filled = m; filled < n; filled *= 2) out.copyWithin(filled, 0, Math.min(filled, n - filled));
}
