import type { Design } from '@barwright/contracts';
import { rosetteRepeats } from './rosette';

/**
 * The sampling grid along the bar (mm). The step divides the period exactly (P = M·h), so the
 * rosette and rubber are read once per period and the samples repeat bit for bit along the bar;
 * node i sits at x = i·h and the rubber reads θ = 2π·i / (M·G). Nodes 0 … lastNode lie on the bar;
 * when the bar's length is not a node, its end is added as one extra point.
 */
export interface BarGrid {
  /** Period on the bar, travelPerRev / repeats (mm). */
  period: number;
  /** Sampling interval (mm), at most the requested one. */
  step: number;
  /** Samples per period (M). */
  perPeriod: number;
  /** Repeats of the rosette per revolution (G, the gcd of the moving layers' lobes). */
  repeats: number;
  /** Rosette angle per sample (rad). */
  dTheta: number;
  /** Last node on the bar: nodes 0 … lastNode have x ≤ length. */
  lastNode: number;
  /** Bar length (mm). */
  length: number;
  /** True when the last node is the bar's end. */
  endOnGrid: boolean;
}

/** Largest number of samples a default step puts on a bar. */
const MAX_DEFAULT_SAMPLES = 150_000;

/**
 * The default step: 1/2000 of the period, which bounds the height error of the samples by 0.1 %
 * even with sharp crests and valleys (a triangle's sampled extreme misses by at most slope·h/2 =
 * A·h/P, at each end), at most 0.02 mm, and no finer than the bar length over 150 000.
 */
export function defaultStep(design: Design): number {
  const period = design.motion.travelPerRev / rosetteRepeats(design.rosette);
  return Math.max(design.bar.length / MAX_DEFAULT_SAMPLES, Math.min(period / 2000, 0.02));
}

/** The grid for a millimetre design at (at most) the requested step. */
export function barGrid(design: Design, requestedStep = defaultStep(design)): BarGrid {
  const repeats = rosetteRepeats(design.rosette);
  const period = design.motion.travelPerRev / repeats;
  const perPeriod = Math.max(8, Math.ceil(period / requestedStep - 1e-9));
  const step = period / perPeriod;
  const length = design.bar.length;
  const nodes = length / step;
  const lastNode = Math.floor(nodes + 1e-7);
  return {
    period,
    step,
    perPeriod,
    repeats,
    dTheta: (2 * Math.PI) / (perPeriod * repeats),
    lastNode,
    length,
    endOnGrid: Math.abs(nodes - lastNode) <= 1e-7,
  };
}

/** x of node i (mm); the last node is the bar's end when it lies on the grid. */
export function nodeX(grid: BarGrid, i: number): number {
  return grid.endOnGrid && i === grid.lastNode ? grid.length : i * grid.step;
}
