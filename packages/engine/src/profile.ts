import type { Design } from '@barwright/contracts';
import { counterPhaseDesign } from './bar';
import { barGrid, coarseSamplingWarning, type BarGrid } from './bar-grid';
import { crestCurvature, type CrestCurvature } from './crest-curvature';
import { detailLossWarnings } from './detail-loss';
import { followerRadiusWarnings } from './engraving-check';
import { assertFinite, assertFiniteWarnings } from './finite-output';
import { extremesOf, stretchesToRead, type PathRepeat } from './path-repeat';
import { fullBarPaths, type ArrayAllocator } from './profile-paths';

export type { ArrayAllocator };
import { tiledBarPaths } from './profile-tiling';
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
  /**
   * Where the four output arrays (x, cutter, bar, follower) come from; each of the length asked, whatever
   * it holds (every element is written). By default new arrays. A browser worker that computes edit after edit passes
   * arrays the page has handed back: there a megabyte of fresh memory costs milliseconds to fault in.
   */
  allocate?: ArrayAllocator;
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
  return barSamples(design, options, true);
}

/**
 * `computeBarSamples`, by tiling one period along the bar when `tile` allows and the bar is long
 * and periodic enough (see tiledBarPaths), otherwise over the whole bar; exported for the spec that
 * compares the two.
 */
export function barSamples(design: Design, options: ProfileOptions, tile: boolean): BarSamples {
  const mm = design.units === 'mm' ? design : toMm(design);
  const d = options.companion === 'counter-phase' ? counterPhaseDesign(mm) : mm;
  const grid = barGrid(d, options.step);
  const { step: h, lastNode } = grid;
  const rc = d.cutter.diameter / 2;
  const rf = d.follower.radius;
  const paths = (tile && tiledBarPaths(d, grid, options.companion, design.units, options.allocate)) || fullBarPaths(d, grid, options.companion, design.units, options.allocate);
  const { x, cutter, bar, follower, repeat } = paths;
  const opposite = options.companion === 'opposite';
  // The loss analysis reads the follower up to |rf − rc| to the side: keep it clear of the bar's ends.
  const from = Math.min(lastNode, Math.ceil((rf + Math.abs(rf - rc)) / h) + 2);
  const to = Math.max(from, lastNode - from);
  const loss = detailLossWarnings({
    ...{ cutter, follower, step: h, cutterRadius: rc, followerRadius: rf, from, to },
    ...{ period: grid.period, units: design.units, repeat },
  });
  const coarse = coarseSamplingWarning(d, grid, design.units, options.step);
  const engraving = followerRadiusWarnings({ cutter, follower, step: h, cutterRadius: rc, followerRadius: rf, from, to, period: grid.period, units: design.units, repeat });
  const { low, high } = extremesOf(cutter, repeat);
  const summary = { height: high - low, period: grid.period, periodic: lastNode >= grid.perPeriod, length: grid.length, units: design.units };
  const warnings = summarizeWarnings([...(coarse ? [coarse] : []), ...paths.trackWarnings, ...loss, ...engraving], summary);
  if (opposite) turnOver(cutter, bar, follower, high);
  const crest = crestCurvature({ design: d, s: paths.onePeriod, dTheta: grid.dTheta, step: h, inverted: options.companion !== undefined && options.companion !== 'counter-phase' });
  // The points rise by i·h, so they are finite when their ends are; a path that repeats is finite when one repeat is.
  for (const i of [0, lastNode, x.length - 1]) assertFinite('x', x, i, i + 1);
  for (const [what, values] of [['cutter path', cutter], ['bar edge', bar], ['follower path', follower]] as const) assertFinitePath(what, values, repeat);
  assertFiniteWarnings(warnings); // the smallest crest radius may be Infinity: a straight bar
  return { grid, x, cutter, bar, follower, minRadiusOfCurvature: crest.radius, crest, warnings, ...paths.leads };
}

/**
 * The opposite blank, from the inverted companion (the same bar turned over): mirrored back, its
 * edge is the upper envelope of the cutter disc and its follower rides under it (in place).
 */
function turnOver(cutter: Float64Array, bar: Float64Array, follower: Float64Array, yMax: number): void {
  for (const y of [cutter, bar, follower]) for (let i = 0; i < y.length; i++) y[i] = yMax - y[i];
}

/** assertFinite over a path, reading one repeat of a repeated run. */
function assertFinitePath(what: string, values: Float64Array, repeat: PathRepeat | undefined): void {
  for (const [start, end] of stretchesToRead(0, values.length, repeat)) assertFinite(what, values, start, end);
}
