import { DESIGN_PRESET_FILES, EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeLineStudy } from './line-study';
import { computeProfile } from './profile';

/*
 * The studio lays the line study from the step alone, before the bar's profile is computed, and shows
 * it as that profile's study. The check: both routes give the same lines, point for point, over the
 * presets and the cases where the profile is not one period repeated (a cutter off the centre line, a
 * rocking headstock, a bar too short to hold a period clear of its ends, inches, a coarse step).
 */
const example = EXAMPLE_DESIGN;
const cases: [string, Design, number | undefined][] = [
  ...Object.entries(DESIGN_PRESET_FILES).map(([name, design]): [string, Design, number | undefined] => [`preset ${name}`, design, undefined]),
  ['a cutter 3 mm off the centre line', { ...example, cutter: { ...example.cutter, offset: 3 } }, undefined],
  ['a rocking headstock', { ...example, motion: { ...example.motion, pivot: { kind: 'rocking', distance: 120 } } }, undefined],
  ['a bar shorter than two periods', { ...example, bar: { ...example.bar, length: 6 } }, undefined],
  ['a coarse step asked for', example, 0.01],
  ['the lines running as the bar', { ...example, study: { ...example.study, direction: 'as-bar' } }, undefined],
];

describe('the line study laid ahead of the profile', () => {
  it.each(cases)('is the profile’s own study: %s', (_, design, step) => {
    const ahead = computeLineStudy(design, { step });
    const after = computeLineStudy(design, computeProfile(design, step === undefined ? {} : { step }));
    expect(ahead.spacing).toBe(after.spacing);
    expect(ahead.width).toBe(after.width);
    expect(ahead.lines.length).toBe(after.lines.length);
    let worst = 0;
    ahead.lines.forEach((line, j) => {
      expect(line.points.length).toBe(after.lines[j].points.length);
      line.points.forEach(([x, y], k) => (worst = Math.max(worst, Math.abs(x - after.lines[j].points[k][0]), Math.abs(y - after.lines[j].points[k][1]))));
    });
    expect(worst).toBeLessThan(1e-9);
  });
});
