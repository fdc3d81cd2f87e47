import type { PhaseSchedule } from '@barwright/contracts';

/**
 * The phase of engraved line j (0-based) as a fraction of the bar's period, not reduced:
 * - none: every line in phase (plain waves);
 * - alternate: half a period on odd lines (barleycorn);
 * - ramp: a triangular ramp rising half a period over `steps` lines and falling back over as many (basket weave);
 * - sine: depth · sin(2π·j / period lines) (moiré);
 * - twist: j · step, a steady drift;
 * - list: the listed phases, cycled.
 */
export function linePhase(schedule: PhaseSchedule, j: number): number {
  switch (schedule.kind) {
    case 'none':
      return 0;
    case 'alternate':
      return j % 2 === 1 ? 0.5 : 0;
    case 'ramp': {
      const k = j % (2 * schedule.steps);
      return (0.5 * (k <= schedule.steps ? k : 2 * schedule.steps - k)) / schedule.steps;
    }
    case 'sine':
      return schedule.depth * Math.sin((2 * Math.PI * j) / schedule.period);
    case 'twist':
      return j * schedule.step;
    case 'list':
      return schedule.phases[j % schedule.phases.length];
  }
}

/** A phase reduced to [0, 1). */
export function reducedPhase(phase: number): number {
  const f = phase - Math.floor(phase);
  return f >= 1 ? 0 : f;
}
