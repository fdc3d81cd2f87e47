import { describe, expect, it } from 'vitest';
import { designSchema, EXAMPLE_DESIGN } from '@barwright/contracts';
import { designFromReadings, measuredWaveJson, rosetteFromReadings } from './readings-rosette';

const readings: [number, number][] = Array.from({ length: 12 }, (_, i) => [i * 30, 50 + (i % 2 ? 0.6 : -0.6)]);

describe('rosetteFromReadings', () => {
  it('centres the rosette between the extreme readings, the difference as peak-to-valley', () => {
    const rosette = rosetteFromReadings(readings);
    expect(rosette.baseRadius).toBe(50);
    expect(rosette.layers[0]).toMatchObject({ lobes: 1, amplitude: 1.2, phase: 0, wave: { shape: 'measured' } });
  });

  it('makes a design file the contract accepts', () => {
    expect(designSchema.safeParse({ ...EXAMPLE_DESIGN, rosette: rosetteFromReadings(readings) }).success).toBe(true);
  });
});

describe('designFromReadings', () => {
  it('is a whole valid file in the readings’ units, its rosette the readings', () => {
    const inches: [number, number][] = readings.map(([a, r]) => [a, r / 25.4]);
    const design = designFromReadings(inches, 'in');
    expect(design.units).toBe('in');
    expect(design.rosette.layers[0].wave).toEqual({ shape: 'measured', points: inches });
    expect(designSchema.safeParse(design).success).toBe(true);
  });
});

describe('measuredWaveJson', () => {
  it('is JSON of the measured wave, one reading a line', () => {
    const text = measuredWaveJson([[0, 50], [90, 51]]);
    expect(JSON.parse(text)).toEqual({ shape: 'measured', points: [[0, 50], [90, 51]] });
    expect(text.split('\n').length).toBeGreaterThan(3);
  });
});
