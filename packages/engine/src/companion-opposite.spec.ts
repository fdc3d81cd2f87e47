import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { peakToValley } from './cut-plan';
import { computeBarSamples, computeProfile, invertedProfile, oppositeProfile } from './profile';
import { clipperEnvelopes, topHeights } from './testing/clipper-envelope';

/** Flat crests and narrow valleys: crests and valleys differ in shape, so the two blanks of a cut differ. */
const flatTopped: Design = {
  ...EXAMPLE_DESIGN,
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'flat', clip: 0.3 } }] },
  bar: { ...EXAMPLE_DESIGN.bar, length: 20 },
  follower: { radius: 1.5 },
};

describe('the opposite blank (above the cutter in the same cut)', () => {
  it('has the upper envelope of the cutter disc as its edge, and the follower under it, as clipper-lib offsets them', () => {
    // clipper-lib (npm, a port of Angus Johnson's Clipper), independent of our envelopes: the region
    // above the cutter path is the region below the path mirrored (y → −y); erode it by rc, dilate by rf.
    // The opposite edge has cusps where the path's narrow valleys are (arcs meeting); the follower rides
    // on them, and a sample misses a cusp's tip by up to slope·h: 0.005 mm keeps that under 0.5 µm here.
    const step = 0.005;
    const shown = computeBarSamples(flatTopped, { step });
    const opposite = computeBarSamples(flatTopped, { step, companion: 'opposite' });
    expect(Array.from(opposite.cutter)).toEqual(Array.from(shown.cutter));
    const mirrored = shown.cutter.map((y) => -y);
    const { bar, follower, scale } = clipperEnvelopes(shown.x, mirrored, flatTopped.cutter.diameter / 2, flatTopped.follower.radius);
    const edge = topHeights(bar, scale, shown.x);
    const rides = topHeights(follower, scale, shown.x);
    const margin = Math.ceil(4 / step); // Clipper's polygon stops at the bar's ends; our cutter runs past them
    for (let i = margin; i < shown.x.length - margin; i++) {
      // polyline against discs at the samples: the sag of a chord plus the arc tolerance, under 0.5 µm
      expect(Math.abs(-edge[i] - opposite.bar[i])).toBeLessThan(5e-4);
      expect(Math.abs(-rides[i] - opposite.follower[i])).toBeLessThan(5e-4);
      expect(opposite.bar[i]).toBeGreaterThanOrEqual(opposite.cutter[i] + flatTopped.cutter.diameter / 2 - 1e-12);
    }
  });

  it('is not the shown bar edge mirrored: the narrow valleys it copies lose depth the broad crests do not', () => {
    const shown = computeProfile(flatTopped, { step: 0.01 });
    const opposite = oppositeProfile(flatTopped, { step: 0.01 });
    const inner = (path: [number, number][]) => path.filter(([x]) => x > 3 && x < 17);
    const lossShown = peakToValley(inner(shown.cutterPath)) - peakToValley(inner(shown.barEdge));
    const lossOpposite = peakToValley(inner(opposite.cutterPath)) - peakToValley(inner(opposite.barEdge));
    expect(lossOpposite).toBeGreaterThan(lossShown + 0.01);
  });

  it('turned over is the inverted companion (the mirrored cutter path cut afresh)', () => {
    const opposite = oppositeProfile(flatTopped, { step: 0.01 });
    const inverted = invertedProfile(flatTopped, { step: 0.01 });
    const top = Math.max(...opposite.cutterPath.map((p) => p[1]));
    opposite.barEdge.forEach(([, y], i) => expect(top - y).toBeCloseTo(inverted.barEdge[i][1], 12));
    opposite.followerPath.forEach(([, y], i) => expect(top - y).toBeCloseTo(inverted.followerPath[i][1], 12));
  });
});
