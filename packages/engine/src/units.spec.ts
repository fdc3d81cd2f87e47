import { EXAMPLE_DESIGN, MM_PER_INCH, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { fromMm, toMm, toMmValue } from './units';

const INCH_DESIGN: Design = {
  ...EXAMPLE_DESIGN,
  units: 'in',
  rosette: {
    baseRadius: 2,
    layers: [
      { lobes: 12, amplitude: 0.06, phase: 0.25, wave: { shape: 'sine' } },
      { lobes: 1, amplitude: 0.01, phase: 0, wave: { shape: 'measured', points: Array.from({ length: 8 }, (_, i) => [i * 45, 1 + (i % 2) * 0.01] as [number, number]) } },
    ],
  },
  rubber: { shape: 'flat', width: 0.125 },
  motion: { travelPerRev: 4, leverRatio: 1.5 },
  cutter: { diameter: 0.1875, flutes: 2 },
  bar: { length: 6, thickness: 0.3125, material: 'custom' },
  follower: { radius: 0.09375 },
  study: { lineSpacing: 0.02, lines: 10, schedule: { kind: 'none' }, vAngle: 90, depth: 0.004 },
  plan: { stepOver: 0.003, cleanup: 0.01, travelSpeed: 4, surfaceSpeed: 60, chipLoad: 0.0005 },
};

describe('units', () => {
  it('uses the exact inch: 1 in = 25.4 mm (NIST SP 811, the international inch of 1959)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(toMmValue(1, 'in')).toBe(25.4);
    expect(toMmValue(3 / 16, 'in')).toBeCloseTo(4.7625, 12);
    expect(fromMm(25.4, 'in')).toBe(1);
    expect(toMmValue(7, 'mm')).toBe(7);
  });

  it('converts every length of an inch design and nothing else', () => {
    const mm = toMm(INCH_DESIGN);
    expect(mm.units).toBe('mm');
    expect(mm.rosette.baseRadius).toBeCloseTo(50.8, 12);
    expect(mm.rosette.layers[0]).toMatchObject({ lobes: 12, phase: 0.25 });
    expect(mm.rosette.layers[0].amplitude).toBeCloseTo(1.524, 12);
    const measured = mm.rosette.layers[1].wave;
    expect(measured.shape === 'measured' && measured.points[1]).toEqual([45, 1.01 * MM_PER_INCH]);
    expect(mm.rubber.shape === 'flat' && mm.rubber.width).toBeCloseTo(3.175, 12);
    expect(mm.motion.travelPerRev).toBeCloseTo(101.6, 12);
    expect(mm.motion.leverRatio).toBe(1.5);
    expect(mm.cutter.diameter).toBeCloseTo(4.7625, 12);
    expect(mm.cutter.flutes).toBe(2);
    expect(mm.bar.length).toBeCloseTo(152.4, 12);
    expect(mm.follower.radius).toBeCloseTo(2.38125, 12);
    expect(mm.study).toMatchObject({ lines: 10, vAngle: 90 });
    expect(mm.study.lineSpacing).toBeCloseTo(0.508, 12);
    expect(mm.study.depth).toBeCloseTo(0.1016, 12);
    expect(mm.plan.stepOver).toBeCloseTo(0.0762, 12);
    expect(mm.plan.travelSpeed).toBeCloseTo(101.6, 12);
    expect(mm.plan.chipLoad).toBeCloseTo(0.0127, 12);
    expect(mm.plan.surfaceSpeed).toBe(60); // m/min whatever the file's units
  });

  it('leaves a millimetre design as it is and round-trips an inch design', () => {
    expect(toMm(EXAMPLE_DESIGN)).toEqual(EXAMPLE_DESIGN);
    const back = fromMm(toMm(INCH_DESIGN), 'in');
    expect(back.units).toBe('in');
    expect(back.rosette.baseRadius).toBeCloseTo(2, 12);
    expect(back.plan.chipLoad).toBeCloseTo(0.0005, 12);
    expect(back.follower.radius).toBeCloseTo(0.09375, 12);
  });

  it('does not share nested objects with its input', () => {
    const mm = toMm(EXAMPLE_DESIGN);
    expect(mm.rosette.layers[0].wave).not.toBe(EXAMPLE_DESIGN.rosette.layers[0].wave);
    expect(mm.study.schedule).not.toBe(EXAMPLE_DESIGN.study.schedule);
  });
});
