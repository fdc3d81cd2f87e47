import type { Units } from '@barwright/contracts';
import { graphCurvatureRadius } from './curvature';
import { formatLength, formatLengthRange } from './length-format';
import { extremesOf, type PathRepeat } from './path-repeat';
import type { EngineWarning } from './types';

export interface DetailLossInput {
  /** Cutter-centre heights and follower heights at the same nodes x = i·step (mm). */
  cutter: ArrayLike<number>;
  follower: ArrayLike<number>;
  step: number;
  cutterRadius: number;
  followerRadius: number;
  /** Nodes to examine (away from the bar's ends, where the follower runs out of bar). */
  from: number;
  to: number;
  /** Period on the bar (mm): zones repeating every period are reported once. */
  period: number;
  /** Units the messages are written in (the design file's); `at` and `amount` stay in mm. */
  units: Units;
  /** Where the paths repeat a period bit for bit (a tiled bar): the path's top is then read over one repeat. */
  repeat?: PathRepeat;
}

interface Zone {
  from: number;
  to: number;
  worst: number;
  diff: number;
}

/**
 * Where the engraved line loses the rosette's detail (amounts in mm, zones under 0.1 % of the
 * path's height or 0.1 µm are not reported):
 * - A perfect reading of the cutter path y by a follower of radius rf on a bar cut with radius rc is
 *   the parallel curve of y at distance δ = rf − rc (each point moved δ along its normal). The
 *   follower's departure from it, D, is detail lost: at a crest narrower than the cutter the cutter
 *   leaves a sharp ridge which the follower rounds (D < 0; r·(sec β − 1) for a sharp crest of flank
 *   angle β when rf = rc), and a follower too large for a valley bridges it (D > 0). Both are
 *   'detail-lost-follower'. With rf = rc the parallel curve is y itself and valleys come back exactly.
 * - A cutter larger than the follower cuts every valley rc − rf wider than the follower needs, so a
 *   valley of the path sharper than rc − rf reads blunter than the rosette made it:
 *   'detail-lost-cutter', by the largest change of the valley's shape within rc − rf of its bottom.
 */
export function detailLossWarnings(input: DetailLossInput): EngineWarning[] {
  const { cutter: y, step, from, to } = input;
  const top = extremesOf(y, input.repeat, from, to + 1).high;
  const threshold = Math.max(1e-4, 1e-3 * top);
  const zones = lossZones(input, threshold);
  // Zones repeat every period: keep those starting in one period, counted from a quiet node so that
  // a zone cut short by the start of the examined stretch is not taken for a whole one.
  const quiet = firstQuietNode(zones, from, to);
  const blunt = input.cutterRadius > input.followerRadius ? bluntValleys(input, threshold, quiet) : [];
  const repeats = (to - quiet) * step > input.period;
  const once = (z: Zone) => !repeats || (z.from >= quiet && (z.from - quiet) * step < input.period);
  return [
    ...zones.filter(once).map((z) => describe(z, input, y[z.worst] > top / 2 ? 'crest' : 'bridged', repeats)),
    ...blunt.filter(once).map((z) => describe(z, input, 'blunt', repeats)),
  ];
}

function firstQuietNode(zones: Zone[], from: number, to: number): number {
  let node = from;
  for (const z of zones) {
    if (z.from > node) break;
    node = Math.max(node, z.to + 1);
  }
  return Math.min(node, to);
}

/**
 * The node after which no zone can be reported: a period past the quiet node. Zones starting later
 * only repeat those of the period before (`detailLossWarnings` keeps those starting in one period),
 * so the scans stop there, once outside a zone: a third of the profile's time went on scanning the
 * whole bar for repeats that were then dropped.
 */
function lastStart(quiet: number, input: DetailLossInput): number {
  return quiet + Math.ceil(input.period / input.step);
}

