/**
 * The engraved surface: the plate after every V-groove of a line study is cut, as a height field.
 *
 * Usage (the expensive part once per design, window and size; reshading whenever the light moves):
 *
 *   const study = computeLineStudy(design);
 *   const mm = toMm(design).study;
 *   const field = computeHeightField({ lines: study.lines, depth: mm.depth, vAngle: mm.vAngle,
 *     window: { x0: 55, x1: 95, y0: -1, y1: 19 }, width: 1280, height: 640 });
 *   const rgba = shadeHeightField(field, { azimuthDeg: 135, elevationDeg: 40 }, 'silver');
 *   // rgba: width × height × 4 bytes, row 0 at the top (ImageData, or sharp's raw input)
 *
 * A V-cutter of included angle α, its tip at depth d, swept along a line leaves the depth
 * d − dist(p, line) / tan(α/2) at a point p of the plate (the sweep of a cone), down to 0 at
 * dist = R = d·tan(α/2). Every groove of a study has the same d and α, so the deepest groove at p is
 * the nearest line: the field is a distance transform of the lines clipped at R. The distance to a
 * polyline is the smaller of the distance across a segment (inside the strip its ends bound) and the
 * distance to a vertex (inside the vertex's outer sector, between the two segments' normals); both are
 * rasterised, the smaller kept per sample, so crossings and sharp turns come out exactly.
 *
 * The walls all slope at 1/tan(α/2); only the direction they face varies. Each sample keeps that
 * direction (the way from its nearest line point, in FACET_BINS steps of a turn) as a facet number,
 * so a light change shades FACET_BINS + 1 normals and then only looks them up.
 */
import type { Point } from '../types';

