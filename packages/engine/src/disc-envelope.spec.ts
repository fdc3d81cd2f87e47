import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lowerDiscEnvelope, upperDiscEnvelope } from './disc-envelope';

/** The definition, by brute force: min over the samples within reach of y_j − √(r² − d²). */
function bruteErosion(y: ArrayLike<number>, step: number, r: number): number[] {
  return Array.from(y, (_, i) => {
    let m = Infinity;
    for (let j = 0; j < y.length; j++) {
      const d = (i - j) * step;
      if (Math.abs(d) <= r) m = Math.min(m, y[j] - Math.sqrt(r * r - d * d));
    }
    return m;
  });
}

/** The definition with the reach in whole samples, ⌊r/step⌋, and the depth √((r/step)² − d²)·step, as the engine takes them. */
function bruteErosionInSamples(y: ArrayLike<number>, step: number, r: number): number[] {
  const rr = r / step;
  const reach = Math.floor(rr);
  return Array.from(y, (_, i) => {
    let m = Infinity;
    for (let j = Math.max(0, i - reach); j <= Math.min(y.length - 1, i + reach); j++) m = Math.min(m, y[j] - Math.sqrt(Math.max(0, rr * rr - (i - j) ** 2)) * step);
    return m;
  });
}

const curve = fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 1, maxLength: 300 });

describe('disc envelopes', () => {
  it('erosion equals its definition for any samples, step and radius', () => {
    fc.assert(
      fc.property(curve, fc.double({ min: 0.005, max: 0.5, noNaN: true }), fc.double({ min: 0, max: 4, noNaN: true }), (values, step, radius) => {
        const y = Float64Array.from(values);
        const fast = lowerDiscEnvelope(y, step, radius);
        bruteErosion(y, step, radius).forEach((v, i) => expect(Math.abs(fast[i] - v)).toBeLessThan(1e-9));
      }),
      { numRuns: 200 },
    );
  });

  it('dilation is the mirror of erosion', () => {
    fc.assert(
      fc.property(curve, fc.double({ min: 0.01, max: 0.2, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }), (values, step, radius) => {
        const y = Float64Array.from(values);
        const up = upperDiscEnvelope(y, step, radius);
        bruteErosion(y.map((v) => -v), step, radius).forEach((v, i) => expect(Math.abs(up[i] + v)).toBeLessThan(1e-9));
      }),
      { numRuns: 100 },
    );
  });

  it('gives no node a cup that does not reach it, however far along the curve (radii a hair under or over whole steps)', () => {
    // Here the cups' reach is decided as the engine decides it, in whole samples (bruteErosionInSamples):
    // in length units a cup's rim may fall either side of a node by rounding, where its depth is 0.
    const cases: [number[] | Float64Array, number, number][] = [
      // Found by a second reader: a cup popped by rounded switch points (4.7 and -0.224 against 0.776),
      // and a crossing rounded below the node where the later cup starts.
      [[5, 5, 5, 5, 0, 1, 5, 5, 5, 5, 0, 5, 5, 5], 0.1, 0.3],
      [[5, 5, 5, 5, 5, 5, 5, 0.3473580809295971, 0.18152684146569897, 5, 5, 5, 5, 5], 0.05, 0.3],
    ];
    // Found by a third reader: a radius a few ulps over whole steps, where a cup stands nearly upright at
    // its edge, so the crossing's rounding gave the edge node the higher cup (1e-8 of the radius off).
    cases.push([[0, 1], 1, 1.0000000000000002], [[0, 0.1], 0.1, 0.10000000000000003], [[0, 10, 1e-8], 1, 1.0000000000000002]);
    const upright = new Float64Array(12_001).fill(1e9);
    upright[10_000] = 0;
    upright[10_002] = 89.42033539395024;
    cases.push([upright, 1, 2000 * (1 + 2 ** -52)]);
    // From a property run of the tiled bar (step 0.10000000000000014 mm, radius 0.10000000000000013 mm):
    // past a few hundred samples a node took its neighbour's cup, 0.1 mm too deep.
    for (const at of [3, 532, 5000]) {
      const y = new Float64Array(at + 4);
      y.set([0.09999996629016891, 0.10431517061809896, 0.09421249580766299, 0], at);
      cases.push([y, 0.10000000000000014, 0.10000000000000013]);
    }
    // Smooth curves of 3000 samples with radii at, or a hair under, whole numbers of steps.
    const wave = (step: number, phase: number) => Float64Array.from({ length: 3000 }, (_, i) => 0.2 * Math.sin(i * step * 2.1 + phase) + 0.05 * Math.sin(i * step * 7.3));
    for (const [step, r] of [[0.1, 0.3], [0.05, 0.15], [0.05, 0.3], [0.01, 0.03]]) for (const phase of [0, 0.7, 2.9]) cases.push([wave(step, phase), step, r]);
    for (const m of [1, 2, 3, 4, 5]) for (const step of [0.1, 0.0125, 0.00208]) for (const hair of [-1, 1, 3]) cases.push([wave(step, m), step, m * step * (1 + hair * 2 ** -52)]);
    for (const [values, step, r] of cases) {
      const y = Float64Array.from(values);
      const fast = lowerDiscEnvelope(y, step, r);
      const slow = bruteErosionInSamples(y, step, r);
      slow.forEach((v, i) => expect(Math.abs(fast[i] - v), `node ${i} of ${y.length}, step ${step}, radius ${r}`).toBeLessThan(1e-12));
      const mirrored = upperDiscEnvelope(y.map((v) => -v), step, r);
      fast.forEach((v, i) => expect(mirrored[i] + v).toBe(0));
    }
  });

  it('is the identity for radius 0, and a flat line drops by the radius', () => {
    const y = Float64Array.from([1, 2, 3]);
    expect(Array.from(lowerDiscEnvelope(y, 0.1, 0))).toEqual([1, 2, 3]);
    expect(Array.from(lowerDiscEnvelope(new Float64Array(50).fill(2), 0.01, 0.3))).toEqual(new Array(50).fill(1.7));
  });

  it('opening (erode then dilate by the same disc) never rises above the curve and keeps what the disc fits', () => {
    const y = Float64Array.from({ length: 2000 }, (_, i) => 0.5 * Math.cos(i * 0.01) + 0.1 * Math.abs(Math.sin(i * 0.004)));
    const opened = upperDiscEnvelope(lowerDiscEnvelope(y, 0.01, 0.5), 0.01, 0.5);
    opened.forEach((v, i) => expect(v).toBeLessThanOrEqual(y[i] + 1e-12));
  });
});
