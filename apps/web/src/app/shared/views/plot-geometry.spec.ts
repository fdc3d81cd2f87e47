import { describe, expect, it } from 'vitest';
import { hundredths, svgPoints, thinForDrawing, thinPairs, yRange } from './plot-geometry';

describe('thinForDrawing', () => {
  const n = 10_001;
  const x = Float64Array.from({ length: n }, (_, i) => i / 100); // 0 … 100 mm
  const y = Float64Array.from(x, (v) => Math.sin(v * 7)); // crests 0.9 mm apart

  it('keeps at most four samples per bucket', () => {
    const thin = thinForDrawing(x, y, 0, 100, 200);
    expect(thin.length / 2).toBeLessThanOrEqual(4 * 201);
    expect(thin.length / 2).toBeGreaterThan(200);
  });

  it('keeps every crest and valley height', () => {
    const [lo, hi] = yRange(thinForDrawing(x, y, 0, 100, 50));
    const [trueLo, trueHi] = yRange(thinPairs(Float64Array.from([...x].flatMap((v, i) => [v, y[i]])), 0, 100, 1e6));
    expect(lo).toBe(trueLo);
    expect(hi).toBe(trueHi);
  });

  it('keeps x increasing and reaches both edges of a window', () => {
    const thin = thinForDrawing(x, y, 20, 30, 40);
    for (let i = 2; i < thin.length; i += 2) expect(thin[i]).toBeGreaterThanOrEqual(thin[i - 2]);
    expect(thin[0]).toBeLessThanOrEqual(20);
    expect(thin[thin.length - 2]).toBeGreaterThanOrEqual(30);
  });
});

describe('hundredths', () => {
  it('writes a count of hundredths as String(r / 100) does, for every count to ±1 000 and a million others', () => {
    const differing: number[] = [];
    for (let r = -100_000; r <= 100_000; r++) if (hundredths(r) !== String(r / 100)) differing.push(r);
    let seed = 3;
    for (let k = 0; k < 1_000_000; k++) {
      seed = (seed * 1103515245 + 12345) % 2 ** 31;
      const r = seed - 2 ** 30;
      if (hundredths(r) !== String(r / 100)) differing.push(r);
    }
    expect(differing).toEqual([]);
    expect([hundredths(1250), hundredths(-5), hundredths(300), hundredths(-0)]).toEqual(['12.5', '-0.05', '3', '0']);
  });
});

describe('svgPoints', () => {
  it('maps mm into the viewBox with y up', () => {
    expect(svgPoints(Float64Array.from([0, 0, 10, 1]), { x0: 0, y1: 1, sx: 10, sy: 10 })).toBe('0,10 100,0');
  });
});
