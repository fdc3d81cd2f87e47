import type { RosetteLayer, Wave } from '@barwright/contracts';
import { periodicMonotoneSpline } from './periodic-spline';

/**
 * A wave w(t): period 2π in the wave's own angle t = N·θ + 2π·phase, values in [−1, 1]
 * (peak-to-valley exactly 2), with its crest at t = 0 for every symmetric shape.
 */
export type WaveFn = (t: number) => number;

const TWO_PI = 2 * Math.PI;

/** t reduced to [−π, π). */
export function wrapAngle(t: number): number {
  let u = (t + Math.PI) % TWO_PI;
  if (u < 0) u += TWO_PI;
  return u - Math.PI;
}

export const sineWave: WaveFn = (t) => Math.cos(t);

/** Triangle: straight flanks, sharp crest at 0 and sharp valley at ±π. */
export const pointedWave: WaveFn = (t) => 1 - (2 * Math.abs(wrapAngle(t))) / Math.PI;

/** A sine clipped at `clip` (0 < clip ≤ 1) and stretched back to [−1, 1]: flat crests, round valleys. */
export function flatWave(clip: number): WaveFn {
  return (t) => (2 * (Math.min(Math.cos(t), clip) + 1)) / (clip + 1) - 1;
}

/**
 * Circular-arc lobes meeting in cusps at the valleys. The arc is circular in the developed plane
 * (arc length along the base circle against radius), through the two cusps and the crest; `aspect`
 * is peak-to-valley over half the lobe's width. From aspect 1 on (an arc deeper than a semicircle
 * is no longer a function) the lobe is a half-ellipse, the same curve at aspect 1.
 */
export function scallopWave(aspect: number): WaveFn {
  if (aspect >= 1) return (t) => 2 * Math.sqrt(Math.max(0, 1 - (wrapAngle(t) / Math.PI) ** 2)) - 1;
  if (!(aspect > 1e-9)) return (t) => 1 - 2 * (wrapAngle(t) / Math.PI) ** 2; // a very shallow arc is a parabola
  const q = (1 + aspect * aspect) / (2 * aspect); // arc radius over half-width
  return (t) => {
    const u = wrapAngle(t) / Math.PI;
    // height above the cusps over half-width = aspect − u²/(√(q²−u²)+q), written without cancellation
    return 1 - (2 * u * u) / (aspect * (Math.sqrt(q * q - u * u) + q));
  };
}

/**
 * The exact offset circle as a wave: a circle of radius R0 whose centre sits e = A/2 from the axis
 * reads r(θ) = e·cosθ + √(R0² − e²·sin²θ); w is (r − R0)/e so that r = R0 + e·w.
 */
export function eccentricWave(baseRadius: number, eccentricity: number): WaveFn {
  if (!(eccentricity > 0)) return sineWave;
  const e2 = eccentricity * eccentricity;
  const r2 = baseRadius * baseRadius;
  return (t) => {
    const sin = Math.sin(t);
    // (√(R0² − e²sin²θ) − R0)/e written as −e·sin²θ/(√(…) + R0), free of cancellation for small e
    return Math.cos(t) - (eccentricity * sin * sin) / (Math.sqrt(r2 - e2 * sin * sin) + baseRadius);
  };
}

/** Σ aₖ·cos(kt) + bₖ·sin(kt), centred and scaled so its peak-to-valley is 2. */
export function fourierWave(terms: readonly { k: number; a: number; b: number }[]): WaveFn {
  const raw = (t: number) => terms.reduce((sum, { k, a, b }) => sum + a * Math.cos(k * t) + b * Math.sin(k * t), 0);
  const [lo, hi] = fourierRange(terms, raw);
  return normalised(raw, lo, hi);
}

/** Measured readings [degrees, radius] over one wave period, interpolated periodically, centred and scaled. */
export function measuredWave(points: readonly (readonly [number, number])[]): WaveFn {
  const radii = points.map((p) => p[1]);
  const spline = periodicMonotoneSpline(
    points.map((p) => (p[0] * Math.PI) / 180),
    radii,
  );
  // The interpolant never overshoots, so the readings hold its extremes.
  return normalised(spline, Math.min(...radii), Math.max(...radii));
}

/** The wave of one rosette layer (some shapes depend on the base radius, lobes and amplitude). */
export function layerWave(layer: RosetteLayer, baseRadius: number): WaveFn {
  const wave: Wave = layer.wave;
  switch (wave.shape) {
    case 'sine':
      return sineWave;
    case 'pointed':
      return pointedWave;
    case 'flat':
      return flatWave(wave.clip);
    case 'scallop':
      return scallopWave((layer.amplitude * layer.lobes) / (Math.PI * baseRadius));
    case 'eccentric':
      return eccentricWave(baseRadius, layer.amplitude / 2);
    case 'fourier':
      return fourierWave(wave.terms);
    case 'measured':
      return measuredWave(wave.points);
  }
}

function normalised(raw: WaveFn, lo: number, hi: number): WaveFn {
  const mid = (lo + hi) / 2;
  const half = (hi - lo) / 2;
  // The design file bounds coefficients and readings, so this is a guard, never a straight bar in silence.
  if (!Number.isFinite(half)) throw new RangeError(`the wave's range is not finite (${lo} to ${hi})`);
  if (!(half > 0)) return () => 0;
  return (t) => Math.max(-1, Math.min(1, (raw(t) - mid) / half));
}

/** Extremes of a trigonometric polynomial: dense sampling, then Newton steps on the derivative. */
export function fourierRange(terms: readonly { k: number; a: number; b: number }[], raw: WaveFn): [number, number] {
  const kMax = Math.max(...terms.map((t) => t.k));
  const count = Math.max(512, 32 * kMax);
  const step = TWO_PI / count;
  let iMin = 0;
  let iMax = 0;
  const samples = Float64Array.from({ length: count }, (_, i) => raw(i * step));
  samples.forEach((v, i) => {
    if (v < samples[iMin]) iMin = i;
    if (v > samples[iMax]) iMax = i;
  });
  const refine = (i: number) => {
    let t = i * step;
    for (let n = 0; n < 6; n++) {
      let d1 = 0;
      let d2 = 0;
      for (const { k, a, b } of terms) {
        d1 += k * (b * Math.cos(k * t) - a * Math.sin(k * t));
        d2 -= k * k * (a * Math.cos(k * t) + b * Math.sin(k * t));
      }
      if (d2 === 0) break;
      t = Math.min(i * step + step, Math.max(i * step - step, t - d1 / d2));
    }
    return raw(t);
  };
  return [Math.min(samples[iMin], refine(iMin)), Math.max(samples[iMax], refine(iMax))];
}
