import type { Rubber } from '@barwright/contracts';

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
  const reach = Math.min(pad, rubberReach(rubber, Math.max(1e-12, minOf(radii)), dTheta));
  const s = new Float64Array(count);
  const contact = new Int32Array(count);
  if (reach === 0) {
    s.set(radii.subarray(pad, pad + count));
    return { s, contact };
  }
  const cos = Float64Array.from({ length: reach + 1 }, (_, k) => Math.cos(k * dTheta));
  const sin = Float64Array.from({ length: reach + 1 }, (_, k) => Math.sin(k * dTheta));
  const touch = rubber.shape === 'round' ? roundTouch(rubber.radius) : flatTouch(rubber.width / 2);
  const scan = rubber.shape === 'round' ? scanRound : scanFlat;
  const half = rubber.shape === 'round' ? rubber.radius : rubber.width / 2;
  for (let i = 0; i < count; i++) {
    const centre = pad + i;
    const k = scan(radii, centre, reach, cos, sin, half);
    const best = touch.at(radii[centre + k], cos[Math.abs(k)], sin[Math.abs(k)]);
    s[i] = refineMax(best, k, centre, radii, reach, cos, sin, touch, dTheta, radiusAt);
    contact[i] = k;
  }
  return { s, contact };
}

/** Offset of the point a round rubber rests on; points that cannot beat the best (r·cos + ρ ≤ best) skip the root. */
function scanRound(radii: Float64Array, centre: number, reach: number, cos: Float64Array, sin: Float64Array, rho: number): number {
  const rho2 = rho * rho;
  let best = radii[centre] + rho;
  let bestK = 0;
  for (let k = 1; k <= reach; k++) {
    const c = cos[k];
    const sn = sin[k];
    let r = radii[centre - k];
    if (r * c + rho > best) {
      const q = r * sn;
      const d = rho2 - q * q;
      if (d >= 0) {
        const v = r * c + Math.sqrt(d);
        if (v > best) {
          best = v;
          bestK = -k;
        }
      }
    }
    r = radii[centre + k];
    if (r * c + rho > best) {
      const q = r * sn;
      const d = rho2 - q * q;
      if (d >= 0) {
        const v = r * c + Math.sqrt(d);
        if (v > best) {
          best = v;
          bestK = k;
        }
      }
    }
  }
  return bestK;
}

/** Offset of the point a flat face of half-width `half` rests on. */
function scanFlat(radii: Float64Array, centre: number, reach: number, cos: Float64Array, sin: Float64Array, half: number): number {
  let best = radii[centre];
  let bestK = 0;
  for (let k = 1; k <= reach; k++) {
    const c = cos[k];
    const sn = sin[k];
    let r = radii[centre - k];
    if (r * c > best && r * sn <= half) {
      best = r * c;
      bestK = -k;
    }
    r = radii[centre + k];
    if (r * c > best && r * sn <= half) {
      best = r * c;
      bestK = k;
    }
  }
  return bestK;
}

interface Touch {
  /** Upper bound of at(r, c, ·) − r·c, to skip points that cannot win. */
  lift: number;
  /** Centre position along the ray touching a point at radius r and angle offset with cos c, sin s; −∞ out of reach. */
  at(r: number, c: number, s: number): number;
}

function roundTouch(rho: number): Touch {
  const rho2 = rho * rho;
  return {
    lift: rho,
    at(r, c, s) {
      const q = r * s;
      const d = rho2 - q * q;
      return d >= 0 ? r * c + Math.sqrt(d) : -Infinity;
    },
  };
}

function flatTouch(halfWidth: number): Touch {
  return { lift: 0, at: (r, c, s) => (r * s <= halfWidth ? r * c : -Infinity) };
}

/**
 * Refines the winner between its neighbours: the vertex of the parabola through the three samples
 * says where the true maximum lies. With the rosette itself (`radiusAt`) the rubber is placed there
 * exactly and kept only if it beats the best sample, so the result is always a real resting place:
 * never above the true maximum, exact to O(h³) at a smooth one. Without it the best sample stands:
 * the parabola's own value overshoots at a kink, such as the edge of a clipped wave's flat top.
 */
function refineMax(
  best: number,
  k: number,
  centre: number,
  radii: Float64Array,
  reach: number,
  cos: Float64Array,
  sin: Float64Array,
  touch: Touch,
  dTheta: number,
  radiusAt: ((index: number) => number) | undefined,
): number {
  if (!radiusAt || Math.abs(k) + 1 > reach) return best;
  const value = (offset: number) => {
    const a = Math.abs(offset);
    return touch.at(radii[centre + offset], cos[a], sin[a]);
  };
  const before = value(k - 1);
  const after = value(k + 1);
  const curvature = before - 2 * best + after;
  if (!(curvature < 0) || !Number.isFinite(before) || !Number.isFinite(after)) return best;
  const p = (0.5 * (before - after)) / curvature;
  if (!(Math.abs(p) <= 0.5)) return best;
  const angle = Math.abs(k + p) * dTheta;
  const exact = touch.at(radiusAt(centre + k + p), Math.cos(angle), Math.sin(angle));
  return exact > best ? exact : best;
}

function minOf(values: Float64Array): number {
  let m = Infinity;
  for (const v of values) if (v < m) m = v;
  return m;
}
