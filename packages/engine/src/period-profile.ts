import type { Design } from '@barwright/contracts';
import { barEdge, cutterHeights } from './bar';
import { barGrid, defaultPeriodStep, type BarGrid } from './bar-grid';
import { cutterPlacement, placementMargin, placePeriod } from './cutter-placement';
import { followerPath } from './follower';
import { trackRubber } from './rubber-track';
import { toMm } from './units';

/**
 * One period of an endless bar: cutter path, bar edge and follower path at x = i·h for i = 0 … M−1
 * (mm), free of the bar's ends. Heights are relative to the cutter path's lowest point; the follower
 * is also given relative to its own lowest point, as the engraved line reads it.
 */
export interface PeriodProfile {
  grid: BarGrid;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
  /** The follower path minus its lowest value. */
  line: Float64Array;
}

export function periodProfile(design: Design, step?: number): PeriodProfile {
  const mm = design.units === 'mm' ? design : toMm(design);
  const grid = barGrid(mm, step ?? defaultPeriodStep(mm));
  const m = grid.perPeriod;
  const track = trackRubber(mm, grid, 0, m - 1, design.units);
  let sMin = Infinity;
  for (const v of track.s) sMin = Math.min(sMin, v);
  const nominal = cutterHeights(track.s, mm.motion.leverRatio, sMin);
  const placement = cutterPlacement(mm);
  const cutter = placement ? placePeriod(placement, nominal, grid.step, placementMargin(placement, mm, grid.step)) : nominal;
  const rc = mm.cutter.diameter / 2;
  const rf = mm.follower.radius;
  const bar = periodicEnvelope(cutter, Math.ceil(rc / grid.step) + 1, (y) => barEdge(y, grid.step, rc));
  const follower = periodicEnvelope(bar, Math.ceil(rf / grid.step) + 1, (y) => followerPath(y, grid.step, rf));
  let fMin = Infinity;
  for (const v of follower) fMin = Math.min(fMin, v);
  const line = follower.map((v) => v - fMin);
  return { grid, cutter, bar, follower, line };
}

/**
 * Applies a windowed envelope to a periodic sequence by wrapping `pad` samples round each end (pad
 * at least the envelope's reach in samples, so every output sees all the samples it would on an
 * endless sequence).
 */
export function periodicEnvelope(values: Float64Array, pad: number, envelope: (y: Float64Array) => Float64Array): Float64Array {
  const m = values.length;
  const wrapped = new Float64Array(m + 2 * pad);
  for (let i = 0; i < wrapped.length; i++) wrapped[i] = values[((((i - pad) % m) + m) % m)];
  return envelope(wrapped).slice(pad, pad + m);
}
