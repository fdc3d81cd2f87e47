import { MM_PER_INCH, type Design } from '@barwright/contracts';
import type { Point, Profile } from '../types';

/**
 * A profile made by brute force for tests, independent of the engine's own computation:
 * the first layer's sine read by a point rubber, the bar edge as the lower envelope of the
 * cutter discs, the follower as the upper envelope of follower discs on the edge. mm.
 */
export function handMadeProfile(design: Design, step = 0.02): Profile {
  const k = design.units === 'in' ? MM_PER_INCH : 1;
  const layer = design.rosette.layers[0];
  const period = (design.motion.travelPerRev * k) / layer.lobes;
  const half = (layer.amplitude * k * design.motion.leverRatio) / 2;
  const length = design.bar.length * k;
  const rc = (design.cutter.diameter * k) / 2;
  const rf = design.follower.radius * k;
  const count = Math.round(length / step);
  const xs = Array.from({ length: count + 1 }, (_, i) => (i * length) / count);
  const pathAt = (x: number) => half * (1 + Math.cos((2 * Math.PI * x) / period + 2 * Math.PI * layer.phase));
  const cutterPath: Point[] = xs.map((x) => [x, pathAt(x)]);
  const barEdge: Point[] = xs.map((x) => [x, envelope(x, rc, (u) => pathAt(u), -1)]);
  const edgeAt = (u: number) => barEdge[Math.min(count, Math.max(0, Math.round((u / length) * count)))][1];
  const followerPath: Point[] = xs.map((x) => [x, envelope(x, rf, edgeAt, +1)]);
  return { period, step: length / count, cutterPath, barEdge, followerPath, minRadiusOfCurvature: 1, warnings: [] };
}

/** sign −1: min over discs centred on f of f(u) − √(r² − (u−x)²); sign +1: the max of f(u) + √(…). */
function envelope(x: number, r: number, f: (u: number) => number, sign: 1 | -1): number {
  if (r === 0) return f(x);
  let best = sign < 0 ? Infinity : -Infinity;
  const n = 200;
  for (let i = -n; i <= n; i++) {
    const d = (i / n) * r;
    const v = f(x + d) + sign * Math.sqrt(Math.max(0, r * r - d * d));
    best = sign < 0 ? Math.min(best, v) : Math.max(best, v);
  }
  return best;
}
