import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { rosetteCurvatureRadius } from './curvature';
import { computeBarSamples, computeProfile } from './profile';

const P = 100 / 24;

/** A design on the example with a few fields replaced. */
function design(patch: { wave?: Design['rosette']['layers'][0]['wave']; rubber?: number; cutter?: number; follower?: number }): Design {
  return {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: patch.wave ?? { shape: 'sine' } }] },
    rubber: { shape: 'round', radius: patch.rubber ?? 0 },
    cutter: { diameter: 2 * (patch.cutter ?? 2.38125), flutes: 2 },
    follower: { radius: patch.follower ?? patch.cutter ?? 2.38125 },
  };
}

describe('radius of curvature of the rosette', () => {
  it('matches the closed form of a sine rosette at crest and valley (polar curvature formula, calculus handbooks)', () => {
    // ρ = (r² + r'²)^{3/2}/(r² + 2r'² − r·r''); at a crest r' = 0, r'' = −aN²: ρ = (R0+a)²/(R0+a+aN²);
    // at a valley r'' = +aN²: ρ = (R0−a)²/(R0−a−aN²), negative (concave) once aN² > R0 − a.
    for (const [r0, a, n] of [[50, 0.75, 24], [40, 0.2, 6], [30, 1, 3]]) {
      const rosette = { baseRadius: r0, layers: [{ lobes: n, amplitude: 2 * a, phase: 0, wave: { shape: 'sine' as const } }] };
      const crest = (r0 + a) ** 2 / (r0 + a + a * n * n);
      const valley = (r0 - a) ** 2 / (r0 - a - a * n * n);
      expect(rosetteCurvatureRadius(rosette, 0) / crest - 1).toBeCloseTo(0, 6);
      expect(rosetteCurvatureRadius(rosette, Math.PI / n) / valley - 1).toBeCloseTo(0, 6);
    }
    expect(rosetteCurvatureRadius({ baseRadius: 20, layers: [] }, 1)).toBeCloseTo(20, 6);
  });

  it('warns when the rubber is larger than a concave valley, and not when it fits', () => {
    const valley = Math.abs(49.25 ** 2 / (49.25 - 0.75 * 576)); // ≈ 6.34 mm
    const bridged = (rubber: number) => computeProfile(design({ rubber }), { step: 0.02 }).warnings.filter((w) => w.code === 'valley-bridged');
    expect(bridged(valley / 2)).toEqual([]);
    const [warning] = bridged(2 * valley);
    expect(warning.amount).toBeGreaterThan(0.01);
    expect(warning.at!.xFrom).toBeLessThan(P / 2);
    expect(warning.at!.xTo).toBeGreaterThan(P / 2);
  });
});

/** Whether a warning's x range covers the given phase (fraction of the period) of some period. */
function spansPhase(w: { at?: { xFrom: number; xTo: number } }, phase: number): boolean {
  const k = Math.ceil(w.at!.xFrom / P - phase);
  return (k + phase) * P <= w.at!.xTo;
}

describe('detail lost between cutter and follower', () => {
  // Point rubber on a sine rosette: the cutter path is y = a(1 + cos 2πx/P), crest and valley radius 1/(a(2π/P)²).
  const pathRadius = 1 / (0.75 * (2 * Math.PI / P) ** 2); // ≈ 0.586 mm

  it('keeps everything when cutter and follower fit the path, and reports the bar crest radius R − rc', () => {
    const s = computeBarSamples(design({ cutter: 0.25 }), { step: P / 2000 });
    expect(s.warnings).toEqual([]);
    expect(s.minRadiusOfCurvature).toBeCloseTo(pathRadius - 0.25, 2);
  });

  it('warns where the follower is too large to reach a valley', () => {
    const { warnings } = computeProfile(design({ cutter: 0.25, follower: 1.5 }), { step: P / 2000 });
    const valley = warnings.find((w) => w.code === 'detail-lost-follower')!;
    expect(valley.message).toMatch(/cannot reach the bottom/);
    expect(spansPhase(valley, 0.5)).toBe(true);
    expect(warnings.every((w) => w.at!.xFrom < 2 * P)).toBe(true); // reported once, not every period
  });

  it('warns where a crest is narrower than the cutter, and where a valley is when the follower is smaller', () => {
    const crest = computeProfile(design({ cutter: 1 }), { step: P / 2000 }).warnings;
    expect(crest.map((w) => w.code)).toEqual(['detail-lost-follower']);
    expect(crest[0].message).toMatch(/rounds a crest/);
    expect(spansPhase(crest[0], 0)).toBe(true);
    const small = computeProfile(design({ cutter: 1, follower: 0.2 }), { step: P / 2000 }).warnings;
    expect(small.map((w) => w.code).sort()).toEqual(['detail-lost-cutter', 'detail-lost-follower', 'follower-radius']);
    expect(spansPhase(small.find((w) => w.code === 'detail-lost-cutter')!, 0.5)).toBe(true);
    // a follower as large as the cutter reads those valleys back exactly
    expect(computeProfile(design({ cutter: 0.25, follower: 0.25 }), { step: P / 2000 }).warnings).toEqual([]);
  });

  it('round trip: with rf = rc the valleys come back exactly and a sharp crest of flank angle β loses r·(sec β − 1)', () => {
    // Pointed wave, point rubber: r is linear in θ, so the cutter path is an exact triangle wave.
    const r = 2.38125;
    const tanBeta = 1.5 / (P / 2);
    const s = computeBarSamples(design({ wave: { shape: 'pointed' }, cutter: r }), { step: P / 2000 });
    const m = s.grid.perPeriod;
    for (let k = 2; k < 30; k++) {
      const valley = k * m + m / 2;
      expect(s.cutter[valley]).toBeCloseTo(0, 12);
      expect(s.follower[valley]).toBeCloseTo(s.cutter[valley], 9);
      expect(s.cutter[k * m] - s.follower[k * m]).toBeCloseTo(r * (Math.hypot(1, tanBeta) - 1), 6);
    }
    const [loss] = s.warnings;
    expect(loss.code).toBe('detail-lost-follower');
    expect(loss.amount).toBeCloseTo(r * (Math.hypot(1, tanBeta) - 1), 6);
  });
});
