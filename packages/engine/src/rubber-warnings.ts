import type { Rubber, Units } from '@barwright/contracts';
import { formatLength, formatLengthRange } from './length-format';
import type { RubberReading } from './rubber';
import type { EngineWarning } from './types';

export interface RubberWarningInput {
  /** Rosette radii with `pad` extra samples each side, as given to readRubber. */
  radii: Float64Array;
  pad: number;
  reading: RubberReading;
  rubber: Rubber;
  dTheta: number;
  /** Bar x of the first reading (mm) and bar travel per sample (mm). */
  firstX: number;
  step: number;
  leverRatio: number;
  /** Set when the readings are one period of a periodic sequence (period on the bar, mm). */
  period?: number;
  /** Units the messages are written in (the design file's); `at` and `amount` stay in mm. */
  units: Units;
}

interface Region {
  from: number;
  to: number;
  amount: number;
}

/**
 * Where the rubber loses the rosette's detail, from where it rests (the contact of each reading):
 * - a bridged valley: the contact jumps over profile points the rubber never touches; the amount is
 *   the largest gap between those points and the rubber bridging them;
 * - a rounded cusp (round rubber): the contact dwells on one point while the rubber swings about it
 *   through the angle 2β between the flanks' normals; the amount is ρ·(sec β − 1), how far the
 *   rubber's path stands below the sharp corner its flanks would make (for a valley bridged by a
 *   round rubber touching two straight flanks, the same formula gives the gap).
 * Amounts are bar heights (mm, times the lever ratio); the smallest reported is 0.1 % of the
 * readings' swing or 0.1 µm.
 */
export function rubberWarnings(input: RubberWarningInput): EngineWarning[] {
  const { s, contact } = input.reading;
  const n = s.length;
  const periodic = input.period !== undefined;
  const length = periodic ? 2 * n : n; // a periodic sequence is scanned twice round
  const c = new Int32Array(length);
  for (let i = 0; i < length; i++) c[i] = i + contact[i < n ? i : i - n];
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    lo = Math.min(lo, s[i]);
    hi = Math.max(hi, s[i]);
  }
  const threshold = Math.max(1e-4 / input.leverRatio, 1e-3 * (hi - lo));
  // A plain record, not the input spread with a closure: one shape for every call keeps the scans below optimised.
  const geometry: Geometry = { radii: input.radii, pad: input.pad, s, rubber: input.rubber, dTheta: input.dTheta, n, periodic, c };
  const bridges = bridgedValleys(geometry, length).filter((r) => r.amount > threshold);
  const cusps = input.rubber.shape === 'round' && input.rubber.radius > 0 ? roundedCusps(geometry, length, input.rubber.radius) : [];
  return [
    ...describe(keepOnce(bridges, n, input.period), input, 'valley-bridged'),
    ...describe(keepOnce(cusps.filter((r) => r.amount > threshold), n, input.period), input, 'cusp-rounded'),
  ];
}

/** The readings and the rosette they read; c[i] is the profile point reading i rests on (indices run on past n when periodic). */
interface Geometry {
  radii: Float64Array;
  pad: number;
  s: Float64Array;
  rubber: Rubber;
  dTheta: number;
  n: number;
  periodic: boolean;
  c: Int32Array;
}

/** Index i of a periodic sequence of n taken back into 0 … n−1; unchanged otherwise. */
function ring(g: Geometry, i: number): number {
  return g.periodic ? ((i % g.n) + g.n) % g.n : i;
}

function bridgedValleys(g: Geometry, length: number): Region[] {
  const regions: Region[] = [];
  for (let i = 0; i + 1 < length; i++) {
    if (g.c[i + 1] - g.c[i] < 2) continue;
    let gap = 0;
    for (let j = g.c[i] + 1; j < g.c[i + 1]; j++) gap = Math.max(gap, Math.min(gapTo(g, j, i), gapTo(g, j, i + 1)));
    const last = regions[regions.length - 1];
    if (last && g.c[i] <= last.to) [last.to, last.amount] = [g.c[i + 1], Math.max(last.amount, gap)];
    else regions.push({ from: g.c[i], to: g.c[i + 1], amount: gap });
  }
  return regions;
}

