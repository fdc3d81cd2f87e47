import { EXAMPLE_DESIGN, parseDesign } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { cleanNumber, convertDesignUnits, formatValue, rangeInUnits, sliderStep, unitSuffix } from './field-units';

describe('cleanNumber', () => {
  it('removes the float noise of an exact inch conversion', () => {
    expect(cleanNumber(4.7625 / 25.4)).toBe(0.1875);
    expect(cleanNumber(0.003 * 25.4)).toBe(0.0762);
    expect(cleanNumber(1 / 3)).toBe(1 / 3);
    expect(cleanNumber(cleanNumber(50 / 25.4) * 25.4)).toBe(50);
  });
});

describe('convertDesignUnits', () => {
  it('turns the example into inches exactly (inch = 25.4 mm, the international inch of 1959) and back', () => {
    const inch = convertDesignUnits(EXAMPLE_DESIGN, 'in');
    expect(inch.units).toBe('in');
    expect(inch.cutter.diameter).toBe(0.1875); // a 3/16 in end mill
    expect(inch.plan.stepOver).toBe(0.003);
    expect(inch.bar.thickness).toBe(0.3125);
    expect(inch.study.vAngle).toBe(120); // angles stay
    expect(inch.rosette.layers[0].lobes).toBe(24); // counts stay
    expect(parseDesign(inch).ok).toBe(true);
    expect(convertDesignUnits(inch, 'mm')).toEqual(EXAMPLE_DESIGN);
  });

  it('leaves a design already in those units alone', () => {
    expect(convertDesignUnits(EXAMPLE_DESIGN, 'mm')).toBe(EXAMPLE_DESIGN);
  });
});

describe('units beside numbers', () => {
  it('names the unit of each kind of field', () => {
    expect(unitSuffix('length', 'in')).toBe('in');
    expect(unitSuffix('speed', 'mm')).toBe('mm/min');
    expect(unitSuffix('surfaceSpeed', 'in')).toBe('m/min');
    expect(unitSuffix('count', 'mm')).toBe('');
    expect(formatValue('angle', 120, 'mm')).toBe('120°');
    expect(formatValue('length', 4.7625 / 25.4, 'in')).toBe('0.1875 in');
    expect(formatValue('lobeFraction', 0.5, 'mm')).toBe('0.5 of a lobe');
  });

  it('converts slider ranges of lengths and speeds for inch designs only', () => {
    expect(rangeInUnits('length', [0, 25.4], 'in')).toEqual([0, 1]);
    expect(rangeInUnits('angle', [30, 170], 'in')).toEqual([30, 170]);
    expect(rangeInUnits('length', [0, 10], 'mm')).toEqual([0, 10]);
  });

  it('picks round slider steps', () => {
    expect(sliderStep(0, 10, false)).toBe(0.01);
    expect(sliderStep(0, 1, false)).toBe(0.001);
    expect(sliderStep(0.5, 20, false)).toBe(0.02);
    expect(sliderStep(1, 120, true)).toBe(1);
  });
});
