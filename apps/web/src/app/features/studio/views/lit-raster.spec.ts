import { describe, expect, it } from 'vitest';
import { lightFrom } from './groove-lighting';
import { renderLit } from './lit-raster';

const frame = { x0: 0, x1: 10, y0: 0, y1: 4, width: 20, height: 40 };
const straight = Float64Array.from([0, 2, 10, 2]); // one level line at y = 2 mm
const base = { lines: [straight], depth: 0.2, vAngle: 90, frame, light: lightFrom(90, 40), dark: [0, 0, 0] as const, bright: [255, 255, 255] as const };
const grey = (img: Uint8ClampedArray, col: number, row: number) => img[4 * (row * frame.width + col)];

describe('renderLit', () => {
  it('fills every pixel, opaque', () => {
    const img = renderLit(base);
    expect(img.length).toBe(20 * 40 * 4);
    for (let p = 3; p < img.length; p += 4) expect(img[p]).toBe(255);
  });

  it('cuts a groove as wide as the cutter makes it, lit on one wall and dark on the other', () => {
    // 90° cutter, 0.2 mm deep: 0.4 mm wide; at 0.1 mm per pixel row the groove spans rows 18 to 21.
    const img = renderLit(base);
    const plate = grey(img, 5, 2);
    const below = grey(img, 5, 21); // below the line: the wall faces up the drawing, towards the light
    const above = grey(img, 5, 18);
    expect(grey(img, 5, 16)).toBe(plate);
    expect(grey(img, 5, 23)).toBe(plate);
    expect(below).toBeGreaterThan(plate);
    expect(above).toBeLessThan(plate);
  });

  it('turns the bright wall dark when the light moves to the other side', () => {
    const lit = renderLit(base);
    const moved = renderLit({ ...base, light: lightFrom(270, 40) });
    expect(grey(moved, 5, 21)).toBeLessThan(grey(lit, 5, 21));
  });

  it('draws a plain plate for a groove of no depth', () => {
    const img = renderLit({ ...base, depth: 0 });
    expect(new Set(Array.from({ length: 800 }, (_, p) => img[4 * p])).size).toBe(1);
  });
});
