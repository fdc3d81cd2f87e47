import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import type { Point, Profile } from '../types';
import { exportDesign, EXPORT_FORMATS } from './index';
import { simplifyPolyline } from './polyline-simplify';

/**
 * A path no simplification can thin (every sample a corner, 40 samples a crest) over a 1 000 mm bar:
 * 400 000 points. Passing that many as call arguments (`push(...points)`) overflows the stack, and
 * Ramer–Douglas–Peucker over 10 000 equal crests peels one crest per split (points × crests).
 */
const COUNT = 400_000;
const LENGTH = 1000;
const design: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: LENGTH } };

function jagged(lift: number): Point[] {
  return Array.from({ length: COUNT + 1 }, (_, i): Point => [(i * LENGTH) / COUNT, lift + (i % 40 < 20 ? i % 20 : 20 - (i % 20)) * 0.01]);
}

const profile: Profile = {
  period: LENGTH / (COUNT / 40),
  step: LENGTH / COUNT,
  cutterPath: jagged(2.4),
  barEdge: jagged(0),
  followerPath: jagged(2.4),
  minRadiusOfCurvature: 0.1,
  warnings: [],
};

describe('exports of a very long path', () => {
  it('simplifies a periodic path in time linear in its points', () => {
    const started = performance.now();
    const kept = simplifyPolyline(profile.barEdge, 0.0005);
    // Before stretches: about points × crests = 4·10⁹ distances, minutes.
    expect(performance.now() - started).toBeLessThan(5000);
    expect(kept.length).toBeGreaterThan(COUNT / 20); // every corner stays
  });

  it.each(EXPORT_FORMATS.filter((f) => f !== 'json'))('writes %s without overflowing the stack', async (format) => {
    const file = await exportDesign(design, format, { profile });
    expect(file.content.length).toBeGreaterThan(10_000);
  }, 60_000);

  it('writes every point of the path into the G-code, in order', async () => {
    const text = (await exportDesign(design, 'gcode', { profile })).content as string;
    const moves = text.split('\n').filter((line) => /^X-?\d/.test(line));
    // Corners every 20 samples; one pass's worth of moves at least, per pass.
    expect(moves.length).toBeGreaterThanOrEqual(COUNT / 20);
  }, 60_000);
});
