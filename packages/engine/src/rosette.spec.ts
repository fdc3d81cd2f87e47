import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { rosetteMinRadius, rosetteRadius, rosetteRepeats, sampleRevolution, sampleRosette } from './rosette';

type Rosette = Design['rosette'];

const COMPOUND: Rosette = {
  baseRadius: 40,
  layers: [
    { lobes: 24, amplitude: 1, phase: 0.25, wave: { shape: 'sine' } },
    { lobes: 36, amplitude: 0.4, phase: 0, wave: { shape: 'pointed' } },
    { lobes: 5, amplitude: 0, phase: 0, wave: { shape: 'sine' } },
  ],
};

describe('rosette', () => {
  it('is R0 + (A/2)·w(Nθ + 2π·phase), phase a fraction of a lobe', () => {
    const r = rosetteRadius(EXAMPLE_DESIGN.rosette);
    expect(r(0)).toBeCloseTo(50.75, 12);
    expect(r(Math.PI / 24)).toBeCloseTo(49.25, 12);
    const shifted = rosetteRadius({ baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0.5, wave: { shape: 'sine' } }] });
    expect(shifted(0)).toBeCloseTo(49.25, 12);
  });

  it('sums its layers', () => {
    const r = rosetteRadius(COMPOUND);
    const t = 0.123;
    const expected = 40 + 0.5 * Math.cos(24 * t + Math.PI / 2) + 0.2 * (1 - (2 * Math.abs(36 * t - 2 * Math.PI)) / Math.PI);
    expect(r(t)).toBeCloseTo(expected, 12);
  });

  it('repeats gcd(lobes of the moving layers) times a revolution', () => {
    expect(rosetteRepeats(EXAMPLE_DESIGN.rosette)).toBe(24);
    expect(rosetteRepeats(COMPOUND)).toBe(12);
    const r = rosetteRadius(COMPOUND);
    for (const t of [0.1, 0.7, 2]) expect(r(t + (2 * Math.PI) / 12)).toBeCloseTo(r(t), 10);
  });

  it('samples on index-based angles, a revolution included', () => {
    const a = sampleRosette(COMPOUND, -3, 10, 0.01);
    const r = rosetteRadius(COMPOUND);
    a.forEach((v, j) => expect(v).toBeCloseTo(r((j - 3) * 0.01), 12));
    const rev = sampleRevolution(EXAMPLE_DESIGN.rosette, 48);
    expect(rev[0]).toBeCloseTo(50.75, 12);
    expect(rev[1]).toBeCloseTo(49.25, 12);
  });

  it('bounds its radius from below', () => {
    expect(rosetteMinRadius(COMPOUND)).toBeCloseTo(39.3, 12);
    expect(Math.min(...sampleRevolution(COMPOUND, 5000))).toBeGreaterThanOrEqual(39.3 - 1e-12);
  });
});
