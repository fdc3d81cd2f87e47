import { describe, expect, it } from 'vitest';
import { barleycorn, lineStudyPaths, sketchHeight } from './line-study-sketch';

describe('lineStudyPaths', () => {
  const spec = { width: 40, lines: 3, spacing: 10, amplitude: 4, period: 40, phase: barleycorn };

  it('draws one path per line, each spanning the width', () => {
    const paths = lineStudyPaths(spec);
    expect(paths).toHaveLength(3);
    for (const d of paths) {
      expect(d.startsWith('M0.0 ')).toBe(true);
      expect(d).toContain('L40.0 ');
    }
  });

  it('shifts neighbouring lines by half a period (barleycorn): crest above trough', () => {
    const y = (d: string, i: number) => Number(d.slice(1).split('L')[i].split(' ')[1]);
    const [first, second] = lineStudyPaths(spec);
    // x = period / 4 is index 6 of 24 steps per period: line 0 at its crest, line 1 at its trough.
    expect(y(first, 6)).toBeCloseTo(2 + 2, 2);
    expect(y(second, 6)).toBeCloseTo(12 - 2, 2);
  });

  it('reports the height the lines occupy', () => {
    expect(sketchHeight(spec)).toBe(4 + 2 * 10);
  });
});
