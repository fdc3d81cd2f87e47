import { describe, expect, it } from 'vitest';
import { parseMeasuredTable } from './measured-rosette';

const table = (rows: string[]) => ['angle,radius', ...rows].join('\n');
const good = Array.from({ length: 12 }, (_, i) => `${i * 30},${(50 + Math.sin(i)).toFixed(3)}`);

describe('parseMeasuredTable', () => {
  it('reads a header, comments, blank lines and several separators', () => {
    const text = ['# rosette 7, dial readings', 'angle;radius', '', ...good.map((r, i) => (i % 2 ? r.replace(',', '\t') : r.replace(',', '; ')))].join('\r\n');
    const preview = parseMeasuredTable(text);
    expect(preview.errors).toEqual([]);
    expect(preview.points).toHaveLength(12);
    expect(preview.points[1]).toEqual([30, 50.841]);
  });

  it('names the line and the problem of each bad row', () => {
    const rows = [...good.slice(0, 3), 'ninety,50', '100,abc', '400,50', '350,-1', '20,50', '120', ...good.slice(4)];
    const { errors, points } = parseMeasuredTable(table(rows));
    expect(errors).toEqual([
      { line: 5, message: 'angle "ninety" is not a number' },
      { line: 6, message: 'radius "abc" is not a number' },
      { line: 7, message: 'angle 400° is outside 0° to below 360°' },
      { line: 8, message: 'radius -1 must be greater than 0' },
      { line: 9, message: 'angle 20° does not increase (the row before has 60°)' },
      { line: 10, message: 'needs two values, angle and radius; found 1' },
    ]);
    expect(points).toHaveLength(11);
  });

  it('needs at least 8 readings', () => {
    expect(parseMeasuredTable(table(good.slice(0, 5))).errors).toEqual([{ line: null, message: 'needs at least 8 good readings; found 5' }]);
    expect(parseMeasuredTable('').errors[0].message).toMatch(/found 0/);
  });
});
