import { EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeBarSamples } from './profile';
import { bruteForceProfile, finestCyclesPerRev } from './testing/brute-force-reference';

type Layer = Design['rosette']['layers'][number];

const layer: fc.Arbitrary<Layer> = fc.record({
  lobes: fc.constantFrom(2, 3, 5, 7, 11),
  amplitude: fc.double({ min: 0.2, max: 2, noNaN: true }),
  phase: fc.double({ min: 0, max: 1, noNaN: true }),
  wave: fc.constantFrom<Layer['wave']>({ shape: 'sine' }, { shape: 'pointed' }, { shape: 'scallop' }, { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 3, a: 0.2, b: 0.3 }] }),
});

/** Designs sized by their finest feature λ (a bar of 6 λ), with a follower from a tenth of the cutter to twice it. */
const design: fc.Arbitrary<Design> = fc
  .record({
    layers: fc.uniqueArray(layer, { minLength: 1, maxLength: 2, selector: (l) => l.lobes }),
    feature: fc.double({ min: 2, max: 8, noNaN: true }),
    rubber: fc.double({ min: 0, max: 0.5, noNaN: true }),
    cutter: fc.double({ min: 0.05, max: 0.5, noNaN: true }),
    follower: fc.double({ min: 0.1, max: 2, noNaN: true }),
  })
  .map((p) => {
    const rosette = { baseRadius: 50, layers: p.layers };
    const cycles = finestCyclesPerRev({ ...EXAMPLE_DESIGN, rosette });
    const lambda = p.feature;
    const rc = p.cutter * lambda;
    return {
      ...EXAMPLE_DESIGN,
      rosette,
      rubber: { shape: 'round' as const, radius: p.rubber * ((lambda * 50 * 2 * Math.PI) / (lambda * cycles)) },
      motion: { travelPerRev: Math.min(2000, lambda * cycles), leverRatio: 1 },
      cutter: { diameter: Math.max(0.1, 2 * rc), flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 6 * lambda }, // the examined stretch then holds a whole period
      follower: { radius: p.follower * rc },
    };
  })
  .filter((d) => parseDesign(d).ok);

/**
 * Largest |engraved − path| of the reference, both from their lowest points, over the stretch the
 * engine examines (clear of the ends by rf + |rf − rc| and two of its steps), the path's height there and along the bar.
 */
function referenceDeparture(d: Design, step: number): [number, number, number] {
  const ref = bruteForceProfile(d, 1500);
  const rc = d.cutter.diameter / 2;
  const rf = d.follower.radius;
  const clear = (Math.ceil((rf + Math.abs(rf - rc)) / step) + 2) * step - 1e-9; // where the engine's examined nodes start
  const inside = (x: number) => x >= clear && x <= d.bar.length - clear;
  let [yLow, yHigh, fLow] = [Infinity, -Infinity, Infinity];
  ref.x.forEach((x, i) => {
    if (inside(x)) [yLow, yHigh, fLow] = [Math.min(yLow, ref.cutter[i]), Math.max(yHigh, ref.cutter[i]), Math.min(fLow, ref.follower[i])];
  });
  let worst = 0;
  ref.x.forEach((x, i) => {
    if (inside(x)) worst = Math.max(worst, Math.abs(ref.follower[i] - fLow - (ref.cutter[i] - yLow)));
  });
  let whole = 0;
  for (const y of ref.cutter) whole = Math.max(whole, y); // the reference's path starts from 0 over the whole bar
  return [worst, yHigh - yLow, whole];
}

describe('the engraved-line warnings against a brute-force reference (fast-check)', () => {
  it('warn when the reference engraves more than 0.1 % of the path height away from the path, and not when it stays well within', () => {
    fc.assert(
      fc.property(design, (d) => {
        const { warnings, grid } = computeBarSamples(d);
        const [worst, height, whole] = referenceDeparture(d, grid.step);
        const threshold = Math.max(1e-4, 1e-3 * whole); // 0.1 % of the path's height along the bar
        const engraving = warnings.filter((w) => w.code === 'follower-radius' || w.code === 'detail-lost-follower');
        // A band of ±25 % about the threshold is left to either answer: the two sample the bar differently.
        if (worst > 1.25 * threshold) expect(engraving.length, `reference departs ${worst} mm of ${height} mm`).toBeGreaterThan(0);
        if (worst < 0.75 * threshold) expect(engraving, `reference departs ${worst} mm of ${height} mm`).toEqual([]);
        for (const w of engraving) expect(w.amount!).toBeLessThanOrEqual(whole * 1.001 + 1e-9); // never above the path's own height
      }),
      { numRuns: 30, seed: 20261202 },
    );
  }, 120_000);
});
