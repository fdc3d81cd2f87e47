import { describe, expect, it } from 'vitest';
import { formatLength, formatLengthRange, lengthFigure, roundLength, stockFraction } from './length-format';

describe('lengths written for people, in the design\'s units', () => {
  it('converts at inch = 25.4 mm exactly (NIST SP 811) and reads mm to 0.01 and inches to 0.001', () => {
    expect(formatLength(68.754321, 'mm')).toBe('68.75 mm');
    expect(formatLength(4.16666, 'mm')).toBe('4.17 mm');
    expect(formatLength(25.4, 'in')).toBe('1 in');
    expect(formatLength(50, 'in')).toBe('1.969 in');
    expect(formatLengthRange(2.54, 5.08, 'in')).toBe('0.1–0.2 in');
  });

  it('gives a small length one more decimal: 0.001 mm and 0.0001 in below 1 mm', () => {
    expect(formatLength(0.0762, 'mm')).toBe('0.076 mm');
    expect(formatLength(0.0762, 'in')).toBe('0.003 in');
    expect(formatLength(0.02, 'in')).toBe('0.0008 in');
    expect(formatLength(2.38125, 'mm')).toBe('2.38 mm');
  });

  it('keeps two significant figures of an amount too small for those decimals', () => {
    expect(lengthFigure(1e-4, 'in')).toBe(0.0000039); // 0.1 µm, the smallest warning amount
    expect(lengthFigure(0, 'in')).toBe(0);
    expect(Object.is(lengthFigure(-1e-9, 'mm'), -0)).toBe(false);
  });

  it('rounds a converted value for an entry box without touching the stored one', () => {
    const stored = 50 / 25.4; // what switching a 50 mm radius to inches keeps
    expect(roundLength(stored, 'in')).toBe(1.969);
    expect(roundLength(stored, 'in', true)).toBe(1.9685); // an entry box: 0.0001 in
    expect(roundLength(4.7625, 'mm', true)).toBe(4.7625); // and 0.1 µm
    expect(roundLength(0.1875, 'in', true)).toBe(0.1875); // 3/16 in comes back as typed
    expect(roundLength(0.0762, 'mm', true)).toBe(0.0762);
    expect(roundLength(0.1875, 'in')).toBe(0.188);
    expect(roundLength(0.00296, 'in')).toBe(0.003);
    expect(roundLength(0.00084, 'in')).toBe(0.0008);
  });

  it('names stock sizes to 1/64 in, and only lengths that are one', () => {
    expect(stockFraction(0.3125)).toBe('5/16');
    expect(stockFraction(1.25)).toBe('1 1/4');
    expect(stockFraction(2)).toBe('2');
    expect(stockFraction(1 / 64)).toBe('1/64');
    expect(stockFraction(0.3)).toBeNull();
    expect(formatLength(7.9375, 'in', { fraction: true })).toBe('0.313 in (5/16)');
    expect(formatLength(7.9375, 'mm', { fraction: true })).toBe('7.94 mm');
  });
});
