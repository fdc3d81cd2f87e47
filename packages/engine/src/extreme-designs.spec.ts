import { COMPLEXITY_LIMITS, designComplexity, EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { planCut } from './cut-plan';
import { NonFiniteResultError } from './finite-output';
import { computeLineStudy } from './line-study';
import { computeProfile } from './profile';
import { fourierWave } from './waves';

/** CPU time (user + system) of this process, ms. */
function cpuMs(): number {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
}

/** Profile, line study and cut plan (what the command line and a publish compute), CPU ms; every number finite. */
function computeAll(design: Design): number {
  const start = cpuMs();
  const profile = computeProfile(design);
  const study = computeLineStudy(design, profile);
  const plan = planCut(design, profile);
  const spent = cpuMs() - start;
  // The smallest crest radius alone may be Infinity: a bar with no crest (here, a rubber that bridges every lobe).
  const { minRadiusOfCurvature, crest, ...paths } = profile as typeof profile & { crest?: unknown };
  expect(JSON.stringify({ paths, study, plan })).not.toMatch(/NaN|Infinity|null/);
  return spent;
}

const COPRIME_NEAR_360 = [359, 353, 349, 347, 337, 331, 317, 313];
const layer = (lobes: number, wave: Design['rosette']['layers'][number]['wave'], phase = 0) => ({ lobes, amplitude: 0.5, phase, wave });

/** Files at the edges of what the design file accepts (each checked valid first). */
const EXTREMES: Record<string, Design> = {
  'phases at ±1 000 000 (layers and a list schedule)': {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [layer(24, { shape: 'sine' }, 1e6), layer(7, { shape: 'pointed' }, -1e6 + 0.25)] },
    study: { ...EXAMPLE_DESIGN.study, lines: 1000, schedule: { kind: 'list', phases: [1e6, -1e6, 999_999.5] } },
  },
  'Fourier coefficients at ±1 000 000, 32 terms up to k = 64': {
    ...EXAMPLE_DESIGN,
    rosette: {
      baseRadius: 50,
      layers: [layer(64, { shape: 'fourier', terms: Array.from({ length: 32 }, (_, i) => ({ k: 2 * i + 1, a: i % 2 ? 1e6 : -1e6, b: 1e6 })) })],
    },
  },
  '8 × 360 lobes, scallops under a rubber as large as the base radius': {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: Array.from({ length: 8 }, () => layer(360, { shape: 'scallop' }, 0.1)) },
    rubber: { shape: 'round', radius: 50 },
    bar: { ...EXAMPLE_DESIGN.bar, length: 270 },
    study: { ...EXAMPLE_DESIGN.study, lines: 69 },
  },
  '8 coprime layers of 313–359 lobes (one repeat a revolution), a 1 000 mm bar, 1 000 lines': {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: COPRIME_NEAR_360.map((lobes) => layer(lobes, { shape: 'pointed' })) },
    motion: { travelPerRev: 2000, leverRatio: 1 },
    bar: { ...EXAMPLE_DESIGN.bar, length: 1000 },
    study: { ...EXAMPLE_DESIGN.study, lines: 1000, schedule: { kind: 'twist', step: 0.37 } },
  },
  'a measured table of 3 600 readings under a wide flat rubber, a 1 000 mm bar': {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [layer(1, { shape: 'measured', points: Array.from({ length: 3600 }, (_, i) => [i / 10, 50 + ((i * 7919) % 13) / 13] as [number, number]) })] },
    rubber: { shape: 'flat', width: 30 },
    motion: { travelPerRev: 200, leverRatio: 1 },
    bar: { ...EXAMPLE_DESIGN.bar, length: 1000 },
    study: { ...EXAMPLE_DESIGN.study, lines: 10 },
  },
  'the highest chip load, surface speed and flutes, on the smallest cutter': {
    ...EXAMPLE_DESIGN,
    cutter: { diameter: 0.1, flutes: 8 },
    bar: { ...EXAMPLE_DESIGN.bar, material: 'custom' },
    plan: { ...EXAMPLE_DESIGN.plan, travelSpeed: 20000, surfaceSpeed: 2000, chipLoad: 2 },
  },
};

describe('extreme but valid design files', () => {
  for (const [name, design] of Object.entries(EXTREMES)) {
    // The bound is half the server's compute budget for one job (10 s, compute-limits.ts), so the
    // heaviest valid file fits it twice over. Not a speed target (those are in `npm run bench`): on this
    // 2-core machine the CPU time of the same computation reads 1.3-2.4 s as other processes contend.
    it(`${name}: computed within 5 s of CPU, every number finite`, () => {
      const parsed = parseDesign(design);
      expect(parsed.ok && designComplexity(parsed.design).rosetteDetail <= COMPLEXITY_LIMITS.rosetteDetail).toBe(true);
      computeProfile(EXAMPLE_DESIGN, { step: 0.05 }); // warm up the code paths once
      expect(computeAll(design)).toBeLessThan(5000);
    }, 30_000);
  }

  it('a phase of 1 000 000 draws the same bar as the phase taken modulo 1', () => {
    const at = (phase: number) => computeProfile({ ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [layer(24, { shape: 'pointed' }, phase)] } }).cutterPath;
    const far = at(999_999.375);
    const near = at(0.375);
    expect(far.length).toBe(near.length);
    let worst = 0;
    for (let i = 0; i < far.length; i++) worst = Math.max(worst, Math.abs(far[i][1] - near[i][1]));
    // 999 999.375 is exact in a double, and so is its fraction: the bars agree to rounding
    expect(worst).toBeLessThan(1e-9);
  });
});

