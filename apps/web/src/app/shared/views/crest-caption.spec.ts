import { describe, expect, it } from 'vitest';
import { crestCaption } from './crest-caption';

const mm = (v: number) => `${v} mm`;

describe('crestCaption', () => {
  it('says "sharp corner" for a corner, never a radius', () => {
    const text = crestCaption({ radius: 0, corner: true, x: 2, pathRadius: 0 }, mm);
    expect(text).toContain('sharp corner');
    expect(text).not.toMatch(/radius 0/);
  });
  it('gives the radius and where for a rounded crest', () => {
    expect(crestCaption({ radius: 15.7, corner: false, x: 0, pathRadius: 16 }, mm)).toBe("smallest radius of curvature of the bar's crests 15.7 mm, at x 0 mm");
  });
  it('says a straight bar has no crest, without Infinity', () => {
    const text = crestCaption({ radius: Infinity, corner: false, x: null, pathRadius: Infinity }, mm);
    expect(text).not.toContain('Infinity');
    expect(text).toContain('straight');
  });
  it('places the crest in the window drawn, every period along the bar', () => {
    const text = crestCaption({ radius: 0, corner: true, x: 0, pathRadius: 0 }, mm, { from: 68.75, period: 12.5 });
    expect(text).toContain('first at x 75 mm and every 12.5 mm along the bar');
  });
});
