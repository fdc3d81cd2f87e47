import { layerPeakToValley, MM_PER_INCH, type Design, type Units, type Wave } from '@barwright/contracts';
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

/** Largest number of samples a default step puts on a bar, and on the one period a line study reads. */
export const MAX_DEFAULT_SAMPLES = 150_000;
/** Samples per finest feature of the rosette: enough for 0.1 % of the amplitude at sharp crests. */
export const SAMPLES_PER_FEATURE = 2000;
/** Samples across the smallest radius (cutter, follower, rubber as it reads the bar), down to 0.001 mm. */
const SAMPLES_PER_RADIUS = 8;
const MIN_RADIUS_STEP_MM = 0.001;

/**
 * The finest feature of a design along the bar (mm): the travel per revolution over the most
 * features one layer puts in a revolution, lobes × its highest harmonic (a Fourier series' largest
 * k; for a measured table, 360° over its smallest spacing, since each reading can turn the curve).
 * A compound of coprime layers repeats only once a revolution, but its finest feature is that of
 * its busiest layer.
 */
export function finestFeature(design: Design): number {
  let most = rosetteRepeats(design.rosette);
  for (const layer of design.rosette.layers) {
    if (!(layerPeakToValley(layer) > 0)) continue;
    most = Math.max(most, layer.lobes * featuresPerLobe(layer.wave));
  }
  return design.motion.travelPerRev / most;
}

function featuresPerLobe(wave: Wave): number {
  if (wave.shape === 'fourier') return wave.terms.reduce((k, t) => Math.max(k, t.k), 1);
  if (wave.shape !== 'measured') return 1;
  const angles = wave.points.map((p) => p[0]);
  let gap = 360 - angles[angles.length - 1] + angles[0];
  for (let j = 1; j < angles.length; j++) gap = Math.min(gap, angles[j] - angles[j - 1]);
  return 360 / gap;
}

/**
 * The step the design needs (mm): 1/2000 of its finest feature, which bounds the height error of
 * the samples by 0.1 % even at sharp crests and valleys (a sampled triangle misses its extreme by
 * at most slope·h/2 = A·h/P at each end; kinks made by the rubber, the cutter or the follower are
 * no sharper), and an eighth of the smallest radius (the cutter's, the follower's, and the
 * rubber's as it reads the bar, ρ·T/(2π·R0)), so that each disc spans several samples; radii under
 * 0.008 mm act within one step and ask no finer than 0.001 mm.
 */
export function neededStep(design: Design): number {
  const { travelPerRev: T } = design.motion;
  const rho = design.rubber.shape === 'round' ? design.rubber.radius : design.rubber.width / 2;
  const radii = [design.cutter.diameter / 2, design.follower.radius, (rho * T) / (2 * Math.PI * design.rosette.baseRadius)];
  const radiusStep = Math.min(...radii.filter((r) => r > 0).map((r) => Math.max(MIN_RADIUS_STEP_MM, r / SAMPLES_PER_RADIUS)));
  return Math.min(finestFeature(design) / SAMPLES_PER_FEATURE, radiusStep);
}

/**
 * The default step: the needed step (see `neededStep`), at most 0.02 mm, and no finer than the bar
 * length over 150 000 (so a bar holding very many fine features is sampled more coarsely, and says
 * so: see `coarseSamplingWarning`).
 */
export function defaultStep(design: Design): number {
  return Math.max(design.bar.length / MAX_DEFAULT_SAMPLES, Math.min(neededStep(design), 0.02));
}

/** The default step for one period of an endless bar (the line study): as `defaultStep`, within 150 000 samples a period. */
export function defaultPeriodStep(design: Design): number {
  const period = design.motion.travelPerRev / rosetteRepeats(design.rosette);
  return Math.max(period / MAX_DEFAULT_SAMPLES, Math.min(neededStep(design), 0.02));
}

/**
 * Says so when the grid is coarser than the design needs (a caller's step, or the default capped at
 * 150 000 points): sharp crests and valleys may then miss up to 2·h/λ of the amplitude (λ the
 * finest feature, A·h/λ at each end). The message is in `units`; the warning has no `at` or
 * `amount` (it is about the whole bar).
 */
export function coarseSamplingWarning(design: Design, grid: BarGrid, units: Units, requested?: number): EngineWarning | undefined {
  const needed = neededStep(design);
  if (grid.step <= needed * (1 + 1e-9)) return undefined;
  const feature = finestFeature(design);
  const worst = Math.min(1, (2 * grid.step) / feature);
  const perFeature = Math.max(1, Math.floor(feature / grid.step));
  const why =
    requested === undefined
      ? `The bar holds ${Math.round(grid.length / feature)} of its finest features (every ${formatLength(feature, units)}), so the default sampling (every ${formatLength(grid.step, units)}) stops at ${MAX_DEFAULT_SAMPLES} points`
      : `The step of ${formatLength(requested, units)} is coarser than this design needs (its finest feature repeats every ${formatLength(feature, units)}, ${perFeature} points each)`;
  return {
    code: 'other',
    message: `${why}: heights at sharp crests and valleys may be off by up to ${+(100 * worst).toPrecision(2)} % of the amplitude. The error goes with the step: a step of ${fineEnoughStep(needed, units)} keeps it within 0.1 %.`,
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

/** A step (mm) in `units`, rounded down to two significant figures so that it is fine enough. */
function fineEnoughStep(stepMm: number, units: Units): string {
  const value = stepMm / (units === 'in' ? MM_PER_INCH : 1);
  const unit = 10 ** (Math.floor(Math.log10(value)) - 1);
  return `${+(Math.floor(value / unit) * unit).toPrecision(2)} ${units}`;
}

/** x of node i (mm); the last node is the bar's end when it lies on the grid. */
export function nodeX(grid: BarGrid, i: number): number {
  return grid.endOnGrid && i === grid.lastNode ? grid.length : i * grid.step;
}
