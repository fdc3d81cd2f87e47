import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeLineStudy } from '../line-study';
import type { Point } from '../types';
import { computeHeightField, MIXED_PIXEL, sampleDepths } from './height-field';
import { BLINN_PHONG, METAL_COLOURS, shadeHeightField, srgbByte, srgbByteByTable } from './surface-shading';

const straight = (y: number, x0 = -5, x1 = 25): { points: Point[] } => ({ points: [[x0, y], [x1, y]] });

describe('the height field of engraved V-grooves', () => {
  it('has the V-groove depth d − |y − Y| / tan(α/2) across a straight line, and 0 beyond the groove', () => {
    // depth 0.1 mm, 90° cutter: walls at 45°, the groove 0.2 mm wide at the surface (2·d·tan(α/2)).
    const field = computeHeightField({ lines: [straight(1)], depth: 0.1, vAngle: 90, window: { x0: 0, x1: 2, y0: 0, y1: 2 }, width: 20, height: 200, supersample: 1 });
    const cols = field.width;
    for (let row = 0; row < field.height; row++) {
      const y = 2 - (row + 0.5) * 0.01;
      const expected = Math.max(0, 0.1 - Math.abs(y - 1));
      expect(sampleDepths(field)[row * cols + 7]).toBeCloseTo(expected, 6);
    }
  });

  it('at a crossing keeps the deeper groove: the depth is the largest of the two grooves', () => {
    // A falling line crossing a straight one: each groove alone, then both.
    const falling: { points: Point[] } = { points: [[0, 2], [2, 0]] };
    const window = { x0: 0, x1: 2, y0: 0, y1: 2 };
    const size = { depth: 0.15, vAngle: 100, window, width: 64, height: 64, supersample: 2 };
    const a = computeHeightField({ ...size, lines: [straight(1)] });
    const b = computeHeightField({ ...size, lines: [falling] });
    const both = computeHeightField({ ...size, lines: [straight(1), falling] });
    const [da, db, dboth] = [sampleDepths(a), sampleDepths(b), sampleDepths(both)];
    let crossing = 0;
    for (let i = 0; i < dboth.length; i++) {
      expect(dboth[i]).toBeCloseTo(Math.max(da[i], db[i]), 6);
      if (da[i] > 0 && db[i] > 0) crossing++;
    }
    expect(crossing).toBeGreaterThan(20);
  });

  it('rounds the outside of a sharp turn as the cone the cutter sweeps there (distance to the vertex)', () => {
    const peak: { points: Point[] } = { points: [[0, 0], [1, 1], [2, 0]] };
    const field = computeHeightField({ lines: [peak], depth: 0.2, vAngle: 90, window: { x0: 0.5, x1: 1.5, y0: 0.5, y1: 1.5 }, width: 100, height: 100, supersample: 1 });
    // Straight above the vertex (1, 1) the nearest line point is the vertex itself.
    const col = 50; // x = 1.005
    for (const y of [1.05, 1.1, 1.15]) {
      const row = Math.floor((1.5 - y) / 0.01);
      const yc = 1.5 - (row + 0.5) * 0.01;
      expect(sampleDepths(field)[row * 100 + col]).toBeCloseTo(Math.max(0, 0.2 - Math.hypot(0.005, yc - 1)), 5);
    }
  });

  it('is the distance to the nearest line, clipped at the groove, on random zigzags (checked by brute force)', () => {
    // Every sample's squared distance against the plain minimum over all segments (point-to-segment
    // distance, closed form): the strips and the vertex sectors together must leave no sample out.
    let seed = 11;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const window = { x0: 0, x1: 2, y0: 0, y1: 2 };
    for (let trial = 0; trial < 12; trial++) {
      const lines = Array.from({ length: 3 }, () => {
        const points: Point[] = [];
        for (let x = -0.3; x < 2.3; x += 0.02 + 0.25 * next()) points.push([x, 2 * next()]);
        return { points };
      });
      const field = computeHeightField({ lines, depth: 0.15, vAngle: 90, window, width: 40, height: 40, supersample: 1 });
      const r2 = 0.15 * 0.15;
      let worst = 0;
      for (let row = 0; row < 40; row++) {
        for (let col = 0; col < 40; col++) {
          const [px, py] = [(col + 0.5) * 0.05, 2 - (row + 0.5) * 0.05];
          let best = r2;
          for (const { points } of lines) {
            for (let i = 0; i + 1 < points.length; i++) {
              const [[ax, ay], [bx, by]] = [points[i], points[i + 1]];
              const t = Math.max(0, Math.min(1, ((px - ax) * (bx - ax) + (py - ay) * (by - ay)) / ((bx - ax) ** 2 + (by - ay) ** 2)));
              best = Math.min(best, (px - ax - t * (bx - ax)) ** 2 + (py - ay - t * (by - ay)) ** 2);
            }
          }
          worst = Math.max(worst, Math.abs(field.dist2[row * 40 + col] - best));
        }
      }
      expect(worst).toBeLessThan(1e-6); // Float32 storage of values up to 0.0225 mm²
    }
  });

  it('gives the same field when it writes over an old one, taking its arrays', () => {
    const window = { x0: 0, x1: 2, y0: 0, y1: 2 };
    const size = { depth: 0.15, vAngle: 100, window, width: 32, height: 32, supersample: 2 };
    const falling: { points: Point[] } = { points: [[0, 2], [2, 0]] };
    const old = computeHeightField({ ...size, lines: [straight(0.5)] });
    const fresh = computeHeightField({ ...size, lines: [straight(1), falling] });
    const reused = computeHeightField({ ...size, lines: [straight(1), falling], reuse: old });
    expect(reused.dist2.buffer).toBe(old.dist2.buffer);
    expect([...reused.dist2]).toEqual([...fresh.dist2]);
    expect([...reused.facet]).toEqual([...fresh.facet]);
    expect([...reused.pixelFacet]).toEqual([...fresh.pixelFacet]);
    expect([...reused.mixed]).toEqual([...fresh.mixed]);
    expect([...reused.mixedFacets]).toEqual([...fresh.mixedFacets]);
    expect(reused.mixed.buffer).toBe(old.mixed.buffer); // its room for edge pixels too
    // A smaller plate writes over the same memory and gives the same field as fresh; a larger one than it holds gets new memory.
    const smallSize = { ...size, width: 30, height: 31 };
    const small = computeHeightField({ ...smallSize, lines: [falling], reuse: reused });
    expect(small.dist2.buffer).toBe(old.dist2.buffer);
    const smallFresh = computeHeightField({ ...smallSize, lines: [falling] });
    for (const key of ['dist2', 'facet', 'pixelFacet', 'mixed', 'mixedFacets'] as const) expect([...small[key]]).toEqual([...smallFresh[key]]);
    expect(computeHeightField({ ...size, width: 64, lines: [falling], reuse: small }).dist2.buffer).not.toBe(old.dist2.buffer);
  });

  it('shows a groove narrower than a pixel, by its samples', () => {
    // Pixels 0.1 mm tall; the groove is 0.04 mm wide at the surface (depth 0.02 mm, 90°).
    const field = computeHeightField({ lines: [straight(0.53)], depth: 0.02, vAngle: 90, window: { x0: 0, x1: 1, y0: 0, y1: 1 }, width: 10, height: 10, supersample: 4 });
    const rgba = shadeHeightField(field, { azimuthDeg: 90, elevationDeg: 30 }, 'silver');
    const plate = shadeHeightField(computeHeightField({ lines: [], depth: 0.02, vAngle: 90, window: { x0: 0, x1: 1, y0: 0, y1: 1 }, width: 10, height: 10 }), { azimuthDeg: 90, elevationDeg: 30 }, 'silver');
    const row = 4; // y 0.5 … 0.6
    expect(field.pixelFacet[row * 10 + 3]).toBe(MIXED_PIXEL);
    expect(rgba[4 * (row * 10 + 3)]).not.toBe(plate[4 * (row * 10 + 3)]);
    expect(rgba[4 * (2 * 10 + 3)]).toBe(plate[4 * (2 * 10 + 3)]);
  });
});