/** Zones where the follower leaves the parallel curve of the cutter path at distance rf − rc. */
function lossZones(input: DetailLossInput, threshold: number): Zone[] {
  const { cutter: y, follower: f, step: h, from, to } = input;
  const delta = input.followerRadius - input.cutterRadius;
  const zones: Zone[] = [];
  // The quiet node is known once a node after the first is not in a zone starting at `from` (firstQuietNode).
  let end = Infinity;
  const start = Math.max(1, from);
  for (let i = start; i <= Math.min(to, y.length - 2); i++) {
    if (end === Infinity && i > start) {
      const first = zones[0];
      if (!first || first.from !== from) end = lastStart(from, input);
      else if (first.to < i - 1) end = lastStart(first.to + 1, input);
    }
    if (i > end && zones[zones.length - 1]?.to !== i - 1) break;
    const slope = (y[i + 1] - y[i - 1]) / (2 * h);
    const norm = Math.sqrt(1 + slope * slope);
    const at = i - (delta * slope) / norm / h; // the parallel point's x, in samples
    const k = Math.floor(at);
    if (k < 0 || k + 1 >= f.length) continue;
    const read = f[k] + (at - k) * (f[k + 1] - f[k]);
    const diff = read - (y[i] + delta / norm);
    if (Math.abs(diff) > threshold) grow(zones, i, diff);
  }
  return zones;
}

/** Valleys of the path sharper than rc − rf, with the change of their shape within rc − rf of the bottom. */
function bluntValleys(input: DetailLossInput, threshold: number, quiet: number): Zone[] {
  const { cutter: y, follower: f, step: h, from, to } = input;
  const excess = input.cutterRadius - input.followerRadius;
  const reach = Math.max(1, Math.round(excess / h));
  const zones: Zone[] = [];
  // A valley's zone starts `reach` before it: valleys past a period and a reach from the quiet node only repeat.
  const end = Math.min(to, y.length - 2, lastStart(quiet, input) + reach);
  for (let i = Math.max(1, from); i <= end; i++) {
    if (!(y[i] < y[i - 1] && y[i] <= y[i + 1])) continue;
    if (graphCurvatureRadius(y, i, h) >= excess) continue;
    let worst = 0;
    for (let j = Math.max(0, i - reach); j <= Math.min(y.length - 1, i + reach); j++) {
      const change = Math.abs(f[j] - f[i] - (y[j] - y[i]));
      if (change > Math.abs(worst)) worst = -change;
    }
    if (-worst > threshold) zones.push({ from: Math.max(0, i - reach), to: Math.min(y.length - 1, i + reach), worst: i, diff: worst });
  }
  return zones;
}

function grow(zones: Zone[], i: number, diff: number): void {
  const last = zones[zones.length - 1];
  if (last && last.to === i - 1) {
    last.to = i;
    if (Math.abs(diff) > Math.abs(last.diff)) [last.worst, last.diff] = [i, diff];
  } else zones.push({ from: i, to: i, worst: i, diff });
}

function describe(zone: Zone, input: DetailLossInput, kind: 'crest' | 'bridged' | 'blunt', repeats: boolean): EngineWarning {
  const at = { xFrom: zone.from * input.step, xTo: zone.to * input.step };
  const amount = Math.abs(zone.diff);
  const radius = Math.abs(graphCurvatureRadius(input.cutter, zone.worst, input.step));
  const len = (mm: number) => formatLength(mm, input.units);
  const where = `at x ${formatLengthRange(at.xFrom, at.xTo, input.units)}${repeats ? `, and every ${len(input.period)} along the bar` : ''}`;
  // A radius is named only where it explains the loss: finite, and (at a crest) tighter than the cutter.
  const named = Number.isFinite(radius) && (kind !== 'crest' || radius < input.cutterRadius);
  const shape = named ? ` (radius of curvature ${len(radius)})` : '';
  const rc = len(input.cutterRadius);
  const rf = len(input.followerRadius);
  if (kind === 'crest') {
    const message = `The follower rounds a crest of the bar ${where}: the cutter path's crest${shape} is narrower than the cutter (radius ${rc}), and the engraved line loses ${len(amount)} there.`;
    return { code: 'detail-lost-follower', message, at, amount };
  }
  if (kind === 'bridged') {
    const message = `The follower (radius ${rf}) cannot reach the bottom of a bar valley ${where}: the engraved line misses ${len(amount)} of its depth.`;
    return { code: 'detail-lost-follower', message, at, amount };
  }
  const message = `A valley of the cutter path ${where}${shape} is narrower than the cutter (radius ${rc}) cuts for a follower of radius ${rf}: the engraved line reads it blunter, by up to ${len(amount)}.`;
  return { code: 'detail-lost-cutter', message, at, amount };
}
