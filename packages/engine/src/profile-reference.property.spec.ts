import { EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeBarSamples } from './profile';
import { bruteForceProfile, finestCyclesPerRev, referenceAt, referenceDetailLoss } from './testing/brute-force-reference';

type Layer = Design['rosette']['layers'][number];
type Wave = Layer['wave'];

/** Lobe counts that share no factor, so a compound of them repeats only once a revolution. */
const COPRIME_LOBES = [1, 2, 3, 5, 7, 11, 13, 24];

const wave: fc.Arbitrary<Wave> = fc.oneof(
  fc.constant<Wave>({ shape: 'sine' }),
  fc.constant<Wave>({ shape: 'pointed' }),
  fc.constant<Wave>({ shape: 'scallop' }),
  fc.double({ min: 0.1, max: 1, noNaN: true }).map((clip): Wave => ({ shape: 'flat', clip })),
  fc
    .array(fc.record({ k: fc.integer({ min: 1, max: 64 }), a: fc.double({ min: -1, max: 1, noNaN: true }), b: fc.double({ min: -1, max: 1, noNaN: true }) }), { minLength: 1, maxLength: 3 })
    .filter((terms) => terms.some((t) => Math.abs(t.a) + Math.abs(t.b) > 0.05))
    .map((terms): Wave => ({ shape: 'fourier', terms })),
  fc
    .array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 8, maxLength: 40 })
    .map((r): Wave => ({ shape: 'measured', points: r.map((v, i) => [(i * 360) / r.length, 40 + v] as [number, number]) })),
);

const layer: fc.Arbitrary<Layer> = fc.record({
  lobes: fc.constantFrom(...COPRIME_LOBES),
  amplitude: fc.double({ min: 0.2, max: 2, noNaN: true }),
  phase: fc.double({ min: -3, max: 3, noNaN: true }),
  wave,
});

/**
 * Compound designs sized by their finest feature λ so that the reference stays quick: a bar of
 * 1.5 λ, a cutter, follower and rubber (as it reads the bar) of up to λ, follower ≠ cutter.
 */
const compoundDesign: fc.Arbitrary<Design> = fc
  .record({
    layers: fc.uniqueArray(layer, { minLength: 1, maxLength: 3, selector: (l) => l.lobes }),
    feature: fc.double({ min: 0.8, max: 3, noNaN: true }),
    rubber: fc.record({ round: fc.boolean(), size: fc.double({ min: 0, max: 1, noNaN: true }) }),
    cutter: fc.double({ min: 0.05, max: 1, noNaN: true }),
    follower: fc.double({ min: 0, max: 1, noNaN: true }),
    leverRatio: fc.double({ min: 0.5, max: 2, noNaN: true }),
  })
  .map((p) => {
    const baseRadius = 50;
    const rosette = { baseRadius, layers: p.layers };
    const probe: Design = { ...EXAMPLE_DESIGN, rosette };
    const travelPerRev = Math.min(2000, p.feature * finestCyclesPerRev(probe));
    const lambda = travelPerRev / finestCyclesPerRev(probe);
    const onRosette = (lambda * 2 * Math.PI * baseRadius) / travelPerRev; // a bar length λ read on the rosette
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette,
      rubber: p.rubber.round ? { shape: 'round', radius: p.rubber.size * onRosette } : { shape: 'flat', width: 0.01 + 2 * p.rubber.size * onRosette },
      motion: { travelPerRev, leverRatio: p.leverRatio },
      cutter: { diameter: Math.max(0.1, 2 * p.cutter * lambda), flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: Math.max(1, 1.5 * lambda) },
      follower: { radius: p.follower * lambda },
    };
    return design;
  })
  .filter((d) => parseDesign(d).ok);

describe('the brute-force reference itself', () => {
  it('with rf = rc loses r·(sec β − 1) at a sharp crest of flank angle β (derived geometry)', () => {
    // Pointed wave read by a point rubber: an exact triangle wave of period P and height 1.5 mm.
    const r = 2.38125;
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'pointed' } }] },
      rubber: { shape: 'round', radius: 0 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 20 },
    };
    const tanBeta = 1.5 / (100 / 24 / 2);
    const loss = referenceDetailLoss(bruteForceProfile(design, 2000), design);
    expect(loss.amount).toBeCloseTo(r * (Math.hypot(1, tanBeta) - 1), 6);
    expect(Math.abs(loss.x / (100 / 24) - Math.round(loss.x / (100 / 24)))).toBeLessThan(1e-6); // at a crest
  });
});

describe('the profile against a brute-force reference (fast-check)', () => {
  it('cutter path, bar edge and follower path within 0.1 % of the path height at every point, and between points', () => {
    fc.assert(
      fc.property(compoundDesign, (design) => {
        const ref = bruteForceProfile(design, 2500);
        const engine = computeBarSamples(design);
        let lo = Infinity;
        let hi = -Infinity;
        for (const v of ref.cutter) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
        // The path's height sets the scale for all three (the bar edge and the follower path can be far
        // flatter than the path when the cutter bridges its valleys); at least 0.1 µm.
        const tolerance = Math.max(1e-4, 1e-3 * (hi - lo));
        for (const key of ['cutter', 'bar', 'follower'] as const) {
          const ys = engine[key];
          let worst = 0;
          for (let i = 0; i < ys.length; i++) worst = Math.max(worst, Math.abs(ys[i] - referenceAt(ref.x, ref[key], engine.x[i])));
          // Between the engine's points: its polyline read at the reference's own points.
          let k = 0;
          for (let j = 0; j < ref.x.length; j++) {
            while (k < engine.x.length - 2 && engine.x[k + 1] < ref.x[j]) k++;
            const w = (ref.x[j] - engine.x[k]) / (engine.x[k + 1] - engine.x[k]);
            worst = Math.max(worst, Math.abs(ys[k] + w * (ys[k + 1] - ys[k]) - ref[key][j]));
          }
          expect(worst, `${key}: worst ${worst} mm of a ${hi - lo} mm path`).toBeLessThanOrEqual(tolerance);
        }
      }),
      { numRuns: 8, seed: 20261202 },
    );
  }, 60_000);
});
