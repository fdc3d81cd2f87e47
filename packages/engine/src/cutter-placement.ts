import type { Design, Units } from '@barwright/contracts';
import type { BarGrid } from './bar-grid';
import { formatLength } from './length-format';
import { rosetteMinRadius } from './rosette';

/**
 * Where the cutter's contact with the bar really goes: off the spindle centre line, and on the
 * arc of a rocking headstock.
 *
 * Frame (the plane square to the spindle): the bar travels along x, the rosette's motion carries
 * it along y. The centre line is the line through the rubber's contact and the rosette axis, along
 * y; the profile's nominal cutter sits on it and moves d = k·(s − s_mid) along y (the linear lever
 * of ratio k, measured from the middle of the swing).
 *
 * Linear (pumping) motion: every point of the moving assembly translates by the same d along y. A
 * contact displaced by e along the bar (x) from the centre line moves exactly as the nominal one,
 * so the pattern is only moved e along the bar: no change of amplitude or shape.
 *
 * Rocking: the assembly turns about an axis parallel to the spindle, at distance L from the centre
 * line, along x on the side of the bar's start (x < 0); the arm from the axis to the centre line is
 * square to the motion at mid-swing. A point at distance ρ from the axis turns through θ on a
 * circle of radius ρ: it moves ρ·sin θ across the arm and falls back ρ·(1 − cos θ) towards the
 * axis, the sagitta of the arc (rotation about a fixed axis, plane geometry). The rubber at the
 * centre line (ρ = L) moves d, so sin θ = d / L. The cutter's contact at ρ = L + e therefore moves
 *   y:  (L + e)·sin θ = d·(1 + e/L)                      amplitude scaled by 1 + e/L
 *   x:  e − (L + e)·(1 − cos θ) = e − (L + e)·sin²θ / (1 + cos θ)
 * The constant e moves the whole pattern (a phase shift of e / P of a period); the sagitta is 0 at
 * mid-swing and largest, (L + e)·(1 − cos θmax), at the crests and valleys alike, so both lean that
 * far towards the axis against the flanks: the flank rising towards the axis steepens, the other
 * flattens. L → ∞ gives the linear case. Needs |d| < L and L + e > 0 (checked by the design file).
 */
export interface CutterPlacement {
  /** e: the contact's distance from the centre line along the bar, mm (positive away from the rocking axis). */
  offset: number;
  /** L: from the rocking axis to the centre line, mm; Infinity for linear motion. */
  pivot: number;
}

/** The placement of a millimetre design, or undefined when it is the nominal one (on the centre line, linear). */
export function cutterPlacement(design: Design): CutterPlacement | undefined {
  const offset = design.cutter.offset ?? 0;
  const pivot = design.motion.pivot?.kind === 'rocking' ? design.motion.pivot.distance : Infinity;
  return offset === 0 && pivot === Infinity ? undefined : { offset, pivot };
}

/** The contact's displacement along the bar for a displacement d from mid-swing (mm). */
export function alongBarShift(p: CutterPlacement, d: number): number {
  if (p.pivot === Infinity) return p.offset;
  const sin = d / p.pivot;
  const cos = Math.sqrt(Math.max(0, 1 - sin * sin));
  return p.offset - ((p.pivot + p.offset) * sin * sin) / (1 + cos);
}

/** The contact's displacement across the bar for a displacement d from mid-swing (mm). */
export function acrossBarHeight(p: CutterPlacement, d: number): number {
  return p.pivot === Infinity ? d : d * (1 + p.offset / p.pivot);
}

/** Extra grid nodes the rubber must be read beyond the cutter's own reach so that the displaced path still covers it. */
export function placementMargin(p: CutterPlacement | undefined, design: Design, step: number): number {
  if (!p) return 0;
  const halfSwing = design.motion.leverRatio * (design.rosette.baseRadius - rosetteMinRadius(design.rosette));
  const d = Math.min(halfSwing, p.pivot);
  return Math.ceil((Math.abs(p.offset) + Math.abs(alongBarShift(p, d) - p.offset)) / step) + 2;
}

/**
 * The displaced cutter path on the grid: heights y (nominal, 0 at the lowest point on the bar) at
 * nodes −margin … (y.length − margin − 1) are moved to their true places and read back, by linear
 * interpolation, at the same nodes; where the path folds back over itself the lowest branch is kept
 * (it cuts deepest). Nodes the moved path leaves uncovered lie more than `placementMargin` beyond
 * the cutter's reach of the bar and take their neighbour's height. Heights are set to 0 at the
 * lowest point on the bar, and `yEnd` is the height at the bar's end.
 */
export function placeCutter(p: CutterPlacement, y: Float64Array, margin: number, grid: BarGrid): { y: Float64Array; yEnd: number } {
  const { step: h, lastNode } = grid;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = margin; i <= margin + lastNode; i++) {
    lo = Math.min(lo, y[i]);
    hi = Math.max(hi, y[i]);
  }
  const out = displace(p, y, margin, h, (lo + hi) / 2);
  const count = y.length;
  const end = grid.length / h + margin; // fractional index of the bar's end in `out`
  const j = Math.min(count - 2, Math.floor(end));
  const yEnd = out[j] + (end - j) * (out[j + 1] - out[j]);
  let min = grid.endOnGrid ? Infinity : yEnd;
  for (let i = margin; i <= margin + lastNode; i++) min = Math.min(min, out[i]);
  for (let i = 0; i < count; i++) out[i] -= min;
  return { y: out, yEnd: yEnd - min };
}