describe('Blinn–Phong shading of the field', () => {
  /**
   * A straight line (a rosette of amplitude 0) leaves two plane walls rising at k = 1/tan(α/2):
   * above the line the normal is (0, −k, 1)/√(1 + k²), below it (0, k, 1)/√(1 + k²). In closed form,
   * with the light l = (cos e·cos a, cos e·sin a, sin e) and h = (l + (0,0,1)) / |l + (0,0,1)|:
   * I = ka + kd·max(0, n·l) + ks·max(0, n·h)^p (J. F. Blinn, SIGGRAPH 1977), times the metal's colour.
   */
  it('gives exactly the two wall intensities of the model on a straight-line study', () => {
    const design: Design = { ...EXAMPLE_DESIGN, rosette: { ...EXAMPLE_DESIGN.rosette, layers: [{ ...EXAMPLE_DESIGN.rosette.layers[0], amplitude: 0 }] } };
    const study = computeLineStudy(design);
    const spacing = study.spacing;
    const window = { x0: 60, x1: 61, y0: 2 * spacing - spacing / 2, y1: 2 * spacing + spacing / 2 };
    const { depth, vAngle } = design.study; // 0.1 mm, 120°
    const field = computeHeightField({ lines: study.lines, depth, vAngle, window, width: 4, height: 90 });
    const light = { azimuthDeg: 70, elevationDeg: 35 };
    const rgba = shadeHeightField(field, light, 'gold');

    const k = 1 / Math.tan((vAngle * Math.PI) / 360);
    const e = (35 * Math.PI) / 180;
    const a = (70 * Math.PI) / 180;
    const l = [Math.cos(e) * Math.cos(a), Math.cos(e) * Math.sin(a), Math.sin(e)];
    const hl = Math.hypot(l[0], l[1], l[2] + 1);
    const intensity = (ny: number) => {
      const n = [0, ny / Math.sqrt(1 + k * k), 1 / Math.sqrt(1 + k * k)];
      const nl = n[1] * l[1] + n[2] * l[2];
      const nh = Math.max(0, (n[1] * l[1] + n[2] * (l[2] + 1)) / hl);
      return BLINN_PHONG.ambient + BLINN_PHONG.diffuse * Math.max(0, nl) + (nl > 0 ? BLINN_PHONG.specular * nh ** BLINN_PHONG.exponent : 0);
    };
    const colour = (i: number) => METAL_COLOURS.gold.map((c) => srgbByte(c * i));
    const upper = colour(intensity(-k));
    const lower = colour(intensity(k));
    const pixel = (row: number) => [...rgba.subarray(4 * (row * 4 + 1), 4 * (row * 4 + 1) + 3)];
    // The line is at the middle row; the groove is 2·0.1·tan 60° = 0.346 mm wide, 0.45 mm rows span 90 pixels.
    const mmPerRow = spacing / 90;
    const rowAt = (y: number) => Math.floor((window.y1 - y) / mmPerRow);
    const line = 2 * spacing;
    expect(pixel(rowAt(line + 0.1))).toEqual(upper);
    expect(pixel(rowAt(line + 0.05))).toEqual(upper);
    expect(pixel(rowAt(line - 0.05))).toEqual(lower);
    expect(pixel(rowAt(line - 0.1))).toEqual(lower);
    expect(upper).not.toEqual(lower);
  });

  it('reshades without recomputing: the field is unchanged and another light gives other colours', () => {
    const field = computeHeightField({ lines: [straight(1)], depth: 0.1, vAngle: 90, window: { x0: 0, x1: 2, y0: 0, y1: 2 }, width: 40, height: 40 });
    const before = Float32Array.from(field.dist2);
    const one = shadeHeightField(field, { azimuthDeg: 90, elevationDeg: 40 }, 'silver');
    const two = shadeHeightField(field, { azimuthDeg: 270, elevationDeg: 40 }, 'silver');
    expect(field.dist2).toEqual(before);
    expect(one).not.toEqual(two);
    expect(one.length).toBe(40 * 40 * 4);
  });

  it('shades over an earlier picture of the same size to the same bytes as into a new one, and ignores one of another size', () => {
    const field = computeHeightField({ lines: [straight(1), straight(1.3)], depth: 0.1, vAngle: 90, window: { x0: 0, x1: 2, y0: 0, y1: 2 }, width: 40, height: 40 });
    const lightA = { azimuthDeg: 30, elevationDeg: 40 };
    const earlier = shadeHeightField(field, { azimuthDeg: 200, elevationDeg: 20 }, 'gold');
    const over = shadeHeightField(field, lightA, 'silver', earlier);
    expect(over).toBe(earlier);
    expect(over).toEqual(shadeHeightField(field, lightA, 'silver'));
    const small = new Uint8ClampedArray(16);
    expect(shadeHeightField(field, lightA, 'silver', small)).not.toBe(small);
    // A view of a larger buffer (as a plate keeps room for a taller picture), of any byte length.
    const roomy = new Uint8ClampedArray(new ArrayBuffer(40 * 40 * 4 * 1.125 + 3), 0, 40 * 40 * 4);
    expect(shadeHeightField(field, lightA, 'silver', roomy)).toBe(roomy);
    expect(roomy).toEqual(shadeHeightField(field, lightA, 'silver'));
  });
});

describe('sRGB encoding by table', () => {
  it('gives the bytes of the exact encoding (IEC 61966-2-1) for a million linear values and every step', () => {
    let seed = 7;
    const next = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    const differing: number[] = [];
    for (let i = 0; i < 1_000_000; i++) {
      const v = i < 1000 ? i / 999 : next();
      if (srgbByteByTable(v) !== srgbByte(v)) differing.push(v);
    }
    expect(differing).toEqual([]);
    // Half-way between two steps of the byte, on either side of each.
    for (let b = 0; b < 255; b++) {
      for (const v of [(b + 0.45) / 255, (b + 0.55) / 255]) {
        const linear = v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
        expect(srgbByteByTable(linear)).toBe(srgbByte(linear));
      }
    }
    expect([srgbByteByTable(-1), srgbByteByTable(2), srgbByteByTable(Number.NaN)]).toEqual([0, 255, 0]);
  });
});
