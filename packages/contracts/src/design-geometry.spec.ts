import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, layerPeakToValley, parseDesign, type Design } from './design';

/** The shop's own geometry: the cutter's offset, a rocking headstock, measured readings as read. All optional. */
const errorsOf = (value: unknown) => {
  const result = parseDesign(value);
  return result.ok ? [] : result.errors;
};

const readings: [number, number][] = Array.from({ length: 12 }, (_, i) => [i * 30, 50 + (i % 2) * 0.6]);

describe('design file: the shop\'s geometry', () => {
  it('accepts files without the new fields (they default to the old behaviour) and with them', () => {
    expect(parseDesign(EXAMPLE_DESIGN).ok).toBe(true);
    const full: Design = {
      ...EXAMPLE_DESIGN,
      motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'rocking', distance: 150 } },
      cutter: { ...EXAMPLE_DESIGN.cutter, offset: -0.5 },
    };
    expect(errorsOf(full)).toEqual([]);
    expect(errorsOf({ ...EXAMPLE_DESIGN, motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'linear' } } })).toEqual([]);
  });

  it('names the field and the limit of a bad offset or pivot', () => {
    expect(errorsOf({ ...EXAMPLE_DESIGN, cutter: { ...EXAMPLE_DESIGN.cutter, offset: 60 } })).toEqual([
      { path: 'cutter.offset', message: 'must be between -50 mm and 50 mm' },
    ]);
    expect(errorsOf({ ...EXAMPLE_DESIGN, motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'rocking', distance: 5 } } })).toEqual([
      { path: 'motion.pivot.distance', message: 'must be between 10 mm and 2000 mm' },
    ]);
    expect(errorsOf({ ...EXAMPLE_DESIGN, motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'rocking' } } })[0].path).toBe('motion.pivot.distance');
    expect(errorsOf({ ...EXAMPLE_DESIGN, motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'swinging', distance: 100 } } })[0].path).toBe('motion.pivot.kind');
  });

  it('keeps the rocking arm longer than the cutter\'s half swing plus its offset (so the arc exists)', () => {
    const lever = { ...EXAMPLE_DESIGN, motion: { travelPerRev: 100, leverRatio: 10, pivot: { kind: 'rocking', distance: 10 } } };
    // half swing: 10 × 1.5 / 2 = 7.5 mm, plus an offset of 3 mm: 10.5 mm
    expect(errorsOf({ ...lever, cutter: { ...EXAMPLE_DESIGN.cutter, offset: 3 } })).toEqual([
      { path: 'motion.pivot.distance', message: 'must be more than the cutter\'s half swing plus its offset (10.5 mm)' },
    ]);
    expect(errorsOf(lever)).toEqual([]);
  });

  it('checks lengths after conversion: an inch file meets the same bounds', () => {
    const inch = { ...EXAMPLE_DESIGN, units: 'in', cutter: { ...EXAMPLE_DESIGN.cutter, diameter: 0.1875, offset: 2.5 } };
    expect(errorsOf(inch).map((e) => e.path)).toContain('cutter.offset'); // 63.5 mm
  });

  it('reads a measured table as read or scaled to the amplitude, and says which values it takes', () => {
    const layer = (scale?: string) => ({ lobes: 6, amplitude: 2, phase: 0, wave: { shape: 'measured', points: readings, ...(scale ? { scale } : {}) } });
    const design = (scale?: string) => ({ ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [layer(scale)] } });
    expect(errorsOf(design())).toEqual([]);
    expect(errorsOf(design('as-read'))).toEqual([]);
    expect(errorsOf(design('to-amplitude'))).toEqual([]);
    expect(errorsOf(design('stretched'))).toEqual([{ path: 'rosette.layers[0].wave.scale', message: 'must be "as-read" or "to-amplitude"' }]);
    const parsed = parseDesign(design('as-read'));
    expect(parsed.ok && layerPeakToValley(parsed.design.rosette.layers[0])).toBeCloseTo(0.6, 12);
    const scaled = parseDesign(design());
    expect(scaled.ok && layerPeakToValley(scaled.design.rosette.layers[0])).toBe(2);
  });
});
