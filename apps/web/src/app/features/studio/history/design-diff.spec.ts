import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { convertDesignUnits } from '../units/field-units';
import { designDifferences } from './design-diff';

const changed = (change: (d: any) => void) => {
  const d = structuredClone(EXAMPLE_DESIGN) as any;
  change(d);
  return d;
};

describe('designDifferences', () => {
  it('is empty for the same design', () => {
    expect(designDifferences(EXAMPLE_DESIGN, structuredClone(EXAMPLE_DESIGN))).toEqual([]);
  });

  it('names each changed field with its layer, before and after, with units', () => {
    const now = changed((d) => {
      d.rosette.layers[0].lobes = 30;
      d.cutter.diameter = 6;
    });
    expect(designDifferences(EXAMPLE_DESIGN, now)).toEqual([
      { path: 'rosette.layers[0].lobes', label: 'Layer 1 · Lobes', before: '24', after: '30' },
      { path: 'cutter.diameter', label: 'End mill diameter', before: '4.7625 mm', after: '6 mm' },
    ]);
  });

  it('says a layer was added, and a wave or schedule change in words', () => {
    const now = changed((d) => {
      d.rosette.layers.push({ lobes: 3, amplitude: 0.5, phase: 0, wave: { shape: 'flat', clip: 0.8 } });
      d.study.schedule = { kind: 'ramp', steps: 6 };
    });
    const diff = designDifferences(EXAMPLE_DESIGN, now);
    expect(diff).toContainEqual({ path: 'rosette.layers[1].wave.shape', label: 'Layer 2 · Wave shape', before: '—', after: 'Flat-topped (clipped)' });
    expect(diff).toContainEqual({ path: 'rosette.layers[1].amplitude', label: 'Layer 2 · Amplitude, peak to valley', before: '—', after: '0.5 mm' });
    expect(diff).toContainEqual({ path: 'study.schedule.kind', label: 'Phase schedule', before: 'Barleycorn (alternate half-period)', after: 'Basket weave (triangular ramp)' });
    expect(diff).toContainEqual({ path: 'study.schedule.steps', label: 'Ramp steps', before: '—', after: '6' });
  });

  it('compares in today’s units after a units switch, listing the switch once', () => {
    const now = convertDesignUnits(changed((d) => (d.bar.length = 152.4)), 'in');
    expect(designDifferences(EXAMPLE_DESIGN, now)).toEqual([
      { path: 'units', label: 'Design units', before: 'Millimetres (mm)', after: 'Inches (in)' },
      { path: 'bar.length', label: 'Bar length', before: '5.9055 in', after: '6 in' },
    ]);
  });

  it('copes with an invalid side without throwing', () => {
    const now = changed((d) => (d.study.lines = 'many'));
    expect(designDifferences(EXAMPLE_DESIGN, now)).toEqual([{ path: 'study.lines', label: 'Number of lines', before: '40', after: 'many' }]);
    expect(designDifferences(null, EXAMPLE_DESIGN).length).toBeGreaterThan(10);
  });
});