describe('beyond what a shop means: refused, naming the field and the limit', () => {
  const refused = (design: unknown) => {
    const parsed = parseDesign(design);
    return parsed.ok ? [] : parsed.errors.map((e) => `${e.path}: ${e.message}`);
  };
  const withLayer = (over: object) => ({ ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [{ ...EXAMPLE_DESIGN.rosette.layers[0], ...over }] } });

  it('phases of ±1e20 (a layer, a list schedule)', () => {
    expect(refused(withLayer({ phase: 1e20 }))).toEqual(['rosette.layers[0].phase: must be between -1000000 and 1000000']);
    const list = { ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, schedule: { kind: 'list', phases: [0, -1e20] } } };
    expect(refused(list)).toEqual(['study.schedule.phases[1]: must be between -1000000 and 1000000']);
  });

  it('Fourier coefficients of 1e300, or all below 1e-9', () => {
    expect(refused(withLayer({ wave: { shape: 'fourier', terms: [{ k: 1, a: 1e300, b: 0 }] } }))).toEqual([
      'rosette.layers[0].wave.terms[0].a: must be between -1000000 and 1000000',
    ]);
    expect(refused(withLayer({ wave: { shape: 'fourier', terms: [{ k: 3, a: 1e-12, b: 0 }] } }))[0]).toMatch(/terms: needs a coefficient of at least 1e-9/);
  });

  it('measured radii near 1e308, and readings too even to stretch to the amplitude', () => {
    const table = (r: (i: number) => number) => withLayer({ wave: { shape: 'measured', points: Array.from({ length: 8 }, (_, i) => [i * 45, r(i)]) } });
    expect(refused(table((i) => (i % 2 ? 1e308 : 1.7e308)))[0]).toBe('rosette.layers[0].wave.points[0][1]: radius must be at most 1000 mm');
    expect(refused(table((i) => 40 + i * 1e-5))).toEqual([
      "rosette.layers[0].wave.points: readings must rise and fall by at least 0.001 mm (a dial indicator's resolution) to be stretched to the amplitude",
    ]);
  });

  it('a chip load of 1e300 and a surface speed of 1e-300', () => {
    const plan = { ...EXAMPLE_DESIGN.plan, chipLoad: 1e300, surfaceSpeed: 1e-300 };
    expect(refused({ ...EXAMPLE_DESIGN, plan })).toEqual(['plan.surfaceSpeed: must be at least 0.1 m/min', 'plan.chipLoad: must be between 0.0001 mm and 2 mm']);
  });
});

describe('the engine itself, handed values beyond the bounds (a caller that skips validation)', () => {
  const heights = (phase: number) =>
    computeProfile({ ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [layer(24, { shape: 'pointed' }, phase)] }, bar: { ...EXAMPLE_DESIGN.bar, length: 20 } }).cutterPath.map((p) => p[1]);
  const worstDifference = (a: number[], b: number[]) => a.reduce((m, v, i) => Math.max(m, Math.abs(v - b[i])), 0);

  it('reduces a phase modulo 1 first: 1e15 + 0.375 draws the bar of 0.375, and 1e300 (a whole number) the bar of 0', () => {
    expect(worstDifference(heights(1e15 + 0.375), heights(0.375))).toBeLessThan(1e-9);
    expect(worstDifference(heights(1e300), heights(0))).toBeLessThan(1e-9);
    expect(Math.max(...heights(1e300))).toBeGreaterThan(0.4); // a wave, not a straight bar
  });

  it('lays a line study with list phases of ±1e20 at once', () => {
    const design: Design = { ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lines: 4, schedule: { kind: 'list', phases: [1e20, -1e20, 0.25] } } };
    const start = cpuMs();
    const study = computeLineStudy(design);
    expect(cpuMs() - start).toBeLessThan(2000);
    expect(study.lines.map((l) => l.phase)).toEqual([0, 0, 0.25, 0]);
  });

  it('refuses a Fourier series whose range overflows rather than drawing a straight bar, and a plan whose feed overflows', () => {
    expect(() => fourierWave([{ k: 1, a: 1e308, b: 1e308 }, { k: 3, a: 1e308, b: 0 }])).toThrow(/range is not finite/);
    const design: Design = { ...EXAMPLE_DESIGN, cutter: { diameter: 4.7625, flutes: 8 }, bar: { ...EXAMPLE_DESIGN.bar, material: 'custom' }, plan: { ...EXAMPLE_DESIGN.plan, surfaceSpeed: 2000, chipLoad: 1e306 } };
    expect(() => planCut(design, computeProfile(EXAMPLE_DESIGN, { step: 0.05 }))).toThrow(NonFiniteResultError);
    expect(() => planCut(design, computeProfile(EXAMPLE_DESIGN, { step: 0.05 }))).toThrow(/finite cut plan's feedPerMinute/);
  });
});
