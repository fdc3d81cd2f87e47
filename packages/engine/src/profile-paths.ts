import type { Design } from '@barwright/contracts';
import { barEdge, cutterHeights, invertHeights } from './bar';
import { nodeX, type BarGrid } from './bar-grid';
import { cutterPlacement, placeCutter, placementMargin } from './cutter-placement';
import { followerAt, followerPath } from './follower';
import type { PathRepeat } from './path-repeat';
import type { Companion } from './profile';
import { rubberAt, trackRubber } from './rubber-track';
import type { EngineWarning, Point } from './types';

/**
 * The paths of a bar before the checks: its points x and the three paths on them, the rubber's
 * warnings, its readings over (at most) one period from node 0, and the lead-in and lead-out.
 */
export interface BarPaths {
  x: Float64Array;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
  trackWarnings: EngineWarning[];
  onePeriod: Float64Array;
  leads: { leadIn?: Point[]; leadOut?: Point[] };
  /** Where the three paths repeat a period bit for bit (a tiled bar), for figures that need read only one. */
  repeat?: PathRepeat;
}

/**
 * Where a profile's four output arrays come from: an array of the length asked (ProfileOptions.allocate).
 * It may hold an earlier computation's values: the engine writes every element (profile-allocate.spec.ts).
 */
export type ArrayAllocator = (length: number) => Float64Array;
export const newArray: ArrayAllocator = (length) => new Float64Array(length);

/** The paths over the whole bar: the rubber read at every node from a cutter radius before the start to one past the end. */
export function fullBarPaths(d: Design, grid: BarGrid, companion: Companion | undefined, units: Design['units'], allocate: ArrayAllocator = newArray): BarPaths {
  const { step: h, lastNode } = grid;
  const rc = d.cutter.diameter / 2;
  const rf = d.follower.radius;
  const placement = cutterPlacement(d);
  const margin = Math.ceil(rc / h) + 1 + placementMargin(placement, d, h); // the cutter runs past both ends of the bar
  const track = trackRubber(d, grid, -margin, lastNode + 1 + margin, units);
  const offGrid = !grid.endOnGrid;
  const sEnd = offGrid ? rubberAt(d, grid, (2 * Math.PI * grid.length) / d.motion.travelPerRev) : NaN;
  const onBar = track.s.subarray(margin, margin + lastNode + 1);
  const sMin = Math.min(minOf(onBar), offGrid ? sEnd : Infinity);
  let yExt = cutterHeights(track.s, d.motion.leverRatio, sMin);
  let yEnd = d.motion.leverRatio * (sEnd - sMin);
  if (placement) ({ y: yExt, yEnd } = placeCutter(placement, yExt, margin, grid));
  if (companion === 'inverted' || companion === 'opposite') {
    const yMax = Math.max(maxOf(yExt.subarray(margin, margin + lastNode + 1)), offGrid ? yEnd : -Infinity);
    yExt = invertHeights(yExt, yMax);
    yEnd = yMax - yEnd;
  }
  const edgeExt = barEdge(yExt, h, rc);
  const cutterAt = (i: number) => yExt[margin + i];
  const leads = companion === undefined ? leadPaths(cutterAt, margin, grid, rc) : {};
  const x = barPoints(grid, allocate);
  const count = x.length;
  const cutter = allocate(count);
  const bar = allocate(count);
  cutter.set(yExt.subarray(margin, margin + lastNode + 1));
  bar.set(edgeExt.subarray(margin, margin + lastNode + 1));
  if (offGrid) {
    cutter[count - 1] = yEnd;
    bar[count - 1] = addEndToEdge(bar, cutterAt, -margin, lastNode + margin, grid, rc, yEnd);
  }
  const follower = allocate(count);
  follower.set(followerPath(bar.subarray(0, lastNode + 1), h, rf));
  followerOverBar(bar, x, grid, rf, offGrid, follower);
  const onePeriod = track.s.subarray(-track.first, -track.first + Math.min(grid.perPeriod, lastNode + 1));
  return { x, cutter, bar, follower, trackWarnings: track.warnings, onePeriod, leads };
}

