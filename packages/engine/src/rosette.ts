import { layerPeakToValley, type Design } from '@barwright/contracts';
import { reducedPhase } from './phase-schedule';
import { layerWave, type WaveFn } from './waves';

type Rosette = Design['rosette'];

/** One prepared layer: r gains (A/2)·w(N·θ + 2π·phase), the phase taken modulo 1 first (exact for any double). */
interface PreparedLayer {
  lobes: number;
  half: number;
  phase: number;
  wave: WaveFn;
}

/** The rosette as a function: r(θ) = R0 + Σ (Aᵢ/2)·wᵢ(Nᵢ·θ + 2π·phaseᵢ), θ in radians, r in the rosette's length unit. */
export function rosetteRadius(rosette: Rosette): (theta: number) => number {
  const layers = prepare(rosette);
  const r0 = rosette.baseRadius;
  return (theta) => {
    let r = r0;
    for (const l of layers) r += l.half * l.wave(l.lobes * theta + l.phase);
    return r;
  };
}

/** r at θ = (first + j)·dTheta for j = 0 … count−1 (index-based angles keep periodic tables exact). */
export function sampleRosette(rosette: Rosette, first: number, count: number, dTheta: number): Float64Array {
  const out = new Float64Array(count).fill(rosette.baseRadius);
  for (const l of prepare(rosette)) {
    for (let j = 0; j < count; j++) out[j] += l.half * l.wave(l.lobes * (first + j) * dTheta + l.phase);
  }
  return out;
}

/** r at θ = theta0 + j·dTheta, for j = −pad … count−1+pad (index 0 of the result is j = −pad). */
export function sampleRosetteAround(rosette: Rosette, theta0: number, pad: number, count: number, dTheta: number): Float64Array {
  const radius = rosetteRadius(rosette);
  return Float64Array.from({ length: count + 2 * pad }, (_, j) => radius(theta0 + (j - pad) * dTheta));
}

/** r over one revolution at `samples` equal steps from θ = 0. */
export function sampleRevolution(rosette: Rosette, samples: number): Float64Array {
  return sampleRosette(rosette, 0, samples, (2 * Math.PI) / samples);
}

/**
 * The number of times the rosette repeats in a revolution: the gcd of the lobe counts of the layers
 * that move (amplitude > 0); the period on the bar is travelPerRev divided by it.
 */
export function rosetteRepeats(rosette: Rosette): number {
  const moving = rosette.layers.filter((l) => layerPeakToValley(l) > 0);
  return (moving.length ? moving : rosette.layers).reduce((g, l) => gcd(g, l.lobes), 0);
}

/** A lower bound of r: every wave stays within [−1, 1]. */
export function rosetteMinRadius(rosette: Rosette): number {
  return rosette.baseRadius - rosette.layers.reduce((s, l) => s + layerPeakToValley(l) / 2, 0);
}

function prepare(rosette: Rosette): PreparedLayer[] {
  return rosette.layers
    .filter((l) => layerPeakToValley(l) > 0)
    .map((l) => ({ lobes: l.lobes, half: layerPeakToValley(l) / 2, phase: 2 * Math.PI * reducedPhase(l.phase), wave: layerWave(l, rosette.baseRadius) }));
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}
