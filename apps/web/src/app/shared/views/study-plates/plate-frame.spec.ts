import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeDesignViews } from '../../../features/studio/compute/design-views';
import { linesInWindow, PLATE_MAX_HEIGHT_PX, plateFrame } from './plate-frame';

const { study } = computeDesignViews(EXAMPLE_DESIGN, 'preview');

describe('the plates\' window', () => {
  it('is at true scale: as many mm a pixel across as up', () => {
    const frame = plateFrame(study, 40, 800)!;
    expect([frame.x0, frame.x1]).toEqual([55, 95]);
    expect((frame.y1 - frame.y0) / frame.heightCss).toBeCloseTo((frame.x1 - frame.x0) / frame.widthCss, 9);
  });

  it('shows the middle lines of a study taller than the plate, and every line of a short one', () => {
    const tall = plateFrame(study, 15, 1200)!; // 40 lines 0.45 mm apart, 80 px a mm
    expect(tall.heightCss).toBe(PLATE_MAX_HEIGHT_PX);
    expect(tall.cropped).toBe(true);
    const whole = plateFrame(study, 'whole', 360)!;
    expect(whole.cropped).toBe(false);
    expect(plateFrame(study, 40, 0)).toBeNull();
  });

  it('hands the painter only the stretch of each line that can reach the window', () => {
    const [x0, x1] = [55, 95];
    const lines = linesInWindow(study.lines, x0, x1, 0.5);
    lines.forEach((xy, j) => {
      expect(xy.length).toBeLessThan(study.lines[j].length);
      expect(xy[0]).toBeLessThanOrEqual(x0 - 0.5);
      expect(xy[xy.length - 2]).toBeGreaterThanOrEqual(x1 + 0.5);
      expect(xy[2]).toBeGreaterThan(x0 - 0.5); // one sample before the reach, no more
    });
  });
});
