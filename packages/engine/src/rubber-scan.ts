import type { Rubber } from '@barwright/contracts';

/**
 * The search for the point a rubber rests on (rubber.ts reads the rubber): for each reading, the
 * offset within reach where the touch is highest, found exactly while skipping whole blocks of
 * samples that cannot win.
 */

/** What one reading's scan needs, built once per readRubber (no closure or table made per reading). */
export interface Scanner {
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

/** The scanner over `radii` (rosette radii at the angular step dTheta, r_min their lowest) for offsets up to `reach`. */
export function rubberScanner(radii: Float64Array, rubber: Rubber, rMin: number, reach: number, dTheta: number): Scanner {
  const cos = new Float64Array(reach + 1);
  const sin = new Float64Array(reach + 1);
  for (let k = 0; k <= reach; k++) [cos[k], sin[k]] = [Math.cos(k * dTheta), Math.sin(k * dTheta)];
  const touch = rubber.shape === 'round' ? roundTouch(rubber.radius) : flatTouch(rubber.width / 2);
  const sinFrom = leastFrom(sin);
  const rho2 = rubber.shape === 'round' ? rubber.radius * rubber.radius : -1;
  return { radii, blocks: blockBounds(radii, BLOCK), supers: blockBounds(radii, SUPER), reach, cos, sin, lift: liftTable(rubber, rMin, sinFrom), sinFrom, touch, rho2 };
}

/** Blocks of this many samples, and of 16 blocks, are skipped whole when no radius in them can beat the best. */
const BLOCK = 16;
const SUPER = 16 * BLOCK;

/** The largest and smallest radius of each block of `size` samples (block b holds indices b·size …). */
export interface BlockBounds {
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
export function scan(sc: Scanner, centre: number, guess: number): number {
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

export interface Touch {
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
