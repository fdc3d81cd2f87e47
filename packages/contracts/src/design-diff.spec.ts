import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, type Design } from './design';
import { diffDesigns } from './design-diff';

const copy = (change: (d: Design) => void): Design => {
  const d = structuredClone(EXAMPLE_DESIGN);
  change(d);
  return d;
};
const texts = (a: Design, b: Design) => diffDesigns(a, b).map((c) => c.text);

describe('diffDesigns', () => {
  it('finds nothing between equal files', () => {
    expect(diffDesigns(EXAMPLE_DESIGN, structuredClone(EXAMPLE_DESIGN))).toEqual([]);
  });

  it('words each change in the trade’s terms with units', () => {
    const after = copy((d) => {
      d.cutter.diameter = 6;
      d.rosette.layers[0].lobes = 36;
      d.rosette.layers[0].wave = { shape: 'pointed' };
      d.bar.material = 'brass';
      d.study.schedule = { kind: 'ramp', steps: 6 };
      d.study.vAngle = 90;
      d.plan.surfaceSpeed = 30;
    });
    expect(texts(EXAMPLE_DESIGN, after)).toEqual([
      'Lobes: 24 → 36',
      'Wave: Sine → Pointed',
      'Cutter diameter: 4.7625 mm → 6 mm',
      'Material: A2 tool steel → Brass',
      'Phase schedule: Barleycorn (alternate half-period) → Basket weave (ramp of 6 steps)',
      'V-cutter included angle: 120° → 90°',
      "Surface speed: material's preset → 30 m/min",
    ]);
    expect(diffDesigns(EXAMPLE_DESIGN, after)[2]).toMatchObject({ path: 'cutter.diameter', label: 'Cutter diameter', before: '4.7625 mm', after: '6 mm' });
  });

  it('compares lengths in millimetres when the units change', () => {
    const inch = copy((d) => {
      d.units = 'in';
      for (const [k, v] of Object.entries(d.bar)) if (typeof v === 'number') (d.bar as Record<string, unknown>)[k] = v / 25.4;
      d.cutter.diameter = 0.25;
    });
    const changes = texts(EXAMPLE_DESIGN, inch);
    expect(changes).toContain('Units: millimetres → inches');
    expect(changes).toContain('Cutter diameter: 4.7625 mm → 0.25 in');
    expect(changes.some((t) => t.startsWith('Bar length'))).toBe(false);
  });

  it('names added layers and rubber changes', () => {
    const after = copy((d) => {
      d.rosette.layers.push({ lobes: 3, amplitude: 0.5, phase: 0.25, wave: { shape: 'sine' } });
      d.rubber = { shape: 'flat', width: 5 };
    });
    expect(texts(EXAMPLE_DESIGN, after)).toEqual([
      'Rosette layers: 1 → 2',
      'Layer 2: none → 3 lobes, Sine, 0.5 mm peak to valley',
      'Rubber: round, 1 mm radius → flat, 5 mm wide',
    ]);
  });
});
