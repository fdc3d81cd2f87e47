import type { Point } from '../types';

/**
 * Points per stretch simplified on its own. A periodic path makes Ramer–Douglas–Peucker peel one
 * crest per split (ties go to the first), which costs points × crests: 110 s for a 150 000-point
 * bar of 3 600 crests. Stretches bound the cost by points × CHUNK and keep one extra point per stretch.
 */
export const SIMPLIFY_CHUNK_POINTS = 512;

/**
 * Drops points of a polyline that lie within `tolerance` of the chord between kept points
 * (Ramer–Douglas–Peucker, iterative, over stretches of SIMPLIFY_CHUNK_POINTS). Kept points are
 * original points, ends always kept. Same units in and out.
 */
export function simplifyPolyline(points: readonly Point[], tolerance: number): Point[] {
  if (points.length <= 2 || tolerance <= 0) return points.slice();
  const keep = new Uint8Array(points.length);
  keep[points.length - 1] = 1;
  const stack: Array<[number, number]> = [];
  for (let from = 0; from < points.length - 1; from += SIMPLIFY_CHUNK_POINTS) {
    keep[from] = 1;
    stack.push([from, Math.min(from + SIMPLIFY_CHUNK_POINTS, points.length - 1)]);
  }
  while (stack.length > 0) {
    const [from, to] = stack.pop()!;
    let worst = -1;
    let worstDistance = tolerance;
    for (let i = from + 1; i < to; i++) {
      const d = distanceToChord(points[i], points[from], points[to]);
      if (d > worstDistance) {
        worst = i;
        worstDistance = d;
      }
    }
    if (worst >= 0) {
      keep[worst] = 1;
      stack.push([from, worst], [worst, to]);
    }
  }
  return points.filter((_, i) => keep[i] === 1);
}

/** Distance from p to the segment a–b. */
export function distanceToChord(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const lengthSq = dx * dx + dy * dy;
  const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / lengthSq));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}
