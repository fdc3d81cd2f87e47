import { MM_PER_INCH } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { feedPerMinute, sfmToMPerMin, spindleRpm, spindleRpmFromSfm } from './spindle-speed';

describe('spindle speed', () => {
  it('is RPM = 1000·Vc/(π·D) in metric units (machining handbook formula)', () => {
    expect(spindleRpm(100, 10)).toBeCloseTo(100000 / (Math.PI * 10), 9);
    expect(spindleRpm(100, 10)).toBeCloseTo(3183.0989, 3);
  });

  it('is RPM = 12·SFM/(π·D) in inch units (machining handbook formula)', () => {
    expect(spindleRpmFromSfm(300, 0.5)).toBeCloseTo(2291.8312, 3);
  });

  it('gives the same speed from both forms, with inch = 25.4 mm and foot = 12 in exactly (NIST)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(sfmToMPerMin(1)).toBeCloseTo(0.3048, 15);
    const sfm = 200;
    const inches = 3 / 16;
    expect(spindleRpm(sfmToMPerMin(sfm), inches * MM_PER_INCH)).toBeCloseTo(spindleRpmFromSfm(sfm, inches), 9);
  });

  it('gives feed = rpm × flutes × chip load per tooth (machining handbook formula)', () => {
    expect(feedPerMinute(4000, 2, 0.0127)).toBeCloseTo(101.6, 12);
  });
});
