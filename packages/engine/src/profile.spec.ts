import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLineStudy } from './line-study';
import { computeBarSamples, computeProfile } from './profile';
import { rosetteRepeats } from './rosette';
import { validDesign } from './testing/design-arbitrary';
import { toMm } from './units';

/** A coarse step for property runs: a few hundred samples a period, at most a few thousand on the bar. */
function quickStep(design: Design): number {
  const mm = toMm(design);
  const period = mm.motion.travelPerRev / rosetteRepeats(mm.rosette);
  return Math.max(period / 200, mm.bar.length / 3000);
}

describe('computeProfile', () => {
  it('reads an eccentric rosette through a round rubber exactly along the bar (cam design handbooks; derived geometry)', () => {
    // R = 30, e = 3, ρ = 5; one revolution per 360 mm, so x in mm is θ in degrees.
    const design: Design = {
      ...EXAMPLE_DESIGN,
      rosette: { baseRadius: 30, layers: [{ lobes: 1, amplitude: 6, phase: 0, wave: { shape: 'eccentric' } }] },
      rubber: { shape: 'round', radius: 5 },
      motion: { travelPerRev: 360, leverRatio: 1 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 360 },
    };
    const p = computeProfile(design, { step: 0.01 });
    const expected = [38, 37.565919, 36.403438, 34.871192, 33.403438, 32];
    [0, 30, 60, 90, 120, 180].forEach((deg, k) => {
      const [x, y] = p.cutterPath[Math.round(deg / p.step)];
      expect(x).toBeCloseTo(deg, 9);
      expect(Math.abs(y + 32 - expected[k])).toBeLessThan(1e-6); // y is 0 at the lowest point, s = 32
    });
  });

  it('gives millimetres whatever the file units', () => {
    const inch = { ...validInchCopy(EXAMPLE_DESIGN) };
    const a = computeProfile(inch);
    const b = computeProfile(EXAMPLE_DESIGN);
    expect(a.period).toBeCloseTo(b.period, 9);
    expect(a.cutterPath.length).toBe(b.cutterPath.length);
    a.cutterPath.forEach(([x, y], i) => {
      expect(x).toBeCloseTo(b.cutterPath[i][0], 9);
      expect(y).toBeCloseTo(b.cutterPath[i][1], 9);
    });
  });

  it('runs from x = 0 to the bar length, with y = 0 at the lowest point of the cutter path', () => {
    const p = computeProfile(EXAMPLE_DESIGN, { step: 0.01 });
    expect(p.cutterPath[0][0]).toBe(0);
    expect(p.cutterPath[p.cutterPath.length - 1][0]).toBe(150);
    expect(Math.min(...p.cutterPath.map((q) => q[1]))).toBe(0);
    expect(p.step).toBeLessThanOrEqual(0.01);
    expect(p.period / p.step).toBeCloseTo(Math.round(p.period / p.step), 9);
  });

  it('has a default step within 0.1 % of the amplitude, sharp crests included', () => {
    const shapes: Design['rosette']['layers'][0]['wave'][] = [
      { shape: 'sine' },
      { shape: 'pointed' },
      { shape: 'scallop' },
      { shape: 'flat', clip: 0.6 },
      { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0.3 }, { k: 4, a: 0.1, b: 0.4 }] },
    ];
    for (const wave of shapes) {
      for (const phase of [0, 0.1234]) {
        const design: Design = {
          ...EXAMPLE_DESIGN,
          rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase, wave }] },
          rubber: { shape: 'round', radius: 0 }, // a point reads r itself: the path's height is exactly k·A
          motion: { travelPerRev: 100, leverRatio: 1.7 },
        };
        const ys = computeBarSamples(design).cutter;
        const height = ys.reduce((m, y) => Math.max(m, y), -Infinity) - ys.reduce((m, y) => Math.min(m, y), Infinity);
        expect(Math.abs(height / (1.7 * 1.5) - 1)).toBeLessThan(1e-3);
      }
    }
  });

  it('says when a bar of many fine features is sampled more coarsely than 0.1 % needs, and by how much', () => {
    const many: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 1000 }, rosette: { baseRadius: 50, layers: [{ lobes: 72, amplitude: 1.5, phase: 0, wave: { shape: 'sine' } }] } };
    const [coarse] = computeProfile(many).warnings.filter((w) => w.code === 'other');
    expect(coarse.message).toMatch(/holds 720 of its finest features.*off by up to 0\.96 % of the amplitude.*a step of 0\.00069 mm keeps it within 0\.1 %/);
    expect(computeProfile(EXAMPLE_DESIGN).warnings.filter((w) => w.code === 'other')).toEqual([]);
  });

  it('says when a caller\'s step is coarser than the design needs, and not when it is fine enough', () => {
    const short: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 10 }, rosette: { baseRadius: 50, layers: [{ lobes: 72, amplitude: 1.5, phase: 0, wave: { shape: 'sine' } }] } };
    const [coarse] = computeProfile(short, { step: 0.01 }).warnings.filter((w) => w.code === 'other');
    expect(coarse.message).toMatch(/step of 0\.01 mm is coarser than this design needs.*every 1\.39 mm, 139 points each.*off by up to 1\.4 %.*a step of 0\.00069 mm/);
    expect(computeProfile(short, { step: 0.00069 }).warnings.filter((w) => w.code === 'other')).toEqual([]);
  });
});

