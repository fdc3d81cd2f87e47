import { describe, expect, it } from 'vitest';
import { polarPlot } from './polar-plot';

describe('polarPlot', () => {
  it('puts 0° to the right and 90° at the top, counter-clockwise', () => {
    const plot = polarPlot([[0, 10], [90, 10], [180, 10], [270, 12]], 200);
    expect(plot.dots[0]).toEqual({ x: 150, y: 100 }); // smallest radius on the inner ring (50)
    expect(plot.dots[1]).toEqual({ x: 100, y: 50 });
    expect(plot.dots[3]).toEqual({ x: 100, y: 192 }); // largest on the outer ring (92)
    expect(plot.outline.startsWith('M150,100L')).toBe(true);
    expect(plot.outline.endsWith('Z')).toBe(true);
  });

  it('states the radius range it spread over the rings', () => {
    const plot = polarPlot([[0, 49.25], [180, 50.75]]);
    expect([plot.min, plot.max]).toEqual([49.25, 50.75]);
    expect(plot.inner).toBeLessThan(plot.outer);
  });

  it('draws equal readings as a circle between the rings, and nothing without readings', () => {
    const flat = polarPlot([[0, 5], [120, 5], [240, 5]], 100);
    expect(flat.dots[0].x).toBe(50 + 35.5);
    expect(polarPlot([]).outline).toBe('');
  });
});
