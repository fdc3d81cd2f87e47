import type { Design } from '@barwright/contracts';
import { barEdge, counterPhaseDesign, cutterHeights, invertHeights } from './bar';
import { barGrid, coarseSamplingWarning, nodeX, type BarGrid } from './bar-grid';
import { crestCurvature, type CrestCurvature } from './crest-curvature';
import { cutterPlacement, placeCutter, placementMargin } from './cutter-placement';
import { detailLossWarnings } from './detail-loss';
import { followerRadiusWarnings } from './engraving-check';
import { assertFinite, assertFiniteWarnings } from './finite-output';
import { followerAt, followerPath } from './follower';
import { rubberAt, trackRubber } from './rubber-track';
import type { EngineWarning, Point, Profile } from './types';
import { toMm } from './units';
import { summarizeWarnings } from './warning-summary';

export type Companion = 'counter-phase' | 'inverted' | 'opposite';
export const COMPANIONS: readonly Companion[] = ['counter-phase', 'inverted', 'opposite'];

export interface ProfileOptions {
  /** Sampling interval along x (mm); the grid uses the largest step not above it that divides the period. */
  step?: number;
  /**
   * Compute a companion bar instead: shifted half a period, mirrored top to bottom, or the
   * opposite blank of the same cut (above the cutter: the upper envelope, the follower under it).
   */
  companion?: Companion;
}

/** The profile as typed arrays over the points x (mm): the nodes on the bar, then its end if off the grid. */
export interface BarSamples {
  grid: BarGrid;
  x: Float64Array;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
  minRadiusOfCurvature: number;
  crest: CrestCurvature;
  warnings: EngineWarning[];
  /** The cutter path within one cutter radius beyond each end (mm), where its cut still reaches the bar; not for companions. */
  leadIn?: Point[];
  leadOut?: Point[];
}

/**
 * Cutter path, bar edge and follower path of a validated design: numbers in mm whatever the file's
 * units, warning messages in the file's units. The work runs on typed arrays (computeBarSamples);
 * the three Point arrays are built when first read (a bar of 150 000 points makes 450 000 small
 * arrays, which cost more than the computation and weigh on the garbage collector), and
 * `profileSamples` hands the typed arrays to readers that want them.
 */
export function computeProfile(design: Design, options: ProfileOptions = {}): Profile {
  const samples = computeBarSamples(design, options);
  // The paths hold their places (key order, as JSON shows them) and become lazy just below.
  const profile = {
    period: samples.grid.period,
    step: samples.grid.step,
    cutterPath: [],
    barEdge: [],
    followerPath: [],
    minRadiusOfCurvature: samples.minRadiusOfCurvature,
    crest: samples.crest,
    ...(samples.leadIn ? { leadIn: samples.leadIn, leadOut: samples.leadOut } : {}),
    warnings: samples.warnings,
  } as Profile;
  const { x, cutter, bar, follower } = samples;
  lazyPoints(profile, 'cutterPath', x, cutter);
  lazyPoints(profile, 'barEdge', x, bar);
  lazyPoints(profile, 'followerPath', x, follower);
  // Not enumerable: a copy made by spreading (a caller changing a path) does not carry stale arrays.
  Object.defineProperty(profile, TYPED, { value: { x, cutter, bar, follower } satisfies ProfileSamples, enumerable: false });
  return profile;
}

/** The paths of a profile as typed arrays (mm) on its x grid. */
export interface ProfileSamples {
  x: Float64Array;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
}

const TYPED = Symbol('profile samples');

/** The typed arrays behind a profile computeProfile returned (read-only by contract); undefined for a profile made otherwise or copied. */
export function profileSamples(profile: Profile): ProfileSamples | undefined {
  return (profile as Profile & { [TYPED]?: ProfileSamples })[TYPED];
}

/** An enumerable property that builds its Point array on first read, then holds it as a plain value (assignable). */
function lazyPoints(profile: Profile, key: 'cutterPath' | 'barEdge' | 'followerPath', x: Float64Array, y: Float64Array): void {
  const settle = (value: Point[]) => Object.defineProperty(profile, key, { value, writable: true, enumerable: true, configurable: true });
  Object.defineProperty(profile, key, {
    enumerable: true,
    configurable: true,
    get() {
      const out: Point[] = [];
      for (let i = 0; i < y.length; i++) out.push([x[i], y[i]]);
      settle(out);
      return out;
    },
    set: settle,
  });
}

