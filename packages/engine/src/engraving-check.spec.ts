import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeBarSamples } from './profile';

/** A sine bar with a point rubber and the given cutter and follower radii (mm). */
function design(cutterRadius: number, followerRadius: number): Design {
  return {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 6, amplitude: 2, phase: 0, wave: { shape: 'sine' } }] },
    rubber: { shape: 'round', radius: 0 },
    cutter: { diameter: 2 * cutterRadius, flutes: 2 },
    follower: { radius: followerRadius },
  };
}

/** Largest |engraved − path| (both from their lowest points) over the middle of the bar, and the path's height. */
function departure(cutter: Float64Array, follower: Float64Array): [number, number] {
  const from = Math.floor(cutter.length / 4);
  const to = Math.floor((3 * cutter.length) / 4);
  let [yLow, yHigh, fLow] = [Infinity, -Infinity, Infinity];
  for (let i = from; i <= to; i++) [yLow, yHigh, fLow] = [Math.min(yLow, cutter[i]), Math.max(yHigh, cutter[i]), Math.min(fLow, follower[i])];
  let worst = 0;
  for (let i = from; i <= to; i++) worst = Math.max(worst, Math.abs(follower[i] - fLow - (cutter[i] - yLow)));
  return [worst, yHigh - yLow];
}

describe('a follower of another radius than the cutter', () => {
  it('warns with how much, where and how often when the engraved line leaves the cutter path by more than 0.1 % of its height', () => {
    // Path crest radius 1/(1·(2π/16.7)²) ≈ 7 mm: nothing is rounded, yet a small follower reads another curve.
    const s = computeBarSamples(design(3, 0.3));
    const [worst, height] = departure(s.cutter, s.follower);
    expect(worst / height).toBeGreaterThan(1e-3);
    const warning = s.warnings.find((w) => w.code === 'follower-radius')!;
    expect(warning.amount).toBeCloseTo(worst, 3);
    expect(warning.message).toMatch(/smaller than the cutter.*differs by up to .* % of the path's height\) at x .*every .* along the bar/);
    expect(warning.count).toBeGreaterThanOrEqual(1);
    expect(s.warnings.filter((w) => w.code === 'follower-radius')).toHaveLength(1);
  });

  it('says nothing when the follower is the cutter', () => {
    expect(computeBarSamples(design(3, 3)).warnings.filter((w) => w.code === 'follower-radius')).toEqual([]);
  });

  it('is present exactly when the departure passes 0.1 % of the height', () => {
    for (const rf of [0.05, 0.5, 1, 2, 2.9, 2.99, 2.999, 3.001, 3.1, 4, 6]) {
      const s = computeBarSamples(design(3, rf));
      const [worst, height] = departure(s.cutter, s.follower);
      const warned = s.warnings.some((w) => w.code === 'follower-radius' || w.code === 'detail-lost-follower');
      if (worst > 1.05e-3 * height) expect(warned, `rf ${rf}`).toBe(true);
      if (worst < 0.95e-3 * height) expect(s.warnings.some((w) => w.code === 'follower-radius'), `rf ${rf}`).toBe(false);
    }
  });
});
