/**
 * Engine benchmark: `npm run bench -w packages/engine`. Prints: computeProfile by bar length (it
 * should grow linearly), the engine's envelopes beside clipper-lib's offsetting measured fairly,
 * the lit surface (height field and reshading), a 3-layer compound against the brute-force
 * reference, a line study of 200 lines, 500 different designs on one core, and the sweep's batch entry point.
 * Times are CPU time (process.cpuUsage), medians of warm runs: the machine may be shared.
 */
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import * as engine from '../src/index';
import { computeBarSamples, computeLineStudy, computeProfile, rosetteRepeats } from '../src/index';
import { bruteForceProfile, referenceAt } from '../src/testing/brute-force-reference';
import { cpuMedian as median, ms } from './bench-timing';
import { clipperFair } from './clipper-fair';
import { litSurface } from './lit-surface';
import { profileScaling } from './profile-scaling';
import { sweepBatchFigures } from './sweep-batch';

/** A 3-layer coprime compound (24 + 7 + 11 lobes: one repeat a revolution) on the example's 150 mm bar. */
const COMPOUND: Design = {
  ...EXAMPLE_DESIGN,
  rosette: {
    baseRadius: 50,
    layers: [
      { lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'sine' } },
      { lobes: 7, amplitude: 1, phase: 0.3, wave: { shape: 'pointed' } },
      { lobes: 11, amplitude: 0.8, phase: 0.6, wave: { shape: 'sine' } },
    ],
  },
};

/** Worst difference from the brute-force reference over the three paths, as a fraction of the cutter path's height. */
function worstAgainstReference(design: Design, step?: number): number {
  const ref = bruteForceProfile(design, 2500);
  const engine = computeBarSamples(design, step === undefined ? {} : { step });
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of ref.cutter) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
  let worst = 0;
  for (const key of ['cutter', 'bar', 'follower'] as const) {
    let k = 0;
    for (let j = 0; j < ref.x.length; j++) {
      while (k < engine.x.length - 2 && engine.x[k + 1] < ref.x[j]) k++;
      const w = (ref.x[j] - engine.x[k]) / (engine.x[k + 1] - engine.x[k]);
      worst = Math.max(worst, Math.abs(engine[key][k] + w * (engine[key][k + 1] - engine[key][k]) - ref[key][j]));
    }
    for (let i = 0; i < engine.x.length; i++) worst = Math.max(worst, Math.abs(engine[key][i] - referenceAt(ref.x, ref[key], engine.x[i])));
  }
  return worst / (hi - lo);
}

function compoundFigures(): void {
  const samples = computeBarSamples(COMPOUND);
  const timing = median(40, () => computeProfile(COMPOUND));
  const oldStep = COMPOUND.motion.travelPerRev / 2000; // 1/2000 of the common period, the default before the finest feature set it
  const old = median(40, () => computeProfile(COMPOUND, { step: oldStep }));
  const short: Design = { ...COMPOUND, bar: { ...COMPOUND.bar, length: 10 } }; // the reference is slow: 10 mm of it
  const pct = (v: number) => `${(100 * v).toFixed(3)} %`;
  console.log(`3-layer coprime compound (24 + 7 + 11 lobes), 150 mm bar at the default step (${samples.grid.step.toPrecision(3)} mm, ${samples.x.length} samples):`);
  console.log(`  computeProfile       median ${ms(timing.median)}, best ${ms(timing.best)}`);
  console.log(`  worst difference from the brute-force reference (first 10 mm, at and between points): ${pct(worstAgainstReference(short))} of the path's height (target ≤ 0.1 %)`);
  console.log(`  at the old default step (${oldStep} mm, ${Math.round(150 / oldStep) + 1} samples): median ${ms(old.median)}, off by ${pct(worstAgainstReference(short, oldStep))}`);
}

function studyFigures(): void {
  const design: Design = { ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lines: 200 } };
  const profile = computeProfile(design, { step: 0.01 });
  const study = computeLineStudy(design, profile);
  const points = study.lines.reduce((n, l) => n + l.points.length, 0);
  const fromProfile = median(60, () => computeLineStudy(design, profile));
  const fromDesign = median(60, () => computeLineStudy(design));
  console.log(`line study, 200 lines of 150 mm (${points} points drawn):`);
  console.log(`  with the profile's step  median ${ms(fromProfile.median)}, best ${ms(fromProfile.best)}   (target < 16 ms)`);
  console.log(`  at the default step      median ${ms(fromDesign.median)}, best ${ms(fromDesign.best)}`);
}

/** 500 different designs from a fixed-seed generator: lobes, waves, rubbers, cutters, schedules. */
function sweepDesigns(count: number): Design[] {
  let seed = 12345;
  const random = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
  const pick = <T>(items: readonly T[]) => items[Math.floor(random() * items.length)];
  const waves: Design['rosette']['layers'][0]['wave'][] = [
    { shape: 'sine' },
    { shape: 'pointed' },
    { shape: 'scallop' },
    { shape: 'flat', clip: 0.5 },
    { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 3, a: 0.2, b: 0.3 }] },
  ];
  const schedules: Design['study']['schedule'][] = [{ kind: 'none' }, { kind: 'alternate' }, { kind: 'ramp', steps: 6 }, { kind: 'sine', period: 30, depth: 0.25 }, { kind: 'twist', step: 0.05 }];
  return Array.from({ length: count }, () => ({
    ...EXAMPLE_DESIGN,
    rosette: {
      baseRadius: 40 + 20 * random(),
      layers: [
        { lobes: pick([6, 8, 12, 16, 18, 24, 30, 36, 48]), amplitude: 0.5 + 2 * random(), phase: random(), wave: pick(waves) },
        ...(random() < 0.3 ? [{ lobes: pick([2, 3, 4]), amplitude: 0.5 * random(), phase: random(), wave: { shape: 'sine' as const } }] : []),
      ],
    },
    rubber: random() < 0.8 ? { shape: 'round' as const, radius: 3 * random() } : { shape: 'flat' as const, width: 1 + 4 * random() },
    motion: { travelPerRev: 60 + 80 * random(), leverRatio: 0.5 + random() },
    cutter: { diameter: pick([3.175, 4.7625, 6.35]), flutes: 2 },
    follower: { radius: pick([1.5875, 2.38125, 3.175]) },
    study: { ...EXAMPLE_DESIGN.study, lines: 30, schedule: pick(schedules) },
  }));
}

function sweepFigures(): void {
  const designs = sweepDesigns(500);
  // Thumbnail data: about 1500 samples along the bar (at least 50 a period), 30 lines.
  const thumbnail = (d: Design) => {
    const period = d.motion.travelPerRev / rosetteRepeats(d.rosette);
    const profile = computeProfile(d, { step: Math.min(period / 50, d.bar.length / 1500) });
    return computeLineStudy(d, profile);
  };
  thumbnail(designs[0]);
  const runs = median(3, () => designs.forEach(thumbnail), 0);
  console.log(`500 different designs, profile + 30-line study thumbnail data, one core:`);
  console.log(`  median ${ms(runs.median)}, best ${ms(runs.best)}   (target < 2000 ms)`);
}

profileScaling(engine);
litSurface();
clipperFair();
compoundFigures();
studyFigures();
sweepFigures();
sweepBatchFigures();
