import { describe, expect, it } from 'vitest';
import { arrayTop, thumbLineLength, thumbPixels, thumbWindow, THUMB_MM } from './thumb-frame';

describe('thumb frame', () => {
  it('is the same size for every candidate, centred on its study', () => {
    const a = thumbWindow({ lineSpacing: 0.5, lines: 11 }, 1);
    const b = thumbWindow({ lineSpacing: 0.2, lines: 80 }, 3);
    for (const w of [a, b]) {
      expect(w.x1 - w.x0).toBeCloseTo(THUMB_MM.width, 12);
      expect(w.y1 - w.y0).toBeCloseTo(THUMB_MM.height, 12);
    }
    expect((a.y0 + a.y1) / 2).toBeCloseTo(3, 12); // (10·0.5 + 1) / 2
    expect((b.y0 + b.y1) / 2).toBeCloseTo((79 * 0.2 + 3) / 2, 12);
    expect(a.x0).toBeGreaterThan(0); // clear of the lines' start
  });

  it('lays the lines past the window by the groove reach', () => {
    const w = thumbWindow({ lineSpacing: 0.5, lines: 11 }, 1);
    expect(thumbLineLength(w, 0.3)).toBeGreaterThan(w.x1 + 0.3);
  });

  it('finds the top of a period and sizes the pixels at the device ratio (at most 2)', () => {
    expect(arrayTop(new Float32Array([0, 0.25, 1.5, 0.5]))).toBe(1.5);
    expect(arrayTop([])).toBe(0);
    expect(thumbPixels(160, 100, 1)).toEqual({ widthPx: 160, heightPx: 100, heightMm: 10 });
    expect(thumbPixels(160, 100, 3)).toEqual({ widthPx: 320, heightPx: 200, heightMm: 10 });
    expect(thumbPixels(160, 100, 0)).toEqual({ widthPx: 160, heightPx: 100, heightMm: 10 });
    // A wider box (the page's card): the same mm across, fewer mm high, so every card is at one scale.
    expect(thumbPixels(240, 120, 1)).toEqual({ widthPx: 240, heightPx: 120, heightMm: 8 });
    const w = thumbWindow({ lineSpacing: 0.5, lines: 11 }, 1, 8);
    expect(w.y1 - w.y0).toBeCloseTo(8, 12);
    expect(w.x1 - w.x0).toBeCloseTo(THUMB_MM.width, 12);
  });
});
