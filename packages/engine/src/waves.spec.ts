import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { eccentricWave, flatWave, fourierWave, measuredWave, pointedWave, scallopWave, sineWave, type WaveFn } from './waves';

const TWO_PI = 2 * Math.PI;

/** Min and max of a wave over a fine grid of one period. */
function range(w: WaveFn, samples = 20000): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < samples; i++) {
    const v = w((i / samples) * TWO_PI);
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  return [lo, hi];
}

const SHAPES: [string, WaveFn][] = [
  ['sine', sineWave],
  ['pointed', pointedWave],
  ['flat 0.5', flatWave(0.5)],
  ['scallop', scallopWave(0.23)],
  ['deep scallop', scallopWave(3)],
  ['eccentric', eccentricWave(30, 3)],
  ['fourier', fourierWave([{ k: 1, a: 1, b: 0 }, { k: 3, a: 0.2, b: -0.4 }])],
  ['measured', measuredWave(Array.from({ length: 12 }, (_, i) => [i * 30, 50 + Math.sin(i) ** 3] as [number, number]))],
];

describe('waves', () => {
  it.each(SHAPES)('%s stays within [−1, 1], reaches both ends and repeats every 2π', (_, w) => {
    const [lo, hi] = range(w);
    expect(lo).toBeGreaterThanOrEqual(-1);
    expect(hi).toBeLessThanOrEqual(1);
    expect(lo).toBeCloseTo(-1, 3);
    expect(hi).toBeCloseTo(1, 3);
    for (const t of [0.1, 1, 2.5, -4]) expect(w(t + TWO_PI)).toBeCloseTo(w(t), 12);
  });

  it('puts the crest of the symmetric shapes at t = 0 and the valley at π', () => {
    for (const w of [sineWave, pointedWave, flatWave(0.7), scallopWave(0.4), eccentricWave(50, 1)]) {
      expect(w(0)).toBeCloseTo(1, 12);
      expect(w(Math.PI)).toBeCloseTo(-1, 12);
    }
  });

  it('pointed has straight flanks of slope 2/π', () => {
    expect(pointedWave(Math.PI / 2)).toBeCloseTo(0, 12);
    expect(pointedWave(0.3) - pointedWave(0.6)).toBeCloseTo((2 / Math.PI) * 0.3, 12);
  });

  it('flat is a clipped sine: a flat crest of the clip width, round valleys', () => {
    const w = flatWave(0.5);
    expect(w(0)).toBe(1);
    expect(w(Math.acos(0.5) - 1e-9)).toBe(1);
    expect(w(Math.PI / 2)).toBeCloseTo((2 * 1) / 1.5 - 1, 12);
    expect(flatWave(1)(1.234)).toBeCloseTo(Math.cos(1.234), 12);
  });

  it('scallop lobes are circular arcs through the cusps and the crest (developed plane)', () => {
    // aspect h/c = 0.25: arc radius q = (c² + h²)/(2h) in half-widths; points (u, height) lie on it.
    const aspect = 0.25;
    const w = scallopWave(aspect);
    const q = (1 + aspect ** 2) / (2 * aspect);
    for (const u of [0, 0.3, 0.7, 1]) {
      const height = ((w(u * Math.PI) + 1) / 2) * aspect; // above the cusps, in half-widths
      expect(u * u + (height - (aspect - q)) ** 2).toBeCloseTo(q * q, 10);
    }
    expect(w(Math.PI)).toBeCloseTo(-1, 12);
  });

  it('eccentric is the exact offset circle r = e·cosθ + √(R0² − e²·sin²θ) (derived geometry)', () => {
    const w = eccentricWave(30, 3);
    for (const deg of [0, 30, 60, 90, 120, 180]) {
      const t = (deg * Math.PI) / 180;
      expect(30 + 3 * w(t)).toBeCloseTo(3 * Math.cos(t) + Math.sqrt(900 - 9 * Math.sin(t) ** 2), 12);
    }
  });

  it('fourier is normalised to a peak-to-valley of 2 for any coefficients', () => {
    const term = fc.record({ k: fc.integer({ min: 1, max: 64 }), a: fc.double({ min: -5, max: 5, noNaN: true }), b: fc.double({ min: -5, max: 5, noNaN: true }) });
    fc.assert(
      fc.property(fc.array(term, { minLength: 1, maxLength: 6 }).filter((ts) => ts.some((t) => Math.abs(t.a) + Math.abs(t.b) > 1e-3)), (terms) => {
        const [lo, hi] = range(fourierWave(terms), 40000);
        expect(lo).toBeGreaterThanOrEqual(-1);
        expect(hi).toBeLessThanOrEqual(1);
        expect(hi - lo).toBeGreaterThan(1.995);
      }),
      { numRuns: 40 },
    );
  });

  it('measured passes through its (centred, scaled) readings and never overshoots them', () => {
    const readings: [number, number][] = [[0, 50], [40, 50.6], [90, 50.2], [130, 49.5], [180, 50.9], [230, 50.1], [280, 49.8], [330, 50.3]];
    const w = measuredWave(readings);
    for (const [deg, r] of readings) expect(w((deg * Math.PI) / 180)).toBeCloseTo((r - 50.2) / 0.7, 12);
    const [lo, hi] = range(w);
    expect(lo).toBeGreaterThanOrEqual(-1);
    expect(hi).toBeLessThanOrEqual(1);
    // Between two readings the curve stays between them (monotone interpolation).
    for (let deg = 40; deg <= 90; deg += 0.5) {
      const v = w((deg * Math.PI) / 180);
      expect(v).toBeLessThanOrEqual(w((40 * Math.PI) / 180) + 1e-12);
      expect(v).toBeGreaterThanOrEqual(w((90 * Math.PI) / 180) - 1e-12);
    }
    // Periodic across 360°: the piece from 330° wraps to 0°.
    expect(w(TWO_PI - 1e-9)).toBeCloseTo(w(0), 6);
  });

  it('measured with equal readings is a still wave', () => {
    expect(measuredWave(Array.from({ length: 8 }, (_, i) => [i * 45, 50] as [number, number]))(1)).toBe(0);
  });
});