/** How far profile point j stays from the rubber resting at reading i (rosette length units). */
function gapTo(g: Geometry, j: number, i: number): number {
  const r = g.radii[g.pad + ring(g, j)];
  const si = g.s[ring(g, i)];
  const a = (j - i) * g.dTheta;
  if (g.rubber.shape === 'flat') return si - r * Math.cos(a);
  return Math.hypot(r * Math.cos(a) - si, r * Math.sin(a)) - g.rubber.radius;
}

/**
 * Runs of readings resting on the same profile point; a zone is a chain of such runs (of two or more
 * readings, on neighbouring points) holding at least one of three or more. Its swing is the turn of
 * the sampled profile's edge normals across the zone's points, exact for a corner on the samples.
 */
function roundedCusps(g: Geometry, length: number, rho: number): Region[] {
  const zones: { from: number; to: number; long: boolean }[] = [];
  let start = 0;
  for (let i = 1; i <= length; i++) {
    if (i < length && g.c[i] === g.c[i - 1]) continue;
    const size = i - start;
    const last = zones[zones.length - 1];
    if (size >= 2 && last && last.to === start - 1 && g.c[start] - g.c[last.to] === 1) [last.to, last.long] = [i - 1, last.long || size >= 3];
    else if (size >= 2) zones.push({ from: start, to: i - 1, long: size >= 3 });
    start = i;
  }
  return zones
    .filter((z) => z.long)
    .map(({ from, to }) => {
      const swing = edgeNormal(g, g.c[to]) - edgeNormal(g, g.c[from] - 1);
      return { from, to, amount: rho * (1 / Math.cos(Math.abs(swing) / 2) - 1) };
    });
}

/** Direction (rad) of the outward normal of the sampled profile's edge from point j to j + 1. */
function edgeNormal(g: Geometry, j: number): number {
  const r0 = g.radii[g.pad + ring(g, j)];
  const r1 = g.radii[g.pad + ring(g, j + 1)];
  const tx = r1 * Math.cos(g.dTheta) - r0;
  const ty = r1 * Math.sin(g.dTheta);
  return j * g.dTheta + Math.atan2(-tx, ty);
}

/*
 * keepOnce and describe are plain loops: the regions of a call may be none (an array V8 keeps as small
 * integers) or records, and the optimised Array map and filter calls met the other kind every few
 * edits, threw their code away and compiled it again (13 times in 30 edits, measured with --trace-deopt).
 */

/** For a periodic sequence scanned twice, keeps each region once (those starting in the middle period). */
function keepOnce(regions: Region[], n: number, period: number | undefined): Region[] {
  if (period === undefined) return regions;
  const kept: Region[] = [];
  for (let i = 0; i < regions.length; i++) {
    const r = regions[i];
    if (r.from >= n / 2 && r.from < n + n / 2) kept.push({ from: r.from % n, to: (r.from % n) + (r.to - r.from), amount: r.amount });
  }
  return kept;
}

function describe(regions: Region[], input: RubberWarningInput, code: 'valley-bridged' | 'cusp-rounded'): EngineWarning[] {
  const len = (mm: number) => formatLength(mm, input.units);
  const repeat = input.period === undefined ? '' : `, and every ${len(input.period)} along the bar`;
  const warnings: EngineWarning[] = [];
  for (let i = 0; i < regions.length; i++) {
    const r = regions[i];
    const amount = r.amount * input.leverRatio;
    const at = { xFrom: input.firstX + r.from * input.step, xTo: input.firstX + r.to * input.step };
    const where = `at x ${formatLengthRange(at.xFrom, at.xTo, input.units)}${repeat}`;
    const message =
      code === 'valley-bridged'
        ? `The rubber bridges a rosette valley narrower than itself ${where}: the bar misses ${len(amount)} of its depth.`
        : `The rubber rounds a sharp rosette crest ${where}: the bar's crest stands ${len(amount)} below the sharp corner.`;
    warnings.push({ code, message, at, amount });
  }
  return warnings;
}
