import { describe, expect, it } from 'vitest';
import { demoDesign, demoInInches, demoProfile } from '../testing/export-fixtures';
import { exportDesign } from './index';

// RFC 4180 shape, read back by splitting (the file holds numbers only, no quoting).
function rows(text: string): string[][] {
  expect(text.endsWith('\r\n')).toBe(true);
  return text.trimEnd().split('\r\n').map((line) => line.split(','));
}

describe('CSV export', () => {
  it('lists x, cutter path, bar edge and follower in mm with a header', async () => {
    const file = await exportDesign(demoDesign, 'csv', { profile: demoProfile });
    expect(file).toMatchObject({ filename: 'bar.csv', mime: 'text/csv' });
    const [header, ...body] = rows(file.content as string);
    expect(header).toEqual(['x_mm', 'cutter_path_y_mm', 'bar_edge_y_mm', 'follower_y_mm']);
    expect(body).toHaveLength(demoProfile.cutterPath.length);
    body.forEach((row, i) => {
      const [x, cutter, edge, follower] = row.map(Number);
      expect(x).toBeCloseTo(demoProfile.cutterPath[i][0], 5);
      expect(cutter).toBeCloseTo(demoProfile.cutterPath[i][1], 5);
      expect(edge).toBeCloseTo(demoProfile.barEdge[i][1], 5);
      expect(follower).toBeCloseTo(demoProfile.followerPath[i][1], 5);
    });
  });

  it('writes an inch design in inches (inch = 25.4 mm, NIST)', async () => {
    const file = await exportDesign(demoInInches(), 'csv', { profile: demoProfile });
    const [header, ...body] = rows(file.content as string);
    expect(header[0]).toBe('x_in');
    expect(Number(body.at(-1)![0])).toBeCloseTo(150 / 25.4, 6);
    expect(Number(body[0][1])).toBeCloseTo(demoProfile.cutterPath[0][1] / 25.4, 6);
  });
});
