import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { convertDesignUnits } from '../../features/studio/units/field-units';
import { fieldRows, figureRows } from './compare-table';

const changed = (edit: (d: Design) => void): Design => {
  const copy = structuredClone(EXAMPLE_DESIGN);
  edit(copy);
  return copy;
};

describe('fieldRows', () => {
  it('lays every field of the designs out in one row each, marking what differs from the first', () => {
    const rows = fieldRows([EXAMPLE_DESIGN, changed((d) => (d.rosette.layers[0].lobes = 36)), changed((d) => (d.cutter.diameter = 3.175))], 'mm');
    const lobes = rows.find((r) => r.key === 'rosette.layers[0].lobes')!;
    expect(lobes.values).toEqual(['24', '36', '24']);
    expect(lobes.changed).toEqual([false, true, false]);
    const cutter = rows.find((r) => r.key === 'cutter.diameter')!;
    expect(cutter.changed).toEqual([false, false, true]);
    expect(rows.filter((r) => r.changed.some(Boolean)).map((r) => r.key)).toEqual(['rosette.layers[0].lobes', 'cutter.diameter']);
  });

  it('reads a design in other units in the table\'s units, so a units switch alone changes no length', () => {
    const inches = convertDesignUnits(EXAMPLE_DESIGN, 'in');
    const rows = fieldRows([EXAMPLE_DESIGN, inches], 'mm');
    const differing = rows.filter((r) => r.changed.some(Boolean));
    expect(differing.map((r) => r.key)).toEqual(['units']);
    expect(differing[0].values).toEqual(['Millimetres (mm)', 'Inches (in)']);
    expect(rows.find((r) => r.key === 'bar.length')!.values).toEqual(['150 mm', '150 mm']);
  });

  it('keeps a field only one design has, the other side showing none', () => {
    const rows = fieldRows([EXAMPLE_DESIGN, changed((d) => (d.cutter.offset = 1))], 'mm');
    const offset = rows.find((r) => r.key === 'cutter.offset')!;
    expect(offset.values[0]).toBe('—');
    expect(offset.changed).toEqual([false, true]);
  });
});

describe('figureRows', () => {
  it('puts each design\'s figures side by side, "…" for one not yet worked out', () => {
    const rows = figureRows([
      [{ label: 'Passes', value: '4 at 0.076 mm' }],
      [{ label: 'Passes', value: '6 at 0.076 mm' }],
      null,
    ]);
    expect(rows).toEqual([{ key: 'figure:Passes', label: 'Passes', values: ['4 at 0.076 mm', '6 at 0.076 mm', '…'], changed: [false, true, true], field: false }]);
  });
});
