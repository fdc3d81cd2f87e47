import { EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { SCHEDULE_LABELS, WAVE_LABELS } from '../fields/field-catalogue';
import { convertDesignUnits } from '../units/field-units';
import { newLayer, rubberFor, scheduleFor, waveFor } from './shape-defaults';

const valid = (d: Design) => parseDesign(d).ok;

describe('shape defaults', () => {
  it('give a valid design for every wave shape but the eccentric (which needs one lobe)', () => {
    for (const shape of Object.keys(WAVE_LABELS) as (keyof typeof WAVE_LABELS)[]) {
      const d = structuredClone(EXAMPLE_DESIGN);
      d.rosette.layers[0].wave = waveFor(shape, d.rosette.layers[0], d.rosette.baseRadius);
      if (shape === 'eccentric') d.rosette.layers[0].lobes = 1;
      expect(valid(d), shape).toBe(true);
    }
  });

  it('give a valid design for every phase schedule', () => {
    for (const kind of Object.keys(SCHEDULE_LABELS) as (keyof typeof SCHEDULE_LABELS)[]) {
      expect(valid({ ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, schedule: scheduleFor(kind) } }), kind).toBe(true);
    }
  });

  it('state new lengths in the design’s units', () => {
    const round = rubberFor('round', 'in') as { radius: number };
    expect(round.radius).toBeCloseTo(1 / 25.4, 15);
    const inch = convertDesignUnits(EXAMPLE_DESIGN, 'in');
    expect(valid({ ...inch, rubber: rubberFor('flat', 'in'), rosette: { ...inch.rosette, layers: [...inch.rosette.layers, newLayer('in')] } })).toBe(true);
  });
});
