import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barGrid } from './bar-grid';
import { barSamples, COMPANIONS, type Companion } from './profile';
import { rosetteRepeats } from './rosette';
import { validDesign } from './testing/design-arbitrary';
import { toMm } from './units';

/**
 * Tiling one period along the bar (profile-tiling.ts) must give the bar the whole computation
 * gives: the same points, the paths within floating-point noise, and the same warnings (their
 * places' ends within two nodes), crest, lead-in and lead-out. The noise: the envelopes' crossing
 * points are absolute sample positions, so their last bits differ a whole number of periods along,
 * and sharp corners at the property runs' coarse step magnify that (1.0e-8 of the path's scale on a
 * clipped wave, 1.00000001e-7 on the companions of a pointed wave, both below; the same bars at a
 * finer step differ by 1e-15). 1e-6 of the scale is a nanometre on a 1 mm path, far under anything
 * the bar or its views show, while a tiling error (a period out of place) is of the order of the amplitude.
 */
const TOLERANCE = 1e-6;

function expectSameBar(design: Design, companion: Companion | undefined, step: number): void {
  const tiled = barSamples(design, { step, companion }, true);
  const full = barSamples(design, { step, companion }, false);
  expect(tiled.x).toEqual(full.x);
  let scale = 1;
  for (const v of full.follower) scale = Math.max(scale, Math.abs(v));
  for (const key of ['cutter', 'bar', 'follower'] as const) {
    expect(tiled[key].length).toBe(full[key].length);
    let worst = 0;
    for (let i = 0; i < full[key].length; i++) worst = Math.max(worst, Math.abs(tiled[key][i] - full[key][i]));
    expect(worst, `${key} of ${JSON.stringify(design)} (${companion ?? 'bar'})`).toBeLessThanOrEqual(TOLERANCE * scale);
  }
  expect(tiled.warnings.map((w) => [w.code, w.count])).toEqual(full.warnings.map((w) => [w.code, w.count]));
  // A loss zone ends where the loss crosses its threshold, so noise in the last bits can move an end by
  // a node (a CI run found an end 0.1 mm apart at the runs' coarse step); a tiling error moves it by periods.
  const nodes = 2 * tiled.grid.step + 1e-9;
  tiled.warnings.forEach((w, i) => {
    const whole = full.warnings[i];
    expect(Math.abs((w.amount ?? 0) - (whole.amount ?? 0))).toBeLessThanOrEqual(TOLERANCE * scale);
    expect(!!w.at).toBe(!!whole.at);
    if (w.at && whole.at) {
      expect(Math.abs(w.at.xFrom - whole.at.xFrom), `${w.code} from`).toBeLessThanOrEqual(nodes);
      expect(Math.abs(w.at.xTo - whole.at.xTo), `${w.code} to`).toBeLessThanOrEqual(nodes);
    }
  });
  expect(tiled.crest).toEqual(full.crest);
  expect(tiled.leadIn).toEqual(full.leadIn);
  expect(tiled.leadOut).toEqual(full.leadOut);
}

/** A coarse step (a couple of hundred samples a period) keeps the property runs quick. */
function coarseStep(design: Design): number {
  const mm = toMm(design);
  return mm.motion.travelPerRev / rosetteRepeats(mm.rosette) / 200;
}

describe('tiled bar profile', () => {
  it('is the whole computation on the example, every companion, with the end on and off the grid', () => {
    for (const length of [150, 151.2345, 37.7]) {
      const design: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length } };
      for (const companion of [undefined, ...COMPANIONS]) expectSameBar(design, companion, 0.01);
    }
  });

  it('is the whole computation on random designs and bars of 3 to 9 periods', () => {
    fc.assert(
      fc.property(
        validDesign,
        fc.double({ min: 3, max: 9, noNaN: true }),
        fc.boolean(),
        fc.constantFrom<Companion | undefined>(undefined, ...COMPANIONS),
        (design, periods, onGrid, companion) => {
          const step = coarseStep(design);
          const period = barGrid(toMm(design), step).period * (design.units === 'in' ? 1 / 25.4 : 1);
          const length = (onGrid ? Math.round(periods) : periods) * period;
          expectSameBar({ ...design, bar: { ...design.bar, length } }, companion, step * (design.units === 'in' ? 1 / 25.4 : 1));
        },
      ),
      { numRuns: 40 },
    );
  }, 180_000); // each run computes two bars: slow on a busy machine

  it('is the whole computation on a clipped flat wave with sharp corners (a property run found it 1.0e-8 of the scale off)', () => {
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette: { baseRadius: 52.29556131011819, layers: [{ lobes: 2, amplitude: 5.28523509926928, phase: 0, wave: { shape: 'flat', clip: 0.05 } }] },
      rubber: { shape: 'round', radius: 0 },
      motion: { travelPerRev: 20, leverRatio: 0.547743227295541 },
      cutter: { diameter: 0.2000000000000004, flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 60 },
      follower: { radius: 0 },
      study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.45, vAngle: 120, depth: 0.1 },
    };
    expectSameBar(design, undefined, coarseStep(design));
  });

  it('is the whole computation for the companions of a pointed wave at a coarse step (a property run found them 1.00000001e-7 of the scale off)', () => {
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette: { baseRadius: 10.000000000000028, layers: [{ lobes: 17, amplitude: 1.1833847651821865, phase: 0, wave: { shape: 'pointed' } }, { lobes: 1, amplitude: 5e-324, phase: 0, wave: { shape: 'eccentric' } }] },
      rubber: { shape: 'flat', width: 0.2 },
      motion: { travelPerRev: 20, leverRatio: 0.5 },
      cutter: { diameter: 0.20000000000000032, flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 60 },
      follower: { radius: 0 },
    };
    for (const companion of [undefined, ...COMPANIONS]) expectSameBar(design, companion, coarseStep(design));
  });

  it('is the whole computation where the cutter radius is a hair under one step (a property run found the whole bar 0.1 mm off)', () => {
    // The whole bar was wrong, not the tiling: far along the bar the disc envelope gave a node its
    // neighbour's cup (disc-envelope.spec.ts); one period, tiled, kept the right edge.
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette: {
        baseRadius: 10.000000000000009,
        layers: [
          { lobes: 16, amplitude: 0.17431154917253783, phase: 0, wave: { shape: 'measured', points: [[0, 40], [32.72727272727273, 40], [65.45454545454545, 40], [98.18181818181819, 40], [130.9090909090909, 40], [163.63636363636363, 40], [196.36363636363637, 40], [229.0909090909091, 40.898227424716254], [261.8181818181818, 40], [294.54545454545456, 40], [327.27272727272725, 40]] } },
          { lobes: 1, amplitude: 5e-324, phase: 0, wave: { shape: 'scallop' } },
        ],
      },
      rubber: { shape: 'flat', width: 0.536221819903228 },
      motion: { travelPerRev: 20.00000000000003, leverRatio: 0.6012499988022781 },
      cutter: { diameter: 0.20000000000000026, flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 60.000000000000085 },
      follower: { radius: 0 },
    };
    expectSameBar(design, undefined, coarseStep(design));
  });

  it('falls back to the whole bar when the cutter is off the centre line (no tiling there)', () => {
    const design: Design = { ...EXAMPLE_DESIGN, cutter: { ...EXAMPLE_DESIGN.cutter, offset: 0.5 } };
    expectSameBar(design, undefined, 0.01);
  });
});
