/**
 * The sweep's batch entry point: 500 candidates (25 rosettes × 2 rubbers × 5 travel settings × 2
 * cutters, 150 mm bars) on one core, at each design's default step and at a thumbnail's step (about
 * 1500 samples along the bar, at least 50 a period). CPU time of this process.
 */
import { EXAMPLE_DESIGN, sweepCandidates, type RosetteObject, type SweepChoices } from '@barwright/contracts';
import { computeBatch, rosetteRepeats } from '../src/index';
import { cpuMs, ms } from './bench-timing';

const WAVES: RosetteObject['layers'][0]['wave'][] = [{ shape: 'sine' }, { shape: 'pointed' }, { shape: 'scallop' }, { shape: 'flat', clip: 0.5 }, { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 2, a: 0, b: 0.35 }] }];
const LOBES = [8, 12, 18, 24, 36];

export function sweepBatchFigures(): void {
  const rack = Array.from({ length: 25 }, (_, i) => ({
    id: `r${i}`,
    name: `Rosette ${i}`,
    units: 'mm' as const,
    rosette: { baseRadius: 50, layers: [{ lobes: LOBES[i % 5], amplitude: 1.2, phase: 0, wave: WAVES[Math.floor(i / 5)] }] },
    tags: [],
  }));
  const choices: SweepChoices = {
    units: 'mm',
    rosettes: { by: 'all' },
    rubbers: [{ shape: 'round', radius: 1 }, { shape: 'flat', width: 3 }],
    travels: [60, 80, 100, 120, 150].map((travelPerRev) => ({ travelPerRev, leverRatio: 1 })),
    cutters: [{ diameter: 4.7625, flutes: 2 }, { diameter: 3.175, flutes: 2 }],
    follower: { radius: 2.38125 },
    barLength: 150,
    study: { ...EXAMPLE_DESIGN.study, schedules: [EXAMPLE_DESIGN.study.schedule] },
  };
  const candidates = sweepCandidates(choices, rack).map((c) => c.candidate);
  computeBatch(candidates.slice(0, 5)); // warm
  const byDefault = cpuMs(() => computeBatch(candidates));
  // The thumbnail step of the sweep grid: the coarsest of period/50 and length/1500 over the batch.
  const step = Math.min(...candidates.map((c) => Math.min(c.travel.travelPerRev / rosetteRepeats(c.rosette.rosette) / 50, c.barLength / 1500)));
  const thumbnail = cpuMs(() => computeBatch(candidates, { step }));
  console.log(`sweep batch, ${candidates.length} candidates (150 mm bars: figures, cut plan, one period), one core:`);
  console.log(`  at each design's default step  ${ms(byDefault)} (${ms(byDefault / candidates.length)} a candidate)`);
  console.log(`  at a thumbnail step (${step.toPrecision(3)} mm)  ${ms(thumbnail)} (${ms(thumbnail / candidates.length)} a candidate)`);
}
