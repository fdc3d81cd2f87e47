import type { Rubber } from '@barwright/contracts';
import { rubberScanner, scan, type Scanner } from './rubber-scan';

/**
 * The rubber's displacement s(ψ) along the ray at angle ψ, read from a rosette sampled on a uniform
 * angular grid.
 *
 * Round rubber of radius ρ (its centre on the ray): a profile point at polar (r, φ) is within reach
 * when r·|sin(φ−ψ)| ≤ ρ, and touching it puts the centre at r·cos(φ−ψ) + √(ρ² − r²·sin²(φ−ψ)).
 * The rubber rests where that is largest, so s(ψ) is the maximum over the points within reach: the
 * exact outward parallel curve where the rosette allows it, bridging valleys narrower than the
 * rubber and rounding cusps. ρ = 0 reads r itself.
 *
 * Flat rubber of width w (face square to the ray): s(ψ) = max r·cos(φ−ψ) over points whose
 * projection on the face, r·|sin(φ−ψ)|, lies within w/2 — the support function, so it sees the
 * convex hull over the width of its face.
 */
export interface RubberReading {
  /** Displacement along the ray, same length unit as the radii. */
  s: Float64Array;
  /** Offset (in samples) from ψ to the profile point the rubber rests on. */
  contact: Int32Array;
}

/** Half-width in samples of the window of profile points a rubber can touch (at most a quarter turn). */
export function rubberReach(rubber: Rubber, minRadius: number, dTheta: number): number {
  const half = rubber.shape === 'round' ? rubber.radius : rubber.width / 2;
  if (half <= 0) return 0;
  const angle = half >= minRadius ? Math.PI / 2 : Math.asin(half / minRadius);
  return Math.min(Math.ceil(angle / dTheta) + 1, Math.ceil(Math.PI / 2 / dTheta));
}

/**
 * Reads the rubber at ψ_i for i = 0 … count−1 where `radii[pad + i]` is r(ψ_i), `radii` holding `pad`
 * extra samples on each side (pad ≥ rubberReach) at the same angular step `dTheta`. `radiusAt`, when
 * given, is the rosette itself at a fractional index into `radii` (index j is r at ψ_0 + (j − pad)·dTheta):
 * the refinement between samples then reads the true geometry and can never overshoot.
 */
export function readRubber(radii: Float64Array, pad: number, rubber: Rubber, dTheta: number, radiusAt?: (index: number) => number): RubberReading {
  const count = radii.length - 2 * pad;
  const rMin = Math.max(1e-12, minOf(radii));
  const reach = Math.min(pad, rubberReach(rubber, rMin, dTheta));
  const s = new Float64Array(count);
  const contact = new Int32Array(count);
  if (reach === 0) {
    s.set(radii.subarray(pad, pad + count));
    return { s, contact };
  }
  const scanner = rubberScanner(radii, rubber, rMin, reach, dTheta);
  const { cos, sin, touch } = scanner;
  let previous = 0;
  for (let i = 0; i < count; i++) {
    const centre = pad + i;
    // The contact moves little from one ψ to the next: the last one (one sample nearer now) is the first guess.
    const k = scan(scanner, centre, Math.max(-reach, Math.min(reach, previous - 1)));
    previous = k;
    const best = touch.at(radii[centre + k], cos[Math.abs(k)], sin[Math.abs(k)]);
    s[i] = refineMax(best, k, centre, scanner, dTheta, radiusAt);
    if (rubber.shape === 'flat' && radiusAt) s[i] = refineFaceEdge(s[i], k, centre, dTheta, rubber.width / 2, radiusAt);
    contact[i] = k;
  }
  return { s, contact };
}

/**
 * Refines the winner between its neighbours: the vertex of the parabola through the three samples
 * says where the true maximum lies. With the rosette itself (`radiusAt`) the rubber is placed there
 * exactly and kept only if it beats the best sample, so the result is always a real resting place:
 * never above the true maximum, exact to O(h³) at a smooth one. Without it the best sample stands:
 * the parabola's own value overshoots at a kink, such as the edge of a clipped wave's flat top.
 */
function refineMax(best: number, k: number, centre: number, sc: Scanner, dTheta: number, radiusAt: ((index: number) => number) | undefined): number {
  const { radii, cos, sin, touch } = sc;
  if (!radiusAt || Math.abs(k) + 1 > sc.reach) return best;
  // The neighbours written out rather than through a helper closure: one is made per reading otherwise.
  const before = touch.at(radii[centre + k - 1], cos[Math.abs(k - 1)], sin[Math.abs(k - 1)]);
  const after = touch.at(radii[centre + k + 1], cos[Math.abs(k + 1)], sin[Math.abs(k + 1)]);
  const curvature = before - 2 * best + after;
  if (!(curvature < 0) || !Number.isFinite(before) || !Number.isFinite(after)) return best;
  const p = (0.5 * (before - after)) / curvature;
  if (!(Math.abs(p) <= 0.5)) return best;
  const angle = Math.abs(k + p) * dTheta;
  const exact = touch.at(radiusAt(centre + k + p), Math.cos(angle), Math.sin(angle));
  return exact > best ? exact : best;
}

/**
 * A flat face often rests on its edge, on a flank steeper than the face: the best sample is then the
 * last one under the face, up to a sample short of the edge (on a steep flank that is r′·dθ low).
 * Where the next sample outward is beyond the edge, the edge's own resting place is found on the
 * rosette itself (bisection on r(φ)·sin(φ − ψ) = w/2, kept on the inner side) and kept if higher.
 */
function refineFaceEdge(value: number, k: number, centre: number, dTheta: number, half: number, radiusAt: (index: number) => number): number {
  let out = value;
  for (const dir of k === 0 ? [1, -1] : [Math.sign(k)]) {
    const inside = (u: number) => radiusAt(centre + dir * u) * Math.sin(u * dTheta) <= half;
    let lo = Math.abs(k);
    let hi = lo + 1;
    if (inside(hi)) continue; // the face's edge is not next to the winner
    for (let n = 0; n < 24; n++) {
      const mid = (lo + hi) / 2;
      if (inside(mid)) lo = mid;
      else hi = mid;
    }
    const v = radiusAt(centre + dir * lo) * Math.cos(lo * dTheta);
    if (v > out) out = v;
  }
  return out;
}

function minOf(values: Float64Array): number {
  let m = Infinity;
  for (const v of values) if (v < m) m = v;
  return m;
}
