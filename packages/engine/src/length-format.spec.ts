import { describe, expect, it } from 'vitest';
import { formatLength, formatLengthRange, lengthFigure } from './length-format';

describe('lengths written in the design\'s units', () => {
  it('converts at inch = 25.4 mm exactly (NIST) and rounds for reading', () => {
    expect(formatLength(0.0762, 'in')).toBe('0.003 in');
    expect(formatLength(0.0762, 'mm')).toBe('0.0762 mm');
    expect(formatLength(25.4, 'in')).toBe('1 in');
    expect(formatLengthRange(2.54, 5.08, 'in')).toBe('0.1–0.2 in');
  });

  it('keeps two significant figures of an amount too small for the usual decimals', () => {
    expect(lengthFigure(1e-4, 'in')).toBe(0.0000039); // 0.1 µm, the smallest warning amount
    expect(lengthFigure(0, 'in')).toBe(0);
    expect(Object.is(lengthFigure(-1e-9, 'mm'), -0)).toBe(false);
  });
});
