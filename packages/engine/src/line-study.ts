import type { Design } from '@barwright/contracts';
import { periodProfile } from './period-profile';
import { profileSamples } from './profile';
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

/** The line study with each line as interleaved x, y pairs (mm): the form the views and workers draw and hand over. */
export interface LineStudyXY extends Omit<LineStudy, 'lines'> {
  lines: { index: number; phase: number; xy: Float64Array }[];
}

/**
 * Line j is Y_j(x) = j·p + F(Δ_j − x): the follower path F (relative to its lowest point) mirrored,
 * as the work moves against the bar, and shifted by the schedule's phase Δ_j. With
 * `study.direction: 'as-bar'` (a machine that runs the other way) it is Y_j(x) = j·p + F(x + Δ_j). F is one period of an
 * endless bar (no end effects), decimated once to an error of 2 % of its height (at most 0.02 mm,
 * a tenth of a pixel on a whole-bar view and well inside the groove's stroke; at least 0.5 µm),
 * so each line is that template laid end to end. A given profile (in mm, as computeProfile returns
 * it; a companion's too) supplies that period when the bar holds one clear of its ends.
 */
export function computeLineStudy(design: Design, profile?: Profile): LineStudy {
  return withPoints(computeLineStudyXY(design, profile));
}

/** computeLineStudy with each line as one typed array of x, y pairs: no point objects (a study holds tens of thousands). */
export function computeLineStudyXY(design: Design, profile?: Profile): LineStudyXY {
  const mm = design.units === 'mm' ? design : toMm(design);
  const period = (profile && periodFromProfile(mm, profile)) ?? periodFromDesign(mm, profile?.step);
  return periodLineStudyXY(mm.study, period, mm.bar.length);
}

/**
 * The line study laid from one period of the follower path already computed (`line`, mm above its
 * lowest point, every `step` mm): what computeLineStudy does after computing that period, for a
 * caller that keeps the period (the sweep's thumbnails). `study` and `length` in mm.
 */
export function periodLineStudy(study: Design['study'], period: { line: ArrayLike<number>; step: number }, length: number): LineStudy {
  return withPoints(periodLineStudyXY(study, period, length));
}

/** periodLineStudy with each line as interleaved x, y pairs. */
export function periodLineStudyXY(study: Design['study'], period: { line: ArrayLike<number>; step: number }, length: number): LineStudyXY {
  const mirrored = lineTemplate(period);
  // F(x + Δ) = G(−Δ − x) with G(u) = F(−u): the same walk over the template read backwards.
  const asBar = study.direction === 'as-bar';
  const template = asBar ? reversed(mirrored) : mirrored;
  const { lineSpacing: spacing, lines: count, schedule, vAngle, depth } = study;
  const lines = Array.from({ length: count }, (_, index) => {
    // Reduced before use: a phase of 1e20 periods would leave the walk below without a step to take.
    const phase = reducedPhase(linePhase(schedule, index));
    const shift = (asBar ? 1 - phase : phase) * template.period; // −Δ taken as 1 − Δ, so the walk starts from a non-negative shift
    return { index, phase, xy: layLine(template, shift, index * spacing, length) };
  });
  return { spacing, width: vGrooveWidth(depth, vAngle), length, lines };
}

function withPoints(s: LineStudyXY): LineStudy {
  const lines = s.lines.map(({ index, phase, xy }) => {
    const points: Point[] = new Array(xy.length / 2);
    for (let i = 0; i < points.length; i++) points[i] = [xy[2 * i], xy[2 * i + 1]];
    return { index, phase, points };
  });
  return { spacing: s.spacing, width: s.width, length: s.length, lines };
}

/** Width of the groove a V-cutter of included angle `vAngle` (degrees) cuts at `depth`: 2·d·tan(α/2). */
export function vGrooveWidth(depth: number, vAngle: number): number {
  return 2 * depth * Math.tan((vAngle * Math.PI) / 360);
}

