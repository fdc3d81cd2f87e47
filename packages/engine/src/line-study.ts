import type { Design } from '@barwright/contracts';
import { periodProfile } from './period-profile';
import { linePhase, reducedPhase } from './phase-schedule';
import { decimateGraph } from './polyline-decimate';
import type { Point, Profile } from './types';
import { toMm } from './units';

/** The engraved lines a bar produces on the straight-line machine (mm). */
export interface LineStudy {
  /** Line spacing (mm). */
  spacing: number;
  /** V-groove width, 2·depth·tan(vAngle/2) (mm). */
  width: number;
  /** Length of each line (mm), the bar's length. */
  length: number;
  lines: { index: number; phase: number /* fraction of the period */; points: Point[] }[];
}

/** One period of the engraved wave, decimated for drawing: vertices at u (0 … P) with heights v. */
interface Template {
  period: number;
  u: Float64Array;
  v: Float64Array;
}

/**
 * Line j is Y_j(x) = j·p + F(Δ_j − x): the follower path F (relative to its lowest point) mirrored,
 * as the work moves against the bar, and shifted by the schedule's phase Δ_j. F is one period of an
 * endless bar (no end effects), decimated once to an error of 1 % of its height (0.5 µm to 10 µm,
 * below what a 1:1 print resolves),
 * so each line is that template laid end to end. Passing the profile reuses its sampling step.
 */
export function computeLineStudy(design: Design, profile?: Profile): LineStudy {
  const mm = design.units === 'mm' ? design : toMm(design);
  const template = lineTemplate(mm, profile?.step);
  const { lineSpacing: spacing, lines: count, schedule, vAngle, depth } = mm.study;
  const length = mm.bar.length;
  const lines = Array.from({ length: count }, (_, index) => {
    const phase = linePhase(schedule, index);
    return { index, phase: reducedPhase(phase), points: layLine(template, phase * template.period, index * spacing, length) };
  });
  return { spacing, width: vGrooveWidth(depth, vAngle), length, lines };
}

/** Width of the groove a V-cutter of included angle `vAngle` (degrees) cuts at `depth`: 2·d·tan(α/2). */
export function vGrooveWidth(depth: number, vAngle: number): number {
  return 2 * depth * Math.tan((vAngle * Math.PI) / 360);
}

function lineTemplate(design: Design, step: number | undefined): Template {
  const { grid, line } = periodProfile(design, step);
  const m = grid.perPeriod;
  const closed = new Float64Array(m + 1);
  closed.set(line);
  closed[m] = line[0];
  let top = 0;
  for (const v of line) top = Math.max(top, v);
  const tolerance = Math.min(0.01, Math.max(5e-4, 0.01 * top));
  const keep = decimateGraph(closed, tolerance);
  return {
    period: grid.period,
    u: Float64Array.from(keep, (i) => i * grid.step),
    v: Float64Array.from(keep, (i) => closed[i]),
  };
}

/** The template's height at u (mm, any real), linear between its vertices like the drawn polyline. */
function heightAt(t: Template, u: number): number {
  const local = u - Math.floor(u / t.period) * t.period;
  let k = 1;
  while (k < t.u.length - 1 && t.u[k] < local) k++;
  const w = (local - t.u[k - 1]) / (t.u[k] - t.u[k - 1]);
  return t.v[k - 1] + w * (t.v[k] - t.v[k - 1]);
}

/** Points of Y(x) = base + F(shift − x) for x from 0 to length: walk the template backwards in u. */
function layLine(t: Template, shift: number, base: number, length: number): Point[] {
  const xs: number[] = [0];
  const ys: number[] = [heightAt(t, shift)];
  const last = t.u.length - 1; // u[last] = period repeats u[0]
  let origin = Math.floor(shift / t.period) * t.period;
  let k = last;
  while (k > 0 && origin + t.u[k] >= shift) k--;
  for (;;) {
    const x = shift - (origin + t.u[k]);
    if (x >= length) break;
    if (x > 0) {
      xs.push(x);
      ys.push(t.v[k]);
    }
    if (--k < 0) {
      k = last - 1;
      origin -= t.period;
    }
  }
  xs.push(length);
  ys.push(heightAt(t, shift - length));
  // Filled in place: fewer reallocations of the many small tuples a study holds.
  const points: Point[] = new Array(xs.length);
  for (let i = 0; i < xs.length; i++) points[i] = [xs[i], base + ys[i]];
  return points;
}
