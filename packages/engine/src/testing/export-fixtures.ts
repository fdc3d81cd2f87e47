import { EXAMPLE_DESIGN, MM_PER_INCH, type Design } from '@barwright/contracts';
import type { Point, Profile } from '../types';
import { handMadeProfile } from './hand-made-profile';

/** The demo bar and a profile made independently of the engine, for the export specs (mm). */
export const demoDesign: Design = EXAMPLE_DESIGN;
export const demoProfile: Profile = handMadeProfile(EXAMPLE_DESIGN, 0.05);

/** The same bar in inches: inch = 25.4 mm exactly (NIST). */
export function demoInInches(): Design {
  const i = (mm: number) => mm / MM_PER_INCH;
  const d = EXAMPLE_DESIGN;
  return {
    ...d,
    units: 'in',
    rosette: { baseRadius: i(50), layers: [{ ...d.rosette.layers[0], amplitude: i(1.5) }] },
    rubber: { shape: 'round', radius: i(1) },
    motion: { travelPerRev: i(100), leverRatio: 1 },
    cutter: { diameter: 3 / 16, flutes: 2 },
    bar: { ...d.bar, length: i(150), thickness: 5 / 16 },
    follower: { radius: 3 / 32 },
    study: { ...d.study, lineSpacing: i(0.45), depth: i(0.1) },
    plan: { stepOver: 0.003, cleanup: i(0.25), travelSpeed: i(100) },
  };
}

/** Linear interpolation of a path (x increasing) at x. */
export function yAt(path: readonly Point[], x: number): number {
  let lo = 0;
  let hi = path.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (path[mid][0] <= x) lo = mid;
    else hi = mid;
  }
  const [x0, y0] = path[lo];
  const [x1, y1] = path[hi];
  return x1 === x0 ? y0 : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/**
 * Largest distance from the points of a reference path to a drawn polyline (x increasing), measured
 * to the nearest of the segments around the point's x. `scale` is drawn units per reference unit.
 */
export function largestGap(reference: readonly Point[], drawn: readonly Point[], scale = 1): number {
  const scaled = drawn.map(([x, y]): Point => [x * scale, y * scale]);
  return reference.reduce((worst, p) => Math.max(worst, distanceToPolyline(p, scaled)), 0);
}

function distanceToPolyline(p: Point, line: readonly Point[]): number {
  let i = 0;
  let hi = line.length - 1;
  while (hi - i > 1) {
    const mid = (i + hi) >> 1;
    if (line[mid][0] <= p[0]) i = mid;
    else hi = mid;
  }
  let best = Infinity;
  for (let j = Math.max(0, i - 2); j < Math.min(line.length - 1, i + 3); j++) {
    best = Math.min(best, segmentDistance(p, line[j], line[j + 1]));
  }
  return best;
}

function segmentDistance(p: Point, a: Point, b: Point): number {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const t = Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}