/** The bar's points: the nodes 0 … lastNode, then its end if off the grid (mm). */
export function barPoints(grid: BarGrid, allocate: ArrayAllocator = newArray): Float64Array {
  const count = grid.lastNode + 1 + (grid.endOnGrid ? 0 : 1);
  const x = allocate(count);
  const h = grid.step;
  for (let i = 0; i <= grid.lastNode; i++) x[i] = i * h; // as nodeX, whose last node may be the end
  x[count - 1] = grid.endOnGrid ? nodeX(grid, grid.lastNode) : grid.length;
  return x;
}

/**
 * The bar's end point lies between nodes: its edge is eroded by brute force over the cutter nodes
 * in reach (nodes first … last carry the cutter, cutterAt reads one), and the cutter at the end
 * trims the nodes near it.
 */
export function addEndToEdge(bar: Float64Array, cutterAt: (i: number) => number, first: number, last: number, grid: BarGrid, rc: number, yEnd: number): number {
  const { step: h, lastNode, length } = grid;
  let edge = yEnd - rc;
  // Only the nodes within rc of the end can reach it (one node of slack each side for rounding).
  const lo = Math.max(first, Math.floor((length - rc) / h) - 1);
  const hi = Math.min(last, Math.ceil((length + rc) / h) + 1);
  for (let i = lo; i <= hi; i++) {
    const dx = length - i * h;
    const reach = rc * rc - dx * dx;
    if (reach < 0) continue;
    edge = Math.min(edge, cutterAt(i) - Math.sqrt(reach));
    if (i >= 0 && i <= lastNode) bar[i] = Math.min(bar[i], yEnd - Math.sqrt(reach));
  }
  return edge;
}

/**
 * The cutter path beyond the bar's ends, within one cutter radius: the rosette carries the cutter on
 * there, and the bar edge near the ends is cut by those positions too, so an export that runs in and
 * out along them cuts the ends as the profile shows them. cutterAt reads the path at a node (negative
 * before the start); margin is how many nodes beyond each end it holds.
 */
export function leadPaths(cutterAt: (i: number) => number, margin: number, grid: BarGrid, rc: number): { leadIn: Point[]; leadOut: Point[] } {
  const h = grid.step;
  const reach = Math.min(margin - 1, Math.ceil(rc / h));
  const leadIn: Point[] = [];
  for (let i = -reach; i < 0; i++) leadIn.push([i * h, cutterAt(i)]);
  const leadOut: Point[] = [];
  for (let i = grid.lastNode + 1; i <= grid.lastNode + 1 + reach && i < grid.lastNode + 1 + margin; i++) leadOut.push([i * h, cutterAt(i)]);
  return { leadIn, leadOut };
}

/**
 * The follower over the bar's own points (in place): given its path over the nodes, the end point
 * (if off the grid) is added by brute force.
 */
export function followerOverBar(bar: Float64Array, x: Float64Array, grid: BarGrid, rf: number, offGrid: boolean, follower: Float64Array): void {
  const nodes = grid.lastNode + 1;
  if (!offGrid) return;
  const end = bar.length - 1;
  for (let i = 0; i < nodes; i++) {
    const dx = grid.length - x[i];
    if (dx <= rf) follower[i] = Math.max(follower[i], bar[end] + Math.sqrt(rf * rf - dx * dx));
  }
  const near = Math.max(0, nodes - Math.ceil(rf / grid.step) - 2);
  follower[end] = followerAt(grid.length, x.subarray(near), bar.subarray(near), rf);
}

export function minOf(values: Float64Array): number {
  let m = Infinity;
  for (let i = 0; i < values.length; i++) if (values[i] < m) m = values[i];
  return m;
}

export function maxOf(values: Float64Array): number {
  let m = -Infinity;
  for (let i = 0; i < values.length; i++) if (values[i] > m) m = values[i];
  return m;
}
