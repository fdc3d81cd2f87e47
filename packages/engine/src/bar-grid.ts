import { MM_PER_INCH, type Design, type Units } from '@barwright/contracts';
import { formatLength } from './length-format';
import { rosetteRepeats } from './rosette';
import type { EngineWarning } from './types';

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
export const MAX_DEFAULT_SAMPLES = 150_000;
/** Samples per period of the default step: enough for 0.1 % of the amplitude at sharp crests. */
export const DEFAULT_SAMPLES_PER_PERIOD = 2000;

/**
 * The default step: 1/2000 of the period, which bounds the height error of the samples by 0.1 %
 * even with sharp crests and valleys (a triangle's sampled extreme misses by at most slope·h/2 =
 * A·h/P, at each end), at most 0.02 mm, and no finer than the bar length over 150 000 (so a bar
 * holding more than 75 periods is sampled more coarsely: see `coarseSamplingWarning`).
 */
export function defaultStep(design: Design): number {
  const period = design.motion.travelPerRev / rosetteRepeats(design.rosette);
  return Math.max(design.bar.length / MAX_DEFAULT_SAMPLES, Math.min(period / DEFAULT_SAMPLES_PER_PERIOD, 0.02));
}

/**
 * Says so when the default step had to be coarser than 1/2000 of the period to keep the bar under
 * 150 000 points: sharp crests and valleys may then miss up to 2·h/P of the amplitude (A·h/P at
 * each end). The message is in `units`; the warning has no `at` or `amount` (it is about the whole bar).
 */
export function coarseSamplingWarning(grid: BarGrid, units: Units): EngineWarning | undefined {
  if (grid.perPeriod >= DEFAULT_SAMPLES_PER_PERIOD) return undefined;
  const worst = 2 / grid.perPeriod;
  return {
    code: 'other',
    message:
      `The bar holds ${Math.round(grid.length / grid.period)} periods, so the default sampling (every ${formatLength(grid.step, units)}, ` +
      `${grid.perPeriod} points a period) stops at ${MAX_DEFAULT_SAMPLES} points: heights at sharp crests and valleys may be off by up to ` +
      `${+(100 * worst).toPrecision(2)} % of the amplitude. The error goes with the step: a step of ${fineEnoughStep(grid.period, units)} keeps it within 0.1 %.`,
  };
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

/** P/2000 in `units`, rounded down to two significant figures so that it is fine enough. */
function fineEnoughStep(periodMm: number, units: Units): string {
  const value = periodMm / DEFAULT_SAMPLES_PER_PERIOD / (units === 'in' ? MM_PER_INCH : 1);
  const unit = 10 ** (Math.floor(Math.log10(value)) - 1);
  return `${+(Math.floor(value / unit) * unit).toPrecision(2)} ${units}`;
}

/** x of node i (mm); the last node is the bar's end when it lies on the grid. */
export function nodeX(grid: BarGrid, i: number): number {
  return grid.endOnGrid && i === grid.lastNode ? grid.length : i * grid.step;
}