/** The counter-phase companion's profile (the bar shifted half a period). */
export function counterPhaseProfile(design: Design, options: Omit<ProfileOptions, 'companion'> = {}): Profile {
  return computeProfile(design, { ...options, companion: 'counter-phase' });
}

/** The inverted companion's profile (the cutter path mirrored top to bottom, then cut afresh). */
export function invertedProfile(design: Design, options: Omit<ProfileOptions, 'companion'> = {}): Profile {
  return computeProfile(design, { ...options, companion: 'inverted' });
}

/**
 * The opposite blank of the same cut (the blank above the cutter): its edge is the upper envelope of
 * the cutter disc, not the bar edge mirrored; turned over it is the inverted companion.
 */
export function oppositeProfile(design: Design, options: Omit<ProfileOptions, 'companion'> = {}): Profile {
  return computeProfile(design, { ...options, companion: 'opposite' });
}

/** The same computation as `computeProfile`, returning typed arrays (for batches and exports). */
export function computeBarSamples(design: Design, options: ProfileOptions = {}): BarSamples {
  const mm = design.units === 'mm' ? design : toMm(design);
  const d = options.companion === 'counter-phase' ? counterPhaseDesign(mm) : mm;
  const grid = barGrid(d, options.step);
  const { step: h, lastNode } = grid;
  const rc = d.cutter.diameter / 2;
  const rf = d.follower.radius;
  const placement = cutterPlacement(d);
  const margin = Math.ceil(rc / h) + 1 + placementMargin(placement, d, h); // the cutter runs past both ends of the bar
  const track = trackRubber(d, grid, -margin, lastNode + 1 + margin, design.units);
  const offGrid = !grid.endOnGrid;
  const sEnd = offGrid ? rubberAt(d, grid, (2 * Math.PI * grid.length) / d.motion.travelPerRev) : NaN;
  const onBar = track.s.subarray(margin, margin + lastNode + 1);
  const sMin = Math.min(minOf(onBar), offGrid ? sEnd : Infinity);
  let yExt = cutterHeights(track.s, d.motion.leverRatio, sMin);
  let yEnd = d.motion.leverRatio * (sEnd - sMin);
  if (placement) ({ y: yExt, yEnd } = placeCutter(placement, yExt, margin, grid));
  const opposite = options.companion === 'opposite';
  if (options.companion === 'inverted' || opposite) {
    const yMax = Math.max(maxOf(yExt.subarray(margin, margin + lastNode + 1)), offGrid ? yEnd : -Infinity);
    yExt = invertHeights(yExt, yMax);
    yEnd = yMax - yEnd;
  }
  const edgeExt = barEdge(yExt, h, rc);
  const leads = options.companion === undefined ? leadPaths(yExt, margin, grid, rc) : {};
  const count = lastNode + 1 + (offGrid ? 1 : 0);
  const x = new Float64Array(count);
  for (let i = 0; i < count; i++) x[i] = i > lastNode ? grid.length : nodeX(grid, i);
  const cutter = new Float64Array(count);
  const bar = new Float64Array(count);
  cutter.set(yExt.subarray(margin, margin + lastNode + 1));
  bar.set(edgeExt.subarray(margin, margin + lastNode + 1));
  if (offGrid) {
    cutter[count - 1] = yEnd;
    bar[count - 1] = addEndToEdge(bar, yExt, margin, grid, rc, yEnd);
  }
  const follower = followerOverBar(bar, x, grid, rf, offGrid);
  // The loss analysis reads the follower up to |rf − rc| to the side: keep it clear of the bar's ends.
  const from = Math.min(lastNode, Math.ceil((rf + Math.abs(rf - rc)) / h) + 2);
  const to = Math.max(from, lastNode - from);
  const loss = detailLossWarnings({
    ...{ cutter, follower, step: h, cutterRadius: rc, followerRadius: rf, from, to },
    ...{ period: grid.period, units: design.units },
  });
  const coarse = coarseSamplingWarning(d, grid, design.units, options.step);
  const engraving = followerRadiusWarnings({ cutter, follower, step: h, cutterRadius: rc, followerRadius: rf, from, to, period: grid.period, units: design.units });
  const summary = { height: maxOf(cutter) - minOf(cutter), period: grid.period, periodic: lastNode >= grid.perPeriod, length: grid.length, units: design.units };
  const warnings = summarizeWarnings([...(coarse ? [coarse] : []), ...track.warnings, ...loss, ...engraving], summary);
  if (opposite) turnOver(cutter, bar, follower);
  const onePeriod = track.s.subarray(-track.first, -track.first + Math.min(grid.perPeriod, lastNode + 1));
  const crest = crestCurvature({ design: d, s: onePeriod, dTheta: grid.dTheta, step: h, inverted: options.companion !== undefined && options.companion !== 'counter-phase' });
  for (const [what, values] of [['x', x], ['cutter path', cutter], ['bar edge', bar], ['follower path', follower]] as const) assertFinite(what, values);
  assertFiniteWarnings(warnings); // the smallest crest radius may be Infinity: a straight bar
  return { grid, x, cutter, bar, follower, minRadiusOfCurvature: crest.radius, crest, warnings, ...leads };
}

