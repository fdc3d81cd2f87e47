import { EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { peakToValley } from './cut-plan';
import { computeProfile } from './profile';
import { rosetteMinRadius, rosetteRadius } from './rosette';
import { toMm } from './units';

/** A dial-indicator table: 36 readings of a 0.8 mm rise, one lobe of a 6-lobe rosette. */
const readings: [number, number][] = Array.from({ length: 36 }, (_, i) => [i * 10, 50 + 0.4 * Math.cos((i * 10 * Math.PI) / 180)]);

function measured(scale?: 'as-read' | 'to-amplitude', units: 'mm' | 'in' = 'mm'): Design {
  return {
    ...EXAMPLE_DESIGN,
    rosette: {
      baseRadius: 50,
      layers: [{ lobes: 6, amplitude: 3, phase: 0, wave: { shape: 'measured', points: readings, ...(scale ? { scale } : {}) } }],
    },
    rubber: { shape: 'round', radius: 0 },
    motion: { travelPerRev: 60, leverRatio: 1 },
    bar: { ...EXAMPLE_DESIGN.bar, length: 30 },
    units,
  };
}

describe('measured rosettes: as read, or scaled to the layer', () => {
  it('keeps the readings as read when asked: the rise is the table\'s 0.8 mm, the amplitude unused', () => {
    const radius = rosetteRadius(measured('as-read').rosette);
    expect(radius(0)).toBeCloseTo(50.4, 9); // R0 + (50.4 − 50.0, the middle of the readings)
    expect(radius(Math.PI / 6)).toBeCloseTo(49.6, 9); // half a lobe on (6 lobes)
    expect(rosetteMinRadius(measured('as-read').rosette)).toBeCloseTo(49.6, 9);
    expect(peakToValley(computeProfile(measured('as-read')).cutterPath)).toBeCloseTo(0.8, 6);
  });

  it('scales them to the amplitude when asked, and files without the field keep that behaviour', () => {
    expect(peakToValley(computeProfile(measured('to-amplitude')).cutterPath)).toBeCloseTo(3, 6);
    expect(computeProfile(measured()).cutterPath).toEqual(computeProfile(measured('to-amplitude')).cutterPath);
  });

  it('keeps the choice through a change of units', () => {
    const inch = toMm({ ...measured('as-read'), units: 'in' });
    const wave = inch.rosette.layers[0].wave;
    expect(wave.shape === 'measured' && wave.scale).toBe('as-read');
  });

  it('checks the swing against the base radius with the rise as read', () => {
    const big = { ...measured('as-read'), rosette: { baseRadius: 0.3, layers: measured('as-read').rosette.layers } };
    const parsed = parseDesign({ ...big, rubber: { shape: 'round', radius: 0 } });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.errors.map((e) => e.path)).toContain('rosette.layers');
  });
});
