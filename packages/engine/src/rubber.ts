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
  const rMin = Math.max(1e-12, minOf(radii));
  const reach = Math.min(pad, rubberReach(rubber, rMin, dTheta));
  const s = new Float64Array(count);
  const contact = new Int32Array(count);
  if (reach === 0) {
    s.set(radii.subarray(pad, pad + count));
    return { s, contact };
  }
  const cos = new Float64Array(reach + 1);
  const sin = new Float64Array(reach + 1);
  for (let k = 0; k <= reach; k++) [cos[k], sin[k]] = [Math.cos(k * dTheta), Math.sin(k * dTheta)];
  const touch = rubber.shape === 'round' ? roundTouch(rubber.radius) : flatTouch(rubber.width / 2);
  const blocks = blockBounds(radii, BLOCK);
  const supers = blockBounds(radii, SUPER);
  const sinFrom = leastFrom(sin);
  const scanner: Scanner = { radii, blocks, supers, reach, cos, sin, lift: liftTable(rubber, rMin, sinFrom), sinFrom, touch, rho2: rubber.shape === 'round' ? rubber.radius * rubber.radius : -1 };
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

/** Blocks of this many samples, and of 16 blocks, are skipped whole when no radius in them can beat the best. */
const BLOCK = 16;
const SUPER = 16 * BLOCK;

/** The largest and smallest radius of each block of `size` samples (block b holds indices b·size …). */
interface BlockBounds {
  high: Float64Array;
  low: Float64Array;
}

function blockBounds(radii: Float64Array, size: number): BlockBounds {
  const blocks = Math.ceil(radii.length / size);
  const high = new Float64Array(blocks).fill(-Infinity);
  const low = new Float64Array(blocks).fill(Infinity);
  for (let j = 0; j < radii.length; j++) {
    const b = (j / size) | 0;
    if (radii[j] > high[b]) high[b] = radii[j];
    if (radii[j] < low[b]) low[b] = radii[j];
  }
  return { high, low };
}

/**
 * The most a point at offset k or beyond can add to r·cos: √(ρ² − (r_min·least sin)²) for a round
 * rubber (r ≥ r_min), 0 for a flat face.
 */
function liftTable(rubber: Rubber, rMin: number, sinFrom: Float64Array): Float64Array {
  const lift = new Float64Array(sinFrom.length);
  if (rubber.shape === 'round') for (let k = 0; k < sinFrom.length; k++) lift[k] = Math.sqrt(Math.max(0, rubber.radius ** 2 - (rMin * sinFrom[k]) ** 2));
  return lift;
}

/** out[k] = the least of values[k …]. */
function leastFrom(values: Float64Array): Float64Array {
  const out = Float64Array.from(values);
  for (let k = out.length - 2; k >= 0; k--) if (out[k + 1] < out[k]) out[k] = out[k + 1];
  return out;
}

/** What one reading's scan needs, built once per readRubber (no closure or table made per reading). */
interface Scanner {
  radii: Float64Array;
  blocks: BlockBounds;
  supers: BlockBounds;
  reach: number;
  cos: Float64Array;
  sin: Float64Array;
  lift: Float64Array;
  /** The least sin over offsets k … reach (sin turns down past a quarter turn). */
  sinFrom: Float64Array;
  touch: Touch;
  /** ρ² of a round rubber; negative for a flat face. */
  rho2: number;
}

/**
 * Whether a block can beat the best from offset k on (k its nearest offset to the centre). Its most
 * is at most its largest radius times cos k (its smallest past a quarter turn, where the cosine is
 * negative) plus the lift at k; for a round rubber, at most the same plus
 * √(ρ² − (its smallest radius·least sin)²), or nothing when even that is out of reach. These are
 * Touch.at's operations on bounds of their arguments, each monotone in floating point too, so a
 * block that cannot beat the best holds no winner: the scan finds what looking at every point
 * finds. The cheap bound (the rosette's r_min) clears the blocks far from the contact; the block's
 * own smallest radius, near it (r_min left the bound up to 0.03 mm high on the example rosette,
 * and most blocks in reach were read sample by sample).
 */
function canBeat(sc: Scanner, bounds: BlockBounds, b: number, k: number, best: number): boolean {
  const c = sc.cos[k];
  const along = (c >= 0 ? bounds.high[b] : bounds.low[b]) * c;
  if (along + sc.lift[k] <= best) return false;
  if (sc.rho2 < 0) return true;
  const q = Math.max(0, bounds.low[b]) * sc.sinFrom[k];
  const d = sc.rho2 - q * q;
  return d >= 0 && along + Math.sqrt(d) > best;
}

/**
 * Offset of the point the rubber rests on, scanning outward on each side from a first guess. A point can win only if
 * r·cos + lift[k] beats the best so far (the root is skipped otherwise), and a whole block only if
 * canBeat says so: a wide rubber on a finely sampled rosette looks at its few candidate crests, not
 * at every sample within reach.
 */
function scan(sc: Scanner, centre: number, guess: number): number {
  const { radii, reach, cos, sin, lift, touch } = sc;
  let best = touch.at(radii[centre], 1, 0);
  let bestK = 0;
  const g = Math.abs(guess);
  const atGuess = touch.at(radii[centre + guess], cos[g], sin[g]);
  if (atGuess > best) [best, bestK] = [atGuess, guess];
  for (let dir = 1; dir >= -1; dir -= 2) {
    let k = 1;
    let open = -1; // the super-block last found able to beat the best: its blocks are tested one by one
    while (k <= reach) {
      const sb = ((centre + dir * k) / SUPER) | 0;
      if (sb !== open && !canBeat(sc, sc.supers, sb, k, best)) {
        k = Math.min(reach, dir > 0 ? (sb + 1) * SUPER - 1 - centre : centre - sb * SUPER) + 1;
        continue;
      }
      open = sb;
      const b = ((centre + dir * k) / BLOCK) | 0;
      const kEnd = Math.min(reach, dir > 0 ? (b + 1) * BLOCK - 1 - centre : centre - b * BLOCK);
      if (!canBeat(sc, sc.blocks, b, k, best)) {
        k = kEnd + 1;
        continue;
      }
      for (; k <= kEnd; k++) {
        const r = radii[centre + dir * k];
        if (r * cos[k] + lift[k] <= best) continue;
        const v = touch.at(r, cos[k], sin[k]);
        if (v > best) {
          best = v;
          bestK = dir * k;
        }
      }
    }
  }
  return bestK;
}

interface Touch {
  /** Centre position along the ray touching a point at radius r and angle offset with cos c, sin s; −∞ out of reach. */
  at(r: number, c: number, s: number): number;
}

function roundTouch(rho: number): Touch {
  const rho2 = rho * rho;
  return {
    at(r, c, s) {
      const q = r * s;
      const d = rho2 - q * q;
      return d >= 0 ? r * c + Math.sqrt(d) : -Infinity;
    },
  };
}

function flatTouch(halfWidth: number): Touch {
  return { at: (r, c, s) => (r * s <= halfWidth ? r * c : -Infinity) };
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