/** A window of the plate (mm, y up, as the line study's coordinates). */
export interface SurfaceWindow {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

export interface HeightFieldInput {
  /** The engraved lines (mm), each with x increasing: a line study's `lines`. */
  lines: readonly { readonly points: readonly Point[] }[];
  /** Depth of the V-cutter's tip below the plate (mm) and its included angle (degrees). */
  depth: number;
  vAngle: number;
  window: SurfaceWindow;
  /** Pixels of the picture. */
  width: number;
  height: number;
  /** Samples per pixel along each axis (anti-aliasing): 2 by default, 1 to 8. */
  supersample?: number;
  /**
   * Farthest from a line the field is computed (mm); beyond it a sample reads as uncut plate even
   * where a wider groove still reaches. Bounds the work of grooves far wider than the line spacing
   * (a V of nearly 180°): between the lines of a study every point lies within the spacing plus the
   * wave's height of a line, so a cap above that changes only the margins outside the study.
   */
  maxReach?: number;
  /**
   * A field no longer needed (the one this replaces) whose memory may be written over where it has room
   * (the new field's arrays are then views of it): a new 1280 px field at 2 × 2 is some 20 MB, and fresh
   * memory costs a page fault per 4 kB.
   */
  reuse?: HeightField | null;
}

/**
 * A field's arrays may be views of larger buffers (memory lent by the field it replaced, or room kept
 * to spare): read their `length`, not their `buffer`, and copy rather than transfer them.
 */
export interface HeightField {
  width: number;
  height: number;
  supersample: number;
  window: SurfaceWindow;
  /** Slope of every groove wall, 1 / tan(α/2). */
  wallSlope: number;
  /** Depth of the cutter's tip below the plate (mm). */
  tipDepth: number;
  /**
   * Squared distance (mm²) of each sample to its nearest line, R² where no groove reaches:
   * (width·s) × (height·s), row 0 at the top (y1). Depths follow from it (`sampleDepths`); shading
   * needs only the facets, so the square roots are left until a depth is asked for.
   */
  dist2: Float32Array;
  /** Per sample: 0 for the uncut plate, else 1 + the direction the wall rises towards, in FACET_BINS steps of a turn from +x. */
  facet: Uint16Array;
  /** Per pixel: the facet all its samples share, or MIXED_PIXEL. */
  pixelFacet: Uint16Array;
  /** The MIXED_PIXEL pixels (index y·width + x), and their samples' facets, s² each, row by row (views of larger buffers kept for reuse). */
  mixed: Uint32Array;
  mixedFacets: Uint16Array;
}

/** Directions a wall can face, per turn (0.088° apart: far below what the eye tells on a wall). A power of two. */
export const FACET_BINS = 4096;
/** Samples of a pixel whose facings differ by at most this many bins (0.7°) shade as one: their colours differ by less than the eye tells. */
const SAME_FACING_BINS = 8;
/** Whole turns (in bins) plus a half, added before truncating a facing to round it: keeps it positive (a facing is within ±1.5 turns). */
const ROUNDING = 8 * FACET_BINS + 0.5;
/** `pixelFacet` of a pixel whose samples differ (an edge or a ridge runs through it). */
export const MIXED_PIXEL = 0xffff;

/** The height field of a study's grooves over a window (see the module's comment). */
export function computeHeightField(input: HeightFieldInput): HeightField {
  const s = Math.max(1, Math.min(8, Math.round(input.supersample ?? 2)));
  const { width, height, window } = input;
  const cols = width * s;
  const rows = height * s;
  const slope = 1 / Math.tan((input.vAngle * Math.PI) / 360);
  const reach = Math.min(Math.max(0, input.depth) / slope, input.maxReach ?? Infinity); // R: half the groove's width at the surface
  const old = input.reuse ?? null;
  const dist2 = room(Float32Array, old?.dist2, cols * rows).fill(reach * reach);
  const facet = room(Uint16Array, old?.facet, cols * rows).fill(0);
  const grid: Raster = { cols, rows, x0: window.x0, y1: window.y1, dx: (window.x1 - window.x0) / cols, dy: (window.y1 - window.y0) / rows, reach, dist2, facet };
  if (reach > 0) for (const line of input.lines) cutLine(line.points, grid, window);
  const pixels = pixelFacets(facet, width, height, s, room(Uint16Array, old?.pixelFacet, width * height), old);
  return { width, height, supersample: s, window, wallSlope: slope, tipDepth: input.depth, dist2, facet, ...pixels };
}

type Typed = Float32Array | Uint16Array | Uint32Array;

/**
 * An array of n over the memory of `lent` (an array of a field replaced) when it has room, else over
 * new memory with an eighth to spare: a plate's height changes by a pixel or two from study to study,
 * and the next field then still fits.
 */
function room<T extends Typed>(Kind: { new (buffer: ArrayBufferLike, offset: number, length: number): T; BYTES_PER_ELEMENT: number }, lent: Typed | undefined, n: number): T {
  const bytes = Kind.BYTES_PER_ELEMENT;
  if (lent && lent.buffer.byteLength >= n * bytes) return new Kind(lent.buffer, 0, n);
  return new Kind(new ArrayBuffer(Math.ceil(n * 1.125) * bytes), 0, n);
}

/** Depth below the plate (mm, ≥ 0) of each sample of the field, in `dist2`'s order: d − dist·slope inside a groove, 0 on the plate. */
export function sampleDepths(field: HeightField): Float32Array {
  const { dist2, facet, tipDepth, wallSlope } = field;
  const out = new Float32Array(dist2.length);
  for (let k = 0; k < dist2.length; k++) out[k] = facet[k] === 0 ? 0 : Math.max(0, tipDepth - Math.sqrt(dist2[k]) * wallSlope);
  return out;
}

/**
 * One pass over the pixels: each gets its facet when its samples share one, else MIXED_PIXEL with its
 * samples' facets copied out in a row (so that reshading reads them in order). Samples facing within
 * SAME_FACING_BINS of the pixel's first count as the same facing (a wall curving gently across a pixel).
 * Runs row by row of pixels over s rows of samples at once, reading each sample row in order.
 */
function pixelFacets(facet: Uint16Array, width: number, height: number, s: number, pixelFacet: Uint16Array, old: HeightField | null): Pick<HeightField, 'pixelFacet' | 'mixed' | 'mixedFacets'> {
  const cols = width * s;
  // Room for half the pixels (at most about that many are mixed, where walls curve across pixels), grown
  // if not; the field keeps views of the part used. A field replaced lends its room: the room is
  // megabytes, and fresh memory costs a page fault per 4 kB.
  const lent = old ? Math.floor(Math.min(old.mixed.buffer.byteLength / 4, old.mixedFacets.buffer.byteLength / (2 * s * s))) : 0;
  const wanted = Math.max(1024, (width * height) >> 1);
  let mixedPixels = lent >= wanted ? new Uint32Array(old!.mixed.buffer, 0, lent) : new Uint32Array(Math.ceil(wanted * 1.125));
  let mixedFacets = lent >= wanted ? new Uint16Array(old!.mixedFacets.buffer, 0, lent * s * s) : new Uint16Array(mixedPixels.length * s * s);
  let count = 0;
  for (let py = 0, p = 0; py < height; py++) {
    const rowBase = py * s * cols;
    for (let px = 0; px < width; px++, p++) {
      const base = rowBase + px * s;
      const first = facet[base];
      let mixed = false;
      if (s === 2) {
        // The usual case written out: the other three samples against the first.
        mixed = differs(facet[base + 1], first) || differs(facet[base + cols], first) || differs(facet[base + cols + 1], first);
      } else for (let j = 0, k0 = base; j < s && !mixed; j++, k0 += cols) {
        for (let k = k0, end = k0 + s; k < end; k++) {
          const fk = facet[k];
          if (differs(fk, first)) {
            mixed = true;
            break;
          }
        }
      }
      if (!mixed) {
        pixelFacet[p] = first;
        continue;
      }
      pixelFacet[p] = MIXED_PIXEL;
      if (count === mixedPixels.length) {
        mixedPixels = grown(mixedPixels, 2 * count);
        mixedFacets = grown(mixedFacets, 2 * count * s * s);
      }
      mixedPixels[count] = p;
      let o = count * s * s;
      for (let j = 0, k0 = base; j < s; j++, k0 += cols) for (let i = 0; i < s; i++) mixedFacets[o++] = facet[k0 + i];
      count++;
    }
  }
  return { pixelFacet, mixed: mixedPixels.subarray(0, count), mixedFacets: mixedFacets.subarray(0, count * s * s) };
}

function grown<T extends Uint16Array | Uint32Array>(a: T, size: number): T {
  const b = new (a.constructor as new (n: number) => T)(size);
  b.set(a);
  return b;
}

/** Whether two samples' facets shade differently: uncut (0) against cut always, two facings beyond SAME_FACING_BINS apart. */
function differs(a: number, b: number): boolean {
  return a !== b && (a === 0 || b === 0 || a - b > SAME_FACING_BINS || b - a > SAME_FACING_BINS);
}


interface Raster {
  cols: number;
  rows: number;
  x0: number;
  y1: number;
  dx: number;
  dy: number;
  reach: number;
  dist2: Float32Array;
  facet: Uint16Array;
}

function cutLine(points: readonly Point[], g: Raster, w: SurfaceWindow): void {
  const n = points.length;
  const r = g.reach;
  // Points run with x increasing: skip to the first segment that can reach the window.
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (points[mid][0] < w.x0 - r) lo = mid + 1;
    else hi = mid;
  }
  const first = Math.max(0, lo - 1);
  for (let i = first; i < n; i++) {
    const [ax, ay] = points[i];
    if (ax - r > w.x1) break;
    const prev = i > 0 ? points[i - 1] : undefined;
    const next = i + 1 < n ? points[i + 1] : undefined;
    if (next) {
      const [bx, by] = next;
      const inY = Math.max(ay, by) + r >= w.y0 && Math.min(ay, by) - r <= w.y1;
      if (inY) cutStrip(ax, ay, bx, by, g, prev, i + 2 < n ? points[i + 2] : undefined);
    }
    if (ay + r >= w.y0 && ay - r <= w.y1) cutVertex(ax, ay, prev, next, g);
  }
}