/**
 * The bar's end point lies between nodes: its edge is eroded by brute force over the cutter nodes
 * in reach, and the cutter at the end trims the nodes near it.
 */
function addEndToEdge(bar: Float64Array, yExt: Float64Array, margin: number, grid: BarGrid, rc: number, yEnd: number): number {
  const { step: h, lastNode, length } = grid;
  let edge = yEnd - rc;
  for (let j = 0; j < yExt.length; j++) {
    const dx = length - (j - margin) * h;
    const reach = rc * rc - dx * dx;
    if (reach < 0) continue;
    edge = Math.min(edge, yExt[j] - Math.sqrt(reach));
    const i = j - margin;
    if (i >= 0 && i <= lastNode) bar[i] = Math.min(bar[i], yEnd - Math.sqrt(reach));
  }
  return edge;
}

/**
 * The cutter path beyond the bar's ends, within one cutter radius: the rosette carries the cutter on
 * there, and the bar edge near the ends is cut by those positions too, so an export that runs in and
 * out along them cuts the ends as the profile shows them.
 */
function leadPaths(yExt: Float64Array, margin: number, grid: BarGrid, rc: number): { leadIn: Point[]; leadOut: Point[] } {
  const h = grid.step;
  const reach = Math.min(margin - 1, Math.ceil(rc / h));
  const leadIn: Point[] = [];
  for (let i = -reach; i < 0; i++) leadIn.push([i * h, yExt[margin + i]]);
  const leadOut: Point[] = [];
  for (let i = grid.lastNode + 1; i <= grid.lastNode + 1 + reach && margin + i < yExt.length; i++) leadOut.push([i * h, yExt[margin + i]]);
  return { leadIn, leadOut };
}

/** The follower over the bar's own points, the end point (if off the grid) included by brute force. */
function followerOverBar(bar: Float64Array, x: Float64Array, grid: BarGrid, rf: number, offGrid: boolean): Float64Array {
  const nodes = grid.lastNode + 1;
  const follower = new Float64Array(bar.length);
  follower.set(followerPath(bar.subarray(0, nodes), grid.step, rf));
  if (!offGrid) return follower;
  const end = bar.length - 1;
  for (let i = 0; i < nodes; i++) {
    const dx = grid.length - x[i];
    if (dx <= rf) follower[i] = Math.max(follower[i], bar[end] + Math.sqrt(rf * rf - dx * dx));
  }
  const near = Math.max(0, nodes - Math.ceil(rf / grid.step) - 2);
  follower[end] = followerAt(grid.length, x.subarray(near), bar.subarray(near), rf);
  return follower;
}

/**
 * The opposite blank, from the inverted companion (the same bar turned over): mirrored back, its
 * edge is the upper envelope of the cutter disc and its follower rides under it (in place).
 */
function turnOver(cutter: Float64Array, bar: Float64Array, follower: Float64Array): void {
  const yMax = maxOf(cutter);
  for (const y of [cutter, bar, follower]) for (let i = 0; i < y.length; i++) y[i] = yMax - y[i];
}

function minOf(values: Float64Array): number {
  let m = Infinity;
  for (const v of values) if (v < m) m = v;
  return m;
}

function maxOf(values: Float64Array): number {
  let m = -Infinity;
  for (const v of values) if (v > m) m = v;
  return m;
}
