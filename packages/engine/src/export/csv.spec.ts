import { describe, expect, it } from 'vitest';
import { demoDesign, demoInInches, demoProfile, yAt } from '../testing/export-fixtures';
import { computeProfile } from '../profile';
import type { Point } from '../types';
import { exportDesign, GCODE_TOLERANCE_MM } from './index';

// RFC 4180 shape, read back by splitting (the file holds numbers only, no quoting).
function rows(text: string): string[][] {
  expect(text.endsWith('\r\n')).toBe(true);
  return text.trimEnd().split('\r\n').map((line) => line.split(','));
}

describe('CSV export', () => {
  it('lists x, cutter path, bar edge and follower in mm with a header, rows from the profile', async () => {
    const file = await exportDesign(demoDesign, 'csv', { profile: demoProfile });
    expect(file).toMatchObject({ filename: 'bar.csv', mime: 'text/csv' });
    const [header, ...body] = rows(file.content as string);
    expect(header).toEqual(['x_mm', 'cutter_path_y_mm', 'bar_edge_y_mm', 'follower_y_mm']);
    const byX = new Map(demoProfile.cutterPath.map(([x], i) => [x.toFixed(5), i]));
    for (const row of body) {
      const [x, cutter, edge, follower] = row.map(Number);
      const i = byX.get(x.toFixed(5))!;
      expect(i).toBeDefined();
      expect(cutter).toBeCloseTo(demoProfile.cutterPath[i][1], 5);
      expect(edge).toBeCloseTo(demoProfile.barEdge[i][1], 5);
      expect(follower).toBeCloseTo(demoProfile.followerPath[i][1], 5);
    }
    expect(Number(body[0][0])).toBe(0);
    expect(Number(body.at(-1)![0])).toBe(150);
  });

  it('keeps the rows a machine needs: straight lines between them follow every path within the G-code tolerance', async () => {
    const profile = computeProfile(demoDesign);
    const file = await exportDesign(demoDesign, 'csv', { profile });
    const body = rows(file.content as string).slice(1).map((r) => r.map(Number));
    expect(body.length).toBeLessThan(profile.cutterPath.length / 10);
    const column = (c: number): Point[] => body.map((r) => [r[0], r[c]]);
    const paths = [profile.cutterPath, profile.barEdge, profile.followerPath];
    paths.forEach((path, c) => {
      const read = column(c + 1);
      let worst = 0;
      for (const [x, y] of path) worst = Math.max(worst, Math.abs(yAt(read, x) - y));
      // The tolerance plus the rounding of the written figures (5 decimals).
      expect(worst).toBeLessThanOrEqual(GCODE_TOLERANCE_MM + 1e-5);
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