/**
 * The samples whose nearest point lies inside segment A→B: the distance across it. The wall's facing
 * turns smoothly along the segment, from the mean of its and the previous segment's normals at A to
 * the mean of its and the next one's at B (normal interpolation, B. T. Phong, "Illumination for
 * computer generated pictures", CACM 18(6), 1975): the lines are polylines standing for smooth
 * curves, and one facing per segment would show each chord as a flat step of light.
 */
function cutStrip(ax: number, ay: number, bx: number, by: number, g: Raster, prev: Point | undefined, after: Point | undefined): void {
  const len = Math.sqrt((bx - ax) * (bx - ax) + (by - ay) * (by - ay));
  if (!(len > 0)) return;
  const ux = (bx - ax) / len;
  const uy = (by - ay) / len;
  const nx = -uy; // the normal to the left of A→B
  const ny = ux;
  const here = Math.atan2(ny, nx);
  const start = prev && (prev[0] !== ax || prev[1] !== ay) ? meanAngle(here, normalAngle(prev[0], prev[1], ax, ay)) : here;
  const end = after && (after[0] !== bx || after[1] !== by) ? meanAngle(here, normalAngle(bx, by, after[0], after[1])) : here;
  const turn = wrapAngle(end - start) / len; // radians per mm along the segment
  const binsPerRad = FACET_BINS / (2 * Math.PI);
  const r = g.reach;
  const r2 = r * r;
  const spread = r * Math.abs(nx);
  const c0 = Math.min(g.cols, Math.max(0, Math.ceil((Math.min(ax, bx) - spread - g.x0) / g.dx - 0.5))) | 0;
  const c1 = Math.max(-1, Math.min(g.cols - 1, Math.floor((Math.max(ax, bx) + spread - g.x0) / g.dx - 0.5))) | 0;
  const { cols, dist2, facet } = g;
  for (let c = c0; c <= c1; c++) {
    const x = g.x0 + (c + 0.5) * g.dx;
    const ex = x - ax;
    // Across: −R ≤ ex·nx + (y − ay)·ny ≤ R; along: 0 ≤ ex·ux + (y − ay)·uy ≤ len (solved for y − ay, no arrays: this runs per column).
    let ylo = -Infinity;
    let yhi = Infinity;
    if (Math.abs(ny) >= 1e-12) {
      const p = (-r - ex * nx) / ny;
      const q = (r - ex * nx) / ny;
      ylo = p < q ? p : q;
      yhi = p < q ? q : p;
    } else if (Math.abs(ex * nx) > r) continue;
    if (Math.abs(uy) >= 1e-12) {
      const p = -ex * ux / uy;
      const q = (len - ex * ux) / uy;
      ylo = Math.max(ylo, p < q ? p : q);
      yhi = Math.min(yhi, p < q ? q : p);
    } else if (ex * ux < 0 || ex * ux > len) continue;
    ylo += ay;
    yhi += ay;
    if (!(ylo <= yhi)) continue;
    // Clamped into the raster, then made small integers (| 0): the row loop indexes the arrays with them.
    const r0 = Math.min(g.rows, Math.max(0, Math.ceil((g.y1 - yhi) / g.dy - 0.5))) | 0;
    const r1 = Math.max(-1, Math.min(g.rows - 1, Math.floor((g.y1 - ylo) / g.dy - 0.5))) | 0;
    // Across and the facing (in bins) are linear in the row: stepped, not recomputed.
    const top = g.y1 - (r0 + 0.5) * g.dy - ay;
    let across = ex * nx + top * ny;
    let facing = (start + turn * (ex * ux + top * uy)) * binsPerRad;
    const stepAcross = -g.dy * ny;
    const stepFacing = -g.dy * uy * turn * binsPerRad;
    for (let row = r0, p = r0 * cols + c; row <= r1; row++, p += cols) {
      const d2 = across * across;
      if (d2 < dist2[p] && d2 < r2) {
        dist2[p] = d2;
        // FACET_BINS is a power of two: & wraps negative bins round too; the wall below the line faces half a turn away.
        // (v + ROUNDING) | 0 is Math.round(v) shifted by whole turns, which the mask removes.
        facet[p] = 1 + (((across >= 0 ? facing : facing + FACET_BINS / 2) + ROUNDING) & (FACET_BINS - 1));
      }
      across += stepAcross;
      facing += stepFacing;
    }
  }
}