/**
 * One period of an endless bar's cutter path (nodes 0 … m−1, heights from its lowest point) moved to
 * its true places: the period is wrapped `margin` nodes round each end, displaced and read back.
 */
export function placePeriod(p: CutterPlacement, y: Float64Array, step: number, margin: number): Float64Array {
  const m = y.length;
  const wrapped = new Float64Array(m + 2 * margin);
  for (let i = 0; i < wrapped.length; i++) wrapped[i] = y[(((i - margin) % m) + m) % m];
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of y) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  const out = displace(p, wrapped, margin, step, (lo + hi) / 2).slice(margin, margin + m);
  let min = Infinity;
  for (const v of out) min = Math.min(min, v);
  return out.map((v) => v - min);
}

/** Heights y at nodes −margin … moved by the placement (d measured from `mid`) and read back at the same nodes. */
function displace(p: CutterPlacement, y: Float64Array, margin: number, h: number, mid: number): Float64Array {
  const out = new Float64Array(y.length).fill(Infinity);
  let xPrev = NaN;
  let yPrev = NaN;
  for (let i = 0; i < y.length; i++) {
    const d = y[i] - mid;
    const x = (i - margin) * h + alongBarShift(p, d);
    const yy = mid + acrossBarHeight(p, d);
    if (i > 0) spreadSegment(out, xPrev, yPrev, x, yy, h, -margin);
    xPrev = x;
    yPrev = yy;
  }
  fillGaps(out);
  return out;
}

/** Lowers `out` (nodes first, first + 1, … at step h) to the segment (x0, y0)–(x1, y1) where it lies over them. */
function spreadSegment(out: Float64Array, x0: number, y0: number, x1: number, y1: number, h: number, first: number): void {
  const [xa, ya, xb, yb] = x0 <= x1 ? [x0, y0, x1, y1] : [x1, y1, x0, y0];
  const from = Math.max(0, Math.ceil(xa / h - 1e-9) - first);
  const to = Math.min(out.length - 1, Math.floor(xb / h + 1e-9) - first);
  for (let j = from; j <= to; j++) {
    const x = (j + first) * h;
    const t = xb === xa ? 0 : Math.min(1, Math.max(0, (x - xa) / (xb - xa)));
    const v = ya + t * (yb - ya);
    if (v < out[j]) out[j] = v;
  }
}

/** Nodes the displaced path did not reach (only beyond the cutter's reach of the bar) take their neighbour's height. */
function fillGaps(out: Float64Array): void {
  for (let i = 1; i < out.length; i++) if (out[i] === Infinity) out[i] = out[i - 1];
  for (let i = out.length - 2; i >= 0; i--) if (out[i] === Infinity) out[i] = out[i + 1];
}

/** What the placement does to the pattern, for a cutter path `height` mm peak to valley (as placed). */
export interface PlacementFigures {
  /** Relative change of the amplitude, e / L (0 for linear motion). */
  amplitudeChange: number;
  /** The whole pattern moves this far along the bar, mm (= e). */
  shift: number;
  /** Crests and valleys lean this far towards the rocking axis against the flanks, mm (0 for linear motion). */
  lean: number;
}

/** The figures of a millimetre design's placement (all 0 for the nominal one). */
export function placementFigures(design: Design, height: number): PlacementFigures {
  const p = cutterPlacement(design);
  if (!p) return { amplitudeChange: 0, shift: 0, lean: 0 };
  const change = p.pivot === Infinity ? 0 : p.offset / p.pivot;
  const halfSwing = height / (2 * (1 + change));
  return { amplitudeChange: change, shift: p.offset, lean: p.offset - alongBarShift(p, halfSwing) };
}

/**
 * The placement in one line for the studio and the cut plan, lengths in `units`:
 * "0.5 mm off the centre line, rocking 150 mm from its axis: amplitude +0.33 %, crests and valleys
 * lean 0.0019 mm towards the axis, the pattern moved 0.5 mm along the bar". Undefined when nominal.
 */
export function placementText(design: Design, height: number, units: Units): string | undefined {
  const p = cutterPlacement(design);
  if (!p) return undefined;
  const f = placementFigures(design, height);
  const show = (mm: number) => formatLength(mm, units);
  const where = p.offset === 0 ? 'on the centre line' : `${show(Math.abs(p.offset))} off the centre line`;
  const motion = p.pivot === Infinity ? 'linear motion' : `rocking ${show(p.pivot)} from its axis`;
  const effects =
    p.pivot === Infinity
      ? ['the shape unchanged']
      : [
          `amplitude ${f.amplitudeChange >= 0 ? '+' : '−'}${+Math.abs(100 * f.amplitudeChange).toPrecision(2)} %`,
          `crests and valleys lean ${show(f.lean)} towards the axis`,
        ];
  if (p.offset !== 0) effects.push(`the pattern moved ${show(Math.abs(p.offset))} ${p.offset > 0 ? 'along' : 'back along'} the bar`);
  return `${where}, ${motion}: ${effects.join(', ')}`;
}
