import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { candidateDesign, EXAMPLE_DESIGN, parseDesign, type SweepCandidate } from '@barwright/contracts';
import { validDesign } from '../testing/design-arbitrary';
import { computeProfile } from '../profile';
import { periodProfile } from '../period-profile';
import { peakToValley, planCut } from '../cut-plan';
import { batchTransferables, computeBatch } from './sweep-batch';

/** A candidate made of a random valid design's parts; the sweep's units may differ from the rosette's. */
const candidate: fc.Arbitrary<SweepCandidate> = fc
  .record({ d: validDesign, otherUnits: fc.boolean() })
  .map(({ d, otherUnits }): SweepCandidate => {
    const units = otherUnits ? (d.units === 'mm' ? 'in' : 'mm') : d.units;
    const k = units === d.units ? 1 : units === 'in' ? 1 / 25.4 : 25.4; // the rest of the shop in the sweep's units
    return {
      units,
      rosette: { name: 'Random', units: d.units, rosette: d.rosette },
      rubber: d.rubber.shape === 'round' ? { shape: 'round', radius: d.rubber.radius * k } : { shape: 'flat', width: d.rubber.width * k },
      travel: { travelPerRev: d.motion.travelPerRev * k, leverRatio: d.motion.leverRatio },
      cutter: { diameter: d.cutter.diameter * k, flutes: d.cutter.flutes },
      follower: { radius: d.follower.radius * k },
      barLength: d.bar.length * k,
      study: { ...d.study, lineSpacing: d.study.lineSpacing * k, depth: d.study.depth * k },
    };
  })
  .filter((c) => parseDesign(candidateDesign(c)).ok);

describe('the sweep batch', () => {
  it('gives each candidate exactly the single-design results: figures and one period (random designs)', () => {
    fc.assert(
      // The default step (each design's own), and a caller's step as the sweep may pass.
      fc.property(fc.array(candidate, { minLength: 1, maxLength: 3 }), fc.constantFrom(undefined, 0.05, 0.02), (candidates, step) => {
        const batch = computeBatch(candidates, { step });
        candidates.forEach((c, k) => {
          const item = batch[k];
          const design = candidateDesign(c);
          const profile = computeProfile(design, { step });
          const period = periodProfile(design, step);
          const cutterRadius = (design.units === 'in' ? 25.4 : 1) * (design.cutter.diameter / 2);
          const losses = profile.warnings.filter((w) => w.code === 'detail-lost-cutter' || w.code === 'detail-lost-follower');
          expect(item.ok).toBe(true);
          if (!item.ok) return;
          const r = item.result;
          expect(r.period).toBe(profile.period);
          expect(r.barHeight).toBe(peakToValley(profile.barEdge));
          expect(r.crestRadius).toBe(profile.minRadiusOfCurvature);
          expect(r.crestBelowCutter).toBe(profile.minRadiusOfCurvature < cutterRadius);
          expect(r.detailLoss).toBe(losses.length > 0);
          expect(r.detailLost).toBe(Math.max(0, ...losses.map((w) => w.amount ?? 0)));
          expect(r.keeperMinutes).toBe(planCut(design, computeProfile(design, { step })).totalMinutes);
          expect(r.step).toBe(period.grid.step);
          expect(r.cutter).toEqual(period.cutter);
          expect(r.bar).toEqual(period.bar);
          expect(r.line).toEqual(period.line);
        });
      }),
      { numRuns: 10, seed: 11 },
    );
  }, 120_000);

  it('hands out the typed arrays’ buffers for transfer, three per candidate, and refuses an invalid candidate by its fields', () => {
    const c: SweepCandidate = {
      units: 'mm',
      rosette: { name: 'Sine 24', units: 'mm', rosette: EXAMPLE_DESIGN.rosette },
      rubber: EXAMPLE_DESIGN.rubber,
      travel: EXAMPLE_DESIGN.motion,
      cutter: EXAMPLE_DESIGN.cutter,
      follower: EXAMPLE_DESIGN.follower,
      barLength: 150,
      study: EXAMPLE_DESIGN.study,
    };
    const tooBig = { ...c, rubber: { shape: 'round' as const, radius: 60 } };
    const batch = computeBatch([c, tooBig, c]);
    expect(batchTransferables(batch)).toHaveLength(6);
    expect(batch[0]).toEqual(batch[2]);
    expect(batch[1]).toEqual({ ok: false, message: expect.stringMatching(/^rubber\.radius must not be larger than the rosette's base radius/) });
  });
});