/**
 * The samples whose nearest point is the vertex V: those in its outer sector (between the normals of
 * the segments meeting there), or all round an end of the line. Only the sector's bounding box is
 * visited; a distance to V elsewhere is never below the true one, so it cannot win wrongly.
 */
function cutVertex(vx: number, vy: number, prev: Point | undefined, next: Point | undefined, g: Raster): void {
  const r = g.reach;
  let bx0 = vx - r;
  let bx1 = vx + r;
  let by0 = vy - r;
  let by1 = vy + r;
  if (prev && next) {
    if (!sectorBox(vx - prev[0], vy - prev[1], next[0] - vx, next[1] - vy, r)) return;
    [bx0, bx1, by0, by1] = [vx + BOX[0], vx + BOX[1], vy + BOX[2], vy + BOX[3]];
  }
  // Clamped into the raster and made small integers, as in cutStrip.
  const c0 = Math.min(g.cols, Math.max(0, Math.ceil((bx0 - g.x0) / g.dx - 0.5))) | 0;
  const c1 = Math.max(-1, Math.min(g.cols - 1, Math.floor((bx1 - g.x0) / g.dx - 0.5))) | 0;
  const r0 = Math.min(g.rows, Math.max(0, Math.ceil((g.y1 - by1) / g.dy - 0.5))) | 0;
  const r1 = Math.max(-1, Math.min(g.rows - 1, Math.floor((g.y1 - by0) / g.dy - 0.5))) | 0;
  const r2 = r * r;
  const { cols, dist2, facet } = g;
  for (let row = r0; row <= r1; row++) {
    const ey = g.y1 - (row + 0.5) * g.dy - vy;
    for (let c = c0; c <= c1; c++) {
      const ex = g.x0 + (c + 0.5) * g.dx - vx;
      const d2 = ex * ex + ey * ey;
      const p = row * cols + c;
      if (d2 < dist2[p] && d2 < r2) {
        dist2[p] = d2;
        if (d2 > 0) facet[p] = facetOf(ex, ey);
      }
    }
  }
}

