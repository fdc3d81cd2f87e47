import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { shownAndOpposite } from './cut-pair';
import { profileSamples } from './profile';
import { clipperEnvelopes, topHeights } from './testing/clipper-envelope';

/**
 * An asymmetric wave: w = sin t + 0.45·cos 2t + 0.25·sin 3t (Fourier terms), so crests are sharp and
 * valleys broad, and the flanks rise and fall at different slopes. Mirroring it top to bottom is
 * not a shift of it, so the lower and upper envelopes of one cut are different shapes.
 */
const asymmetric: Design = {
  ...EXAMPLE_DESIGN,
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0.13, wave: { shape: 'fourier', terms: [{ k: 1, a: 0, b: 1 }, { k: 2, a: 0.45, b: 0 }, { k: 3, a: 0, b: 0.25 }] } }] },
  bar: { ...EXAMPLE_DESIGN.bar, length: 14 },
  follower: { radius: 1.8 },
};

describe('shown and opposite: the two blanks of one cut', () => {
  const step = 0.005;
  const { shown, opposite } = shownAndOpposite(asymmetric, { step });
  const s = profileSamples(shown)!;
  const o = profileSamples(opposite)!;
  const rc = asymmetric.cutter.diameter / 2;
  const rf = asymmetric.follower.radius;
  const margin = Math.ceil(4.5 / step); // clipper's polygon stops at the bar's ends; the engine's cutter runs past them

  it('are cut by one cutter path on one grid', () => {
    expect(Array.from(o.x)).toEqual(Array.from(s.x));
    expect(Array.from(o.cutter)).toEqual(Array.from(s.cutter));
  });

  it('below the cutter the lower envelope, above it the upper envelope, as clipper-lib offsets them', () => {
    // clipper-lib (npm, a port of Angus Johnson's Clipper) offsets polygons independently of our
    // envelopes: the region below the path eroded by rc is the shown bar, dilated by rf its follower;
    // the region above (the region below the path mirrored, y → −y) eroded by rc is the opposite blank,
    // and its follower rides under it. Clipper offsets the chords between samples, the engine discs at
    // the samples: where arcs meet in a cusp a sample misses its tip by a fraction of slope·h (0.52 µm
    // at most here, measured), plus clipper's arc tolerance of 0.1 µm: within 1 µm.
    const tolerance = 1e-3;
    const below = clipperEnvelopes(s.x, s.cutter, rc, rf);
    const above = clipperEnvelopes(s.x, s.cutter.map((y) => -y), rc, rf);
    const shownEdge = topHeights(below.bar, below.scale, s.x);
    const shownFollower = topHeights(below.follower, below.scale, s.x);
    const oppositeEdge = topHeights(above.bar, above.scale, s.x);
    const oppositeFollower = topHeights(above.follower, above.scale, s.x);
    for (let i = margin; i < s.x.length - margin; i++) {
      expect(Math.abs(shownEdge[i] - s.bar[i])).toBeLessThan(tolerance);
      expect(Math.abs(shownFollower[i] - s.follower[i])).toBeLessThan(tolerance);
      expect(Math.abs(-oppositeEdge[i] - o.bar[i])).toBeLessThan(tolerance);
      expect(Math.abs(-oppositeFollower[i] - o.follower[i])).toBeLessThan(tolerance);
      // The cutter runs between the blanks: the shown edge at least rc below it, the opposite at least rc above.
      expect(s.bar[i]).toBeLessThanOrEqual(s.cutter[i] - rc + 1e-12);
      expect(o.bar[i]).toBeGreaterThanOrEqual(o.cutter[i] + rc - 1e-12);
    }
  });

  it('the opposite edge is not the shown edge mirrored, nor mirrored and shifted by any whole number of samples', () => {
    const top = Math.max(...s.cutter);
    const mirrored = Array.from(s.bar, (y) => top - y);
    const period = Math.round(shown.period / shown.step);
    // The opposite edge, from its own cutter-relative height, against every shift of the mirrored edge within a period.
    let closest = Infinity;
    for (let shift = 0; shift < period; shift++) {
      let worst = 0;
      let offset = NaN;
      for (let i = margin; i < margin + period; i++) {
        const d = o.bar[i] - mirrored[i + shift];
        if (Number.isNaN(offset)) offset = d;
        worst = Math.max(worst, Math.abs(d - offset));
      }
      closest = Math.min(closest, worst);
    }
    expect(closest).toBeGreaterThan(0.02); // mm: no mirror of the shown bar, moved up, down or along, is the opposite blank
  });
});
