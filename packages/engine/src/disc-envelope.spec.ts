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

  it('gives a node no cup that ends short of it, far along a long curve (a radius a hair under one step)', () => {
    // From a property run of the tiled bar: step 0.10000000000000014 mm, cutter radius 0.10000000000000013
    // mm. Past a few hundred samples the switch point a + r/step rounded up onto the next node, which
    // then took its neighbour's cup, 0.1 mm too deep, though that cup ends 1e-16 of a step before it.
    const step = 0.10000000000000014;
    const r = 0.10000000000000013;
    for (const at of [3, 532, 5000]) {
      const y = new Float64Array(at + 4);
      y.set([0.09999996629016891, 0.10431517061809896, 0.09421249580766299, 0], at);
      const fast = lowerDiscEnvelope(y, step, r);
      bruteErosion(y, step, r).forEach((v, i) => expect(Math.abs(fast[i] - v), `node ${i} of ${at + 4}`).toBeLessThan(1e-12));
      const mirrored = upperDiscEnvelope(y.map((v) => -v), step, r);
      fast.forEach((v, i) => expect(mirrored[i]).toBe(-v));
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
