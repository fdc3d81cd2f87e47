import ClipperLib, { type Path } from 'clipper-lib';

/**
 * The bar edge and follower path computed independently with clipper-lib's polygon offsetting:
 * the region below the cutter path (a polygon through the samples, closed well below them) is
 * offset by −rc (erosion: the bar) and the result by +rf (dilation: where the follower's centre
 * can go); the top boundary of each is read back at the requested x. Coordinates are scaled to
 * integers (Clipper works on integer points); arcs are drawn to `arcTolerance` mm.
 */
export interface ClipperEnvelopeOptions {
  /** Integer units per mm. */
  scale?: number;
  /** Largest distance between a true arc and its chords (mm). */
  arcTolerance?: number;
}

export function clipperEnvelopes(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  cutterRadius: number,
  followerRadius: number,
  options: ClipperEnvelopeOptions = {},
): { bar: Path[]; follower: Path[]; scale: number } {
  const scale = options.scale ?? 1e5;
  const arc = (options.arcTolerance ?? 1e-4) * scale;
  const region = regionBelow(x, y, scale, 4 * (cutterRadius + followerRadius) + 1);
  const bar = offset([region], -cutterRadius * scale, arc);
  const follower = offset(bar, followerRadius * scale, arc);
  return { bar, follower, scale };
}

/** The highest point of the polygons' boundaries above each x (mm); −Infinity where none. */
export function topHeights(paths: Path[], scale: number, xs: ArrayLike<number>): Float64Array {
  const out = new Float64Array(xs.length).fill(-Infinity);
  const order = Array.from(xs, (v, i) => [v * scale, i] as const).sort((a, b) => a[0] - b[0]);
  const sorted = order.map((o) => o[0]);
  for (const path of paths) {
    for (let k = 0; k < path.length; k++) {
      const a = path[k];
      const b = path[(k + 1) % path.length];
      const [lo, hi] = a.X <= b.X ? [a, b] : [b, a];
      for (let j = lowerBound(sorted, lo.X); j < sorted.length && sorted[j] <= hi.X; j++) {
        const t = hi.X === lo.X ? 1 : (sorted[j] - lo.X) / (hi.X - lo.X);
        const yy = (hi.X === lo.X ? Math.max(lo.Y, hi.Y) : lo.Y + t * (hi.Y - lo.Y)) / scale;
        const i = order[j][1];
        if (yy > out[i]) out[i] = yy;
      }
    }
  }
  return out;
}

function regionBelow(x: ArrayLike<number>, y: ArrayLike<number>, scale: number, depth: number): Path {
  let low = Infinity;
  for (let i = 0; i < y.length; i++) low = Math.min(low, y[i]);
  const path: Path = Array.from({ length: x.length }, (_, i) => ({ X: Math.round(x[i] * scale), Y: Math.round(y[i] * scale) }));
  const bottom = Math.round((low - depth) * scale);
  path.push({ X: path[path.length - 1].X, Y: bottom }, { X: path[0].X, Y: bottom });
  return path;
}

function offset(paths: Path[], delta: number, arcTolerance: number): Path[] {
  const co = new ClipperLib.ClipperOffset(2, arcTolerance);
  co.AddPaths(paths, ClipperLib.JoinType.jtRound, ClipperLib.EndType.etClosedPolygon);
  const solution: Path[] = [];
  co.Execute(solution, delta);
  return solution;
}

function lowerBound(sorted: number[], v: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