/** sectorBox's answer (x0, x1, y0, y1 relative to the vertex): written here, not allocated, as it runs per vertex. */
const BOX = new Float64Array(4);

/**
 * Bounding box (relative to V, into BOX) of the outer sector at a vertex where direction (ix, iy)
 * turns into (ox, oy), radius r: the arc between the two segments' unit normals u and v on the outer
 * side of the turn. False when the line goes straight on (both strips meet there). Without angles:
 * the box holds V, r·u, r·v and r·e for each axis direction e on the arc, which is e = αu + βv with
 * α, β ≥ 0, i.e. cross(u, e) and cross(e, v) of the sign of cross(u, v).
 */
function sectorBox(ix: number, iy: number, ox: number, oy: number, r: number): boolean {
  const li = Math.sqrt(ix * ix + iy * iy);
  const lo = Math.sqrt(ox * ox + oy * oy);
  const cross = ix * oy - iy * ox;
  if (!(li > 0) || !(lo > 0) || (cross === 0 && ix * ox + iy * oy < 0)) {
    // A repeated point or a reversal: all round.
    [BOX[0], BOX[1], BOX[2], BOX[3]] = [-r, r, -r, r];
    return true;
  }
  if (cross === 0) return false;
  // Turning left (cross > 0) the outer side is the right: normals (iy, −ix) and (oy, −ox); turning right, the left ones.
  const side = cross > 0 ? 1 : -1;
  const ux = (side * iy) / li;
  const uy = (-side * ix) / li;
  const vx = (side * oy) / lo;
  const vy = (-side * ox) / lo;
  const c = ux * vy - uy * vx;
  // For each axis direction e: cross(u, e) and cross(e, v).
  BOX[0] = onArc(uy, -vy, c) ? -r : r * Math.min(0, ux, vx); // e = (−1, 0)
  BOX[1] = onArc(-uy, vy, c) ? r : r * Math.max(0, ux, vx); // e = (1, 0)
  BOX[2] = onArc(-ux, vx, c) ? -r : r * Math.min(0, uy, vy); // e = (0, −1)
  BOX[3] = onArc(ux, -vx, c) ? r : r * Math.max(0, uy, vy); // e = (0, 1)
  return true;
}

/** Whether e lies on the arc from u to v, given cross(u, e), cross(e, v) and cross(u, v). */
function onArc(ue: number, ev: number, uv: number): boolean {
  return ue * uv >= 0 && ev * uv >= 0;
}

/** Angle of the left normal of the segment P→Q (radians). */
function normalAngle(px: number, py: number, qx: number, qy: number): number {
  return Math.atan2(qx - px, -(qy - py));
}

/** An angle in (−π, π]. */
function wrapAngle(a: number): number {
  return a - 2 * Math.PI * Math.round(a / (2 * Math.PI));
}

/** The angle half-way from a to b the short way round. */
function meanAngle(a: number, b: number): number {
  return a + wrapAngle(b - a) / 2;
}

/** 1 + the direction (x, y) in FACET_BINS steps of a turn, rounded to the nearest. */
function facetOf(x: number, y: number): number {
  const turn = Math.atan2(y, x) / (2 * Math.PI);
  const bin = Math.round(turn * FACET_BINS);
  return 1 + (((bin % FACET_BINS) + FACET_BINS) % FACET_BINS);
}