describe('computeProfile, for any valid design (fast-check)', () => {
  it('gives a line study of finite points at the line spacing, the same each time', () => {
    fc.assert(
      fc.property(validDesign, (design) => {
        const profile = computeProfile(design, { step: quickStep(design) });
        const study = computeLineStudy(design, profile);
        expect(Number.isFinite(study.width)).toBe(true);
        expect(study.spacing).toBeCloseTo(toMm(design).study.lineSpacing, 12);
        expect(study.lines).toHaveLength(design.study.lines);
        for (const line of study.lines) for (const [x, y] of line.points) expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true);
        expect(computeLineStudy(design, profile)).toEqual(study);
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 30) },
    );
  });

  it('never gives NaN, keeps the bar edge at least rc below the path, repeats exactly every period and is deterministic', () => {
    fc.assert(
      fc.property(validDesign, (design) => {
        const step = quickStep(design);
        const s = computeBarSamples(design, { step });
        const mm = toMm(design);
        const rc = mm.cutter.diameter / 2;
        expect(s.grid.period).toBeCloseTo(mm.motion.travelPerRev / rosetteRepeats(mm.rosette), 9);
        for (const series of [s.x, s.cutter, s.bar, s.follower]) for (const v of series) expect(Number.isFinite(v)).toBe(true);
        expect(Number.isNaN(s.minRadiusOfCurvature)).toBe(false);
        s.bar.forEach((v, i) => expect(v).toBeLessThanOrEqual(s.cutter[i] - rc + 1e-9));
        s.follower.forEach((v, i) => expect(v).toBeGreaterThanOrEqual(s.bar[i] + mm.follower.radius - 1e-9));
        expect(Math.min(...s.cutter)).toBeCloseTo(0, 12);
        const m = s.grid.perPeriod;
        for (let i = 0; i + m <= s.grid.lastNode; i++) expect(s.cutter[i + m]).toBe(s.cutter[i]);
        for (let i = 1; i < s.x.length; i++) expect(s.x[i]).toBeGreaterThan(s.x[i - 1]);
        expect(s.x[s.x.length - 1]).toBeCloseTo(mm.bar.length, 9);
        for (const w of s.warnings) expect(Number.isFinite(w.amount ?? 0)).toBe(true);
        if (design.units === 'in') for (const w of s.warnings) expect(w.message).not.toMatch(/\bmm\b/);
        expect(computeProfile(design, { step })).toEqual(computeProfile(design, { step }));
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 60) },
    );
  });
});

function validInchCopy(design: Design): Design {
  const s = 1 / 25.4;
  return {
    ...design,
    units: 'in',
    rosette: { baseRadius: design.rosette.baseRadius * s, layers: design.rosette.layers.map((l) => ({ ...l, amplitude: l.amplitude * s })) },
    rubber: design.rubber.shape === 'round' ? { shape: 'round', radius: design.rubber.radius * s } : { shape: 'flat', width: design.rubber.width * s },
    motion: { ...design.motion, travelPerRev: design.motion.travelPerRev * s },
    cutter: { ...design.cutter, diameter: design.cutter.diameter * s },
    bar: { ...design.bar, length: design.bar.length * s, thickness: design.bar.thickness * s },
    follower: { radius: design.follower.radius * s },
  };
}
