import { shade, wallSlope, type Light } from './groove-lighting';

/** A window of the line study in mm (y up) drawn into `width` × `height` pixels. */
export interface LitFrame {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  width: number;
  height: number;
}

export interface LitInput {
  /** Each engraved line as x, y pairs (mm), x increasing. */
  lines: readonly Float64Array[];
  /** Groove depth (mm) and the V-cutter's included angle (degrees). */
  depth: number;
  vAngle: number;
  frame: LitFrame;
  light: Light;
  /** Colours of the darkest and brightest metal, RGB 0–255. */
  dark: readonly [number, number, number];
  bright: readonly [number, number, number];
}

/**
 * The engraved plate as RGBA pixels, row 0 at the top. Where grooves overlap the deeper cut wins,
 * as on the real plate. A wall is flat across one pixel column, so each line's two walls are shaded
 * once per column; the pixels inside a groove only compare depths.
 */
export function renderLit(input: LitInput): Uint8ClampedArray {
  const { frame, depth } = input;
  const { width, height } = frame;
  const pixels = width * height;
  const deepest = new Float32Array(pixels); // 0 = uncut plate
  const plate = shade(0, 0, input.light);
  const brightness = new Float32Array(pixels).fill(plate);
  const slope = wallSlope(input.vAngle);
  const halfWidth = depth / slope; // the groove's half width across its line at the surface
  const sx = (frame.x1 - frame.x0) / width;
  const sy = (frame.y1 - frame.y0) / height;
  if (depth > 0) {
    for (const line of input.lines) cutLine(line, { frame, sx, sy, halfWidth, depth, slope, deepest, brightness, light: input.light });
  }
  return paint(brightness, input);
}

interface CutTarget {
  frame: LitFrame;
  sx: number;
  sy: number;
  halfWidth: number;
  depth: number;
  slope: number;
  deepest: Float32Array;
  brightness: Float32Array;
  light: Light;
}

function cutLine(xy: Float64Array, t: CutTarget): void {
  const n = xy.length / 2;
  if (n < 2) return;
  let k = 0;
  for (let col = 0; col < t.frame.width; col++) {
    const x = t.frame.x0 + (col + 0.5) * t.sx;
    while (k < n - 2 && xy[2 * k + 2] < x) k++;
    const xa = xy[2 * k];
    const xb = xy[2 * k + 2];
    if (x < xa || x > xb) continue;
    const lineSlope = xb > xa ? (xy[2 * k + 3] - xy[2 * k + 1]) / (xb - xa) : 0;
    const y = xy[2 * k + 1] + lineSlope * (x - xa);
    const q = Math.sqrt(1 + lineSlope * lineSlope);
    const reach = t.halfWidth * q; // half width measured along y
    // The wall above the line (σ = +1) and the one below have opposite gradients (wallGradient).
    const gx = (-lineSlope * t.slope) / q;
    const gy = t.slope / q;
    const above = shade(gx, gy, t.light);
    const below = shade(-gx, -gy, t.light);
    const rowTop = Math.max(0, Math.floor((t.frame.y1 - (y + reach)) / t.sy));
    const rowBottom = Math.min(t.frame.height - 1, Math.ceil((t.frame.y1 - (y - reach)) / t.sy));
    for (let row = rowTop; row <= rowBottom; row++) {
      const offset = t.frame.y1 - (row + 0.5) * t.sy - y;
      const cut = t.depth - (Math.abs(offset) / q) * t.slope;
      const p = row * t.frame.width + col;
      if (cut <= t.deepest[p]) continue;
      t.deepest[p] = cut;
      t.brightness[p] = offset >= 0 ? above : below;
    }
  }
}

function paint(brightness: Float32Array, input: LitInput): Uint8ClampedArray {
  const out = new Uint8ClampedArray(brightness.length * 4);
  const [dr, dg, db] = input.dark;
  const [br, bg, bb] = input.bright;
  for (let p = 0; p < brightness.length; p++) {
    const v = brightness[p];
    out[4 * p] = dr + (br - dr) * v;
    out[4 * p + 1] = dg + (bg - dg) * v;
    out[4 * p + 2] = db + (bb - db) * v;
    out[4 * p + 3] = 255;
  }
  return out;
}
