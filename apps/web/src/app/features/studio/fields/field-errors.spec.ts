import { EXAMPLE_DESIGN, parseDesign } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { catalogueKey, fieldLabel, pathKey, pathParts } from './field-catalogue';
import { countUnder, errorsByField, fieldOf, problemLines } from './field-errors';

const broken = (change: (d: any) => void) => {
  const d = structuredClone(EXAMPLE_DESIGN) as any;
  change(d);
  const result = parseDesign(d);
  if (result.ok) throw new Error('expected the design to be invalid');
  return errorsByField(result.errors);
};

describe('paths', () => {
  it('turn between the dotted form and the document path', () => {
    expect(pathParts('rosette.layers[2].lobes')).toEqual(['rosette', 'layers', 2, 'lobes']);
    expect(pathParts('rosette.layers[0].wave.points[3][0]')).toEqual(['rosette', 'layers', 0, 'wave', 'points', 3, 0]);
    expect(pathKey(['rosette', 'layers', 2, 'lobes'])).toBe('rosette.layers[2].lobes');
    expect(catalogueKey('rosette.layers[2].wave.terms[1].k')).toBe('rosette.layers[].wave.terms[].k');
  });

  it('name a field in the trade’s words with its layer', () => {
    expect(fieldLabel('rosette.layers[1].amplitude')).toBe('Layer 2 · Amplitude, peak to valley');
    expect(fieldLabel('rosette.layers[0].wave.terms[2].a')).toBe('Layer 1 · Term 3 · Cosine coefficient');
    expect(fieldLabel('study.vAngle')).toBe('V-cutter included angle');
    expect(fieldLabel('rosette.layers')).toBe('Rosette layers');
  });
});

describe('errorsByField', () => {
  it('puts the schema’s message on the field it names', () => {
    const errors = broken((d) => (d.rosette.layers[0].lobes = 0));
    expect(errors.get('rosette.layers[0].lobes')).toBe('must be at least 1');
  });

  it('states length limits in the file’s units', () => {
    const errors = broken((d) => (d.cutter.diameter = 80));
    expect(errors.get('cutter.diameter')).toBe('must be between 0.1 mm and 50 mm');
  });

  it('gives a reading’s problem to the readings field, and keeps the first message', () => {
    expect(fieldOf('rosette.layers[0].wave.points[3][0]')).toBe('rosette.layers[0].wave.points');
    expect(fieldOf('study.schedule.phases[4]')).toBe('study.schedule.phases');
    expect(fieldOf('rosette.layers[0].wave.terms[1].k')).toBe('rosette.layers[0].wave.terms[1].k');
  });

  it('reports a value of the wrong type as a field error instead of throwing', () => {
    const errors = broken((d) => (d.bar.length = 'long'));
    expect(errors.get('bar.length')).toBe('must be a number');
  });

  it('sums problems per panel and writes one line each', () => {
    const errors = broken((d) => {
      d.rosette.layers[0].lobes = 0;
      d.follower.radius = -1;
    });
    expect(countUnder(errors, ['rosette'])).toBe(1);
    expect(countUnder(errors, ['follower', 'study'])).toBe(1);
    expect(problemLines(errors)).toContain('Layer 1 · Lobes must be at least 1');
  });
});

describe('valueAt', () => {
  it('reads a value by dotted path, undefined where the path leads nowhere', async () => {
    const { valueAt } = await import('./design-values');
    expect(valueAt(EXAMPLE_DESIGN, 'rosette.layers[0].lobes')).toBe(24);
    expect(valueAt(EXAMPLE_DESIGN, 'rosette.layers[3].lobes')).toBeUndefined();
    expect(valueAt(null, 'units')).toBeUndefined();
  });
});
