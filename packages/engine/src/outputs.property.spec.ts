import { EXAMPLE_DESIGN, MATERIALS, parseDesign, type Design } from '@barwright/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planCut } from './cut-plan';
import { exportDesign } from './export/index';
import { computeProfile } from './profile';

/** Valid designs around the demo bar: every figure the outputs use varied within its limits. */
const designs = fc
  .record({
    units: fc.constantFrom('mm' as const, 'in' as const),
    lobes: fc.integer({ min: 1, max: 60 }),
    amplitude: fc.double({ min: 0, max: 4, noNaN: true }),
    diameter: fc.double({ min: 0.1, max: 12, noNaN: true }),
    flutes: fc.integer({ min: 1, max: 8 }),
    length: fc.double({ min: 5, max: 60, noNaN: true }),
    material: fc.constantFrom(...MATERIALS),
    stepOver: fc.double({ min: 0.001, max: 5, noNaN: true }),
    cleanup: fc.double({ min: 0, max: 2, noNaN: true }),
    travelSpeed: fc.double({ min: 1, max: 20000, noNaN: true }),
    leverRatio: fc.double({ min: 0.1, max: 10, noNaN: true }),
  })
  .map((v): Design => {
    const k = v.units === 'in' ? 1 / 25.4 : 1;
    return {
      ...EXAMPLE_DESIGN,
      units: v.units,
      rosette: { baseRadius: 50 * k, layers: [{ lobes: v.lobes, amplitude: v.amplitude * k, phase: 0, wave: { shape: 'sine' } }] },
      rubber: { shape: 'round', radius: 1 * k },
      motion: { travelPerRev: 100 * k, leverRatio: v.leverRatio },
      cutter: { diameter: v.diameter * k, flutes: v.flutes },
      bar: { length: v.length * k, thickness: 7.9375 * k, material: v.material },
      follower: { radius: 2 * k },
      study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.45 * k, depth: 0.1 * k },
      plan: {
        stepOver: v.stepOver * k,
        cleanup: v.cleanup * k,
        travelSpeed: v.travelSpeed * k,
        ...(v.material === 'custom' ? { surfaceSpeed: 50, chipLoad: 0.02 * k } : {}),
      },
    };
  })
  .filter((d) => parseDesign(d).ok);

describe('outputs for any valid design (fast-check)', () => {
  it('plan with finite numbers, at least one pass, and the cautions', () => {
    fc.assert(
      fc.property(designs, (design) => {
        const plan = planCut(design, computeProfile(design, { step: 0.05 }));
        for (const value of [plan.depth, plan.passes, plan.minutesPerPass, plan.totalMinutes, plan.rpm, plan.feedPerMinute, plan.chipLoad, plan.stepOver]) {
          expect(Number.isFinite(value)).toBe(true);
        }
        expect(plan.passes).toBeGreaterThanOrEqual(1);
        expect(plan.cautions.length).toBeGreaterThanOrEqual(5);
        expect(JSON.stringify(plan)).not.toMatch(/NaN|Infinity/);
      }),
      { numRuns: 40, seed: 20240601 },
    );
  });

  it('export text files without NaN, deterministically', async () => {
    await fc.assert(
      fc.asyncProperty(designs, fc.constantFrom('svg' as const, 'dxf' as const, 'gcode' as const, 'csv' as const), async (design, format) => {
        const profile = computeProfile(design, { step: 0.05 });
        const first = await exportDesign(design, format, { profile });
        const again = await exportDesign(design, format, { profile });
        expect(first.content).not.toMatch(/NaN|Infinity|undefined/);
        expect(again.content).toBe(first.content);
      }),
      { numRuns: 30, seed: 20240602 },
    );
  });
});
