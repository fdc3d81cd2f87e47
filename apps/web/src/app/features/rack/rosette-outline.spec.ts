import { describe, expect, it } from 'vitest';
import type { RosetteObject } from '@barwright/contracts';
import { OUTLINE_SAMPLES, rosetteOutline } from './rosette-outline';

const points = (d: string) => [...d.matchAll(/[ML]([-\d.]+) ([-\d.]+)/g)].map((m) => ({ x: +m[1], y: +m[2] }));

describe('rosetteOutline', () => {
  it('a sine rosette spans R0 ± A/2 (closed form r = R0 + (A/2)·sin(Nθ)) and is drawn with its rise made visible', () => {
    const rosette: RosetteObject = { baseRadius: 50, layers: [{ lobes: 12, amplitude: 2, phase: 0, wave: { shape: 'sine' } }] };
    const outline = rosetteOutline(rosette);
    expect(outline.min).toBeCloseTo(49, 9);
    expect(outline.max).toBeCloseTo(51, 9);
    expect(points(outline.path)).toHaveLength(OUTLINE_SAMPLES);
    expect(outline.path.endsWith('Z')).toBe(true);
    expect(outline.exaggeration).toBeGreaterThan(1);
    // Every point lies in the drawing's ring, inside the 100 × 100 box.
    for (const p of points(outline.path)) {
      const r = Math.hypot(p.x - 50, p.y - 50);
      expect(r).toBeGreaterThan(29.7);
      expect(r).toBeLessThan(48.1);
    }
  });

  it('a deep rosette is drawn to scale', () => {
    const outline = rosetteOutline({ baseRadius: 20, layers: [{ lobes: 3, amplitude: 20, phase: 0, wave: { shape: 'sine' } }] });
    expect(outline.exaggeration).toBe(1);
  });

  it('a measured table is a smooth curve through the readings, not straight segments between them', () => {
    const table: [number, number][] = Array.from({ length: 8 }, (_, i) => [i * 45, i % 2 === 0 ? 50.5 : 49.5]);
    const rosette: RosetteObject = { baseRadius: 50, layers: [{ lobes: 1, amplitude: 1, phase: 0, wave: { shape: 'measured', points: table } }] };
    const outline = rosetteOutline(rosette);
    expect(outline.readings).toHaveLength(8);
    const curve = points(outline.path);
    // The curve passes through each reading (it is sampled at every 0.5°, and the readings sit on 45° steps).
    for (const reading of outline.readings) {
      const nearest = Math.min(...curve.map((p) => Math.hypot(p.x - reading.x, p.y - reading.y)));
      expect(nearest).toBeLessThan(0.02);
    }
    // Halfway between a crest (0°) and a valley (45°) the curve is at the middle radius, but at a quarter
    // of the way it is nearer the crest than a straight chord would be (the Hermite piece is flat at a crest).
    const ring = (i: number) => Math.hypot(curve[i].x - 50, curve[i].y - 50);
    const crest = ring(0);
    const valley = ring(90);
    const quarter = ring(22);
    const chordQuarter = crest + (valley - crest) * (22 / 90);
    expect(quarter).toBeGreaterThan(chordQuarter + 1);
  });
});
