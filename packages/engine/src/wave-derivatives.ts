import type { RosetteLayer } from '@barwright/contracts';
import { fourierRange, layerWave, wrapAngle } from './waves';

/** w, dw/dt and d²w/dt² of a wave at its own angle t (see WaveFn). */
export type WaveJet = (t: number) => [w: number, w1: number, w2: number];

/** A slope discontinuity of a wave at t (in [−π, π)): convex where the slope drops (a sharp crest), concave where it rises (a cusp). */
export interface WaveCorner {
  t: number;
  convex: boolean;
}

/** The analytic derivatives of a layer's wave, and its corners (where the derivative jumps). */
export interface LayerDerivatives {
  jet: WaveJet;
  corners: WaveCorner[];
}

/**
 * Exact derivatives of every wave shape, so that curvature comes from the geometry rather than
 * from differences of samples. Measured tables are interpolated by a C¹ cubic, differentiated on
 * each piece by central differences (exact to rounding for a cubic's first two derivatives).
 */
export function layerDerivatives(layer: RosetteLayer, baseRadius: number): LayerDerivatives {
  const wave = layer.wave;
  switch (wave.shape) {
    case 'sine':
      return { jet: (t) => [Math.cos(t), -Math.sin(t), -Math.cos(t)], corners: [] };
    case 'pointed':
      return {
        jet: (t) => {
          const u = wrapAngle(t);
          return [1 - (2 * Math.abs(u)) / Math.PI, u > 0 ? -2 / Math.PI : 2 / Math.PI, 0];
        },
        corners: [{ t: 0, convex: true }, { t: -Math.PI, convex: false }],
      };
    case 'flat': {
      const clip = wave.clip;
      const scale = 2 / (clip + 1);
      const jet: WaveJet = (t) => (Math.cos(t) >= clip ? [1, 0, 0] : [scale * (Math.cos(t) + 1) - 1, -scale * Math.sin(t), -scale * Math.cos(t)]);
      const edge = Math.acos(clip);
      return { jet, corners: clip < 1 ? [{ t: -edge, convex: true }, { t: edge, convex: true }] : [] };
    }
    case 'scallop':
      return { jet: scallopJet((layer.amplitude * layer.lobes) / (Math.PI * baseRadius)), corners: [{ t: -Math.PI, convex: false }] };
    case 'eccentric':
      return { jet: eccentricJet(baseRadius, layer.amplitude / 2), corners: [] };
    case 'fourier':
      return { jet: fourierJet(wave.terms), corners: [] };
    case 'measured':
      return { jet: differenced(layerWave(layer, baseRadius)), corners: [] };
  }
}

/** The scallop's arc (see scallopWave): w = 1 − 2(q − √(q² − u²))/a with u = t/π on one lobe. */
function scallopJet(aspect: number): WaveJet {
  const k = 1 / Math.PI;
  if (aspect >= 1) {
    return (t) => {
      const u = wrapAngle(t) * k;
      const root = Math.sqrt(Math.max(1e-300, 1 - u * u));
      return [2 * root - 1, (-2 * u * k) / root, (-2 * k * k) / root ** 3];
    };
  }
  if (!(aspect > 1e-9)) return (t) => [1 - 2 * (wrapAngle(t) * k) ** 2, -4 * wrapAngle(t) * k * k, -4 * k * k];
  const q = (1 + aspect * aspect) / (2 * aspect);
  return (t) => {
    const u = wrapAngle(t) * k;
    const root = Math.sqrt(q * q - u * u);
    return [1 - (2 * u * u) / (aspect * (root + q)), (-2 * u * k) / (aspect * root), (-2 * q * q * k * k) / (aspect * root ** 3)];
  };
}

/** w = cos t + (g − R0)/e with g = √(R0² − e²·sin²t) (see eccentricWave). */
function eccentricJet(r0: number, e: number): WaveJet {
  if (!(e > 0)) return (t) => [Math.cos(t), -Math.sin(t), -Math.cos(t)];
  return (t) => {
    const sin = Math.sin(t);
    const cos = Math.cos(t);
    const g = Math.sqrt(r0 * r0 - e * e * sin * sin);
    const g1 = (-e * e * sin * cos) / g;
    const g2 = (-e * e * (cos * cos - sin * sin)) / g - (e ** 4 * sin * sin * cos * cos) / g ** 3;
    return [cos - (e * sin * sin) / (g + r0), -sin + g1 / e, -cos + g2 / e];
  };
}

function fourierJet(terms: readonly { k: number; a: number; b: number }[]): WaveJet {
  const raw = (t: number) => terms.reduce((sum, { k, a, b }) => sum + a * Math.cos(k * t) + b * Math.sin(k * t), 0);
  const [lo, hi] = fourierRange(terms, raw);
  const half = (hi - lo) / 2;
  const mid = (hi + lo) / 2;
  if (!(half > 0)) return () => [0, 0, 0];
  return (t) => {
    let w = 0;
    let w1 = 0;
    let w2 = 0;
    for (const { k, a, b } of terms) {
      const c = Math.cos(k * t);
      const s = Math.sin(k * t);
      w += a * c + b * s;
      w1 += k * (b * c - a * s);
      w2 -= k * k * (a * c + b * s);
    }
    return [(w - mid) / half, w1 / half, w2 / half];
  };
}

function differenced(wave: (t: number) => number): WaveJet {
  const d = 1e-5;
  return (t) => {
    const before = wave(t - d);
    const w = wave(t);
    const after = wave(t + d);
    return [w, (after - before) / (2 * d), (after - 2 * w + before) / (d * d)];
  };
}
