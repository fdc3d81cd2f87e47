import type { Design, Units } from '@barwright/contracts';
import type { BarGrid } from './bar-grid';
import { rosetteMinRadius, rosetteRadius, sampleRosette, sampleRosetteAround } from './rosette';
import { readRubber, rubberReach, type RubberReading } from './rubber';
import { rubberWarnings } from './rubber-warnings';
import type { EngineWarning } from './types';

/** The rubber's displacement at grid nodes first … last (rosette length units), with its warnings. */
export interface RubberTrack {
  first: number;
  s: Float64Array;
  warnings: EngineWarning[];
}

/**
 * Reads the rubber at the grid nodes first … last of a design in mm. When they span more than a
 * period the rosette and rubber are read once over one period (nodes 0 … M−1) and the readings
 * repeat along the bar. Warning messages are written in `units` (the design file's).
 */
export function trackRubber(design: Design, grid: BarGrid, first: number, last: number, units: Units): RubberTrack {
  const count = last - first + 1;
  const periodic = count > grid.perPeriod;
  const start = periodic ? 0 : first;
  const span = periodic ? grid.perPeriod : count;
  const pad = Math.max(1, rubberReach(design.rubber, rosetteMinRadius(design.rosette), grid.dTheta));
  const radii = sampleRosette(design.rosette, start - pad, span + 2 * pad, grid.dTheta);
  const radius = rosetteRadius(design.rosette);
  const reading = readRubber(radii, pad, design.rubber, grid.dTheta, (j) => radius((start - pad + j) * grid.dTheta));
  const warnings = rubberWarnings({
    radii,
    pad,
    reading,
    rubber: design.rubber,
    dTheta: grid.dTheta,
    firstX: start * grid.step,
    step: grid.step,
    leverRatio: design.motion.leverRatio,
    period: periodic ? grid.period : undefined,
    units,
  });
  if (!periodic) return { first, s: reading.s, warnings };
  const s = new Float64Array(count);
  const m = grid.perPeriod;
  let k = (((first % m) + m) % m);
  for (let i = 0; i < count; i++) {
    s[i] = reading.s[k];
    if (++k === m) k = 0;
  }
  return { first, s, warnings };
}

/** The rubber's displacement at one rosette angle (rad), read on the grid's angular step. */
export function rubberAt(design: Design, grid: BarGrid, theta: number): number {
  const pad = Math.max(1, rubberReach(design.rubber, rosetteMinRadius(design.rosette), grid.dTheta));
  const radii = sampleRosetteAround(design.rosette, theta, pad, 1, grid.dTheta);
  const radius = rosetteRadius(design.rosette);
  return readRubber(radii, pad, design.rubber, grid.dTheta, (j) => radius(theta + (j - pad) * grid.dTheta)).s[0];
}

export type { RubberReading };
