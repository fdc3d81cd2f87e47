import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { counterPhaseDesign } from './bar';
import { computeBarSamples, counterPhaseProfile, invertedProfile } from './profile';
import { clipperEnvelopes, topHeights } from './testing/clipper-envelope';

describe('bar edge and follower against clipper-lib', () => {
  it('match the polygon offsets of the independent Clipper port (erode by rc, then dilate by rf)', () => {
    // clipper-lib (npm, a port of Angus Johnson's Clipper) offsets the region below the cutter path.
    // A short bar keeps Clipper's union clean-up quick; arcs drawn to 0.1 µm.
    const design: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 20 }, follower: { radius: 1.5 } };
    const s = computeBarSamples(design, { step: 0.01 });
    const { bar, follower, scale } = clipperEnvelopes(s.x, s.cutter, design.cutter.diameter / 2, design.follower.radius, { arcTolerance: 1e-4 });
    const clipperBar = topHeights(bar, scale, s.x);
    const clipperFollower = topHeights(follower, scale, s.x);
    // Away from the ends (Clipper's polygon stops at the bar's ends; ours lets the cutter run past them).
    const margin = Math.ceil(4 / s.grid.step);
    for (let i = margin; i < s.x.length - margin; i++) {
      // Clipper offsets the polyline through the samples, we the discs at the samples: they differ by
      // the sag of a chord (about h²/8r) plus the arc tolerance, well under 0.5 µm.
      expect(Math.abs(clipperBar[i] - s.bar[i])).toBeLessThan(5e-4);
      expect(Math.abs(clipperFollower[i] - s.follower[i])).toBeLessThan(5e-4);
    }
  });
});

describe('bar edge', () => {
  it('lies exactly rc below a straight path and never above the path minus rc', () => {
    const flat: Design = { ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 0, phase: 0, wave: { shape: 'sine' } }] } };
    const s = computeBarSamples(flat, { step: 0.05 });
    s.bar.forEach((v) => expect(v).toBeCloseTo(-EXAMPLE_DESIGN.cutter.diameter / 2, 12));
    const wavy = computeBarSamples(EXAMPLE_DESIGN, { step: 0.01 });
    wavy.bar.forEach((v, i) => expect(v).toBeLessThanOrEqual(wavy.cutter[i] - EXAMPLE_DESIGN.cutter.diameter / 2 + 1e-12));
  });
});

describe('companions', () => {
  const flatTopped: Design = {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'flat', clip: 0.3 } }] },
  };

  it('counter-phase is the same bar shifted by half a period, exactly', () => {
    const step = 100 / 24 / 400; // 400 samples a period, so half a period is 200 samples
    const base = computeBarSamples(flatTopped, { step });
    const shifted = computeBarSamples(counterPhaseDesign(flatTopped), { step });
    expect(base.grid.perPeriod).toBe(400);
    for (let i = 300; i < base.x.length - 500; i++) {
      expect(shifted.cutter[i]).toBeCloseTo(base.cutter[i + 200], 9);
      expect(shifted.follower[i]).toBeCloseTo(base.follower[i + 200], 9);
    }
    expect(counterPhaseProfile(flatTopped, { step }).cutterPath.map((p) => p[1])).toEqual(Array.from(shifted.cutter));
  });

  it('inverted turns crests into valleys and is not the counter-phase bar', () => {
    const base = computeBarSamples(flatTopped, { step: 0.01 });
    const inverted = invertedProfile(flatTopped, { step: 0.01 });
    const counter = counterPhaseProfile(flatTopped, { step: 0.01 });
    const top = Math.max(...base.cutter);
    inverted.cutterPath.forEach(([, y], i) => expect(y).toBeCloseTo(top - base.cutter[i], 12));
    // The flat-topped bar has broad crests and narrow valleys; inverted, broad valleys and narrow crests.
    const share = (ys: number[], above: boolean) => ys.filter((y) => (above ? y > 1.49 : y < 0.01)).length / ys.length;
    const invertedYs = inverted.cutterPath.map((p) => p[1]);
    const counterYs = counter.cutterPath.map((p) => p[1]);
    expect(share(counterYs, true)).toBeGreaterThan(0.2);
    expect(share(invertedYs, true)).toBeLessThan(0.05);
    expect(share(invertedYs, false)).toBeGreaterThan(0.2);
    // and its edge is cut afresh, not the mirror of the original edge
    const mirroredEdge = base.bar.map((v) => -v);
    expect(inverted.barEdge.some(([, y], i) => Math.abs(y - (mirroredEdge[i] - mirroredEdge[0] + inverted.barEdge[0][1])) > 0.01)).toBe(true);
  });
});