function lineTemplate(period: { line: ArrayLike<number>; step: number }): Template {
  const { line, step } = period;
  const m = line.length;
  const closed = new Float64Array(m + 1);
  closed.set(line);
  closed[m] = line[0];
  let top = 0;
  for (let i = 0; i < m; i++) top = Math.max(top, line[i]);
  const tolerance = Math.max(5e-4, Math.min(0.02, 0.02 * top));
  const keep = decimateGraph(closed, tolerance);
  return {
    period: m * step,
    u: Float64Array.from(keep, (i) => i * step),
    v: Float64Array.from(keep, (i) => closed[i]),
  };
}

interface PeriodLine {
  /** One period of the follower path from u = 0, minus its lowest value (mm). */
  line: Float64Array;
  step: number;
}

function periodFromDesign(design: Design, step: number | undefined): PeriodLine {
  const { grid, line } = periodProfile(design, step);
  return { line, step: grid.step };
}

/**
 * One period of a given profile's follower path, so that a companion's profile draws its own
 * study: taken from u = kP clear of the bar's ends (the path repeats exactly there), or undefined
 * when the bar is too short for that.
 */
function periodFromProfile(design: Design, profile: Profile): PeriodLine | undefined {
  const m = Math.round(profile.period / profile.step);
  if (Math.abs(m * profile.step - profile.period) > 1e-9 * profile.period || m < 2) return undefined;
  const margin = Math.ceil((design.cutter.diameter / 2 + design.follower.radius) / profile.step) + 2;
  const start = m * Math.ceil(margin / m);
  const typed = profileSamples(profile);
  if (start + m + margin >= (typed ? typed.follower.length : profile.followerPath.length)) return undefined;
  const line = typed ? typed.follower.slice(start, start + m) : Float64Array.from({ length: m }, (_, k) => profile.followerPath[start + k][1]);
  let low = Infinity;
  for (const v of line) low = Math.min(low, v);
  return { line: line.map((v) => v - low), step: profile.step };
}

/** G(u) = F(−u): vertices at P − u in reverse order (u[last] = P repeats u[0] = 0 either way). */
function reversed(t: Template): Template {
  const n = t.u.length;
  return {
    period: t.period,
    u: Float64Array.from({ length: n }, (_, i) => t.period - t.u[n - 1 - i]),
    v: Float64Array.from({ length: n }, (_, i) => t.v[n - 1 - i]),
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

/**
 * Y(x) = base + F(shift − x) for x from 0 to length as interleaved x, y pairs: walk the template
 * backwards in u, once to count the vertices and once to write them (no growing arrays).
 */
function layLine(t: Template, shift: number, base: number, length: number): Float64Array {
  const count = walkLine(t, shift, base, length, null);
  const xy = new Float64Array(2 * count);
  walkLine(t, shift, base, length, xy);
  return xy;
}

/** The walk of layLine: writes its points into `out` when given; returns how many there are. */
function walkLine(t: Template, shift: number, base: number, length: number, out: Float64Array | null): number {
  let n = 0;
  if (out) {
    out[0] = 0;
    out[1] = base + heightAt(t, shift);
  }
  n++;
  const last = t.u.length - 1; // u[last] = period repeats u[0]
  let origin = Math.floor(shift / t.period) * t.period;
  let k = last;
  while (k > 0 && origin + t.u[k] >= shift) k--;
  for (;;) {
    const x = shift - (origin + t.u[k]);
    if (x >= length) break;
    if (x > 0) {
      if (out) {
        out[2 * n] = x;
        out[2 * n + 1] = base + t.v[k];
      }
      n++;
    }
    if (--k < 0) {
      k = last - 1;
      origin -= t.period;
    }
  }
  if (out) {
    out[2 * n] = length;
    out[2 * n + 1] = base + heightAt(t, shift - length);
  }
  return n + 1;
}
