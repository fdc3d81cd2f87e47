import { describe, expect, it } from 'vitest';
import { azimuthOf, lightFrom, shade, wallGradient, wallSlope } from './groove-lighting';

describe('groove lighting', () => {
  it('points the light by azimuth and elevation', () => {
    const l = lightFrom(90, 30);
    expect(l.x).toBeCloseTo(0);
    expect(l.y).toBeCloseTo(Math.cos(Math.PI / 6));
    expect(l.z).toBeCloseTo(0.5);
    expect(Math.hypot(l.x, l.y, l.z)).toBeCloseTo(1);
  });

  it('reads the azimuth of a drag from the centre', () => {
    expect(azimuthOf(1, 0)).toBe(0);
    expect(azimuthOf(0, 1)).toBe(90);
    expect(azimuthOf(-1, -1)).toBe(225);
  });

  it('gives a 120° V-cutter walls at 30° to the plate', () => {
    expect(Math.atan(wallSlope(120)) * (180 / Math.PI)).toBeCloseTo(30);
  });

  it('lights the wall facing the light more than the wall facing away, and the flat in between', () => {
    const light = lightFrom(90, 35); // from the top of the drawing
    const slope = wallSlope(120);
    // Above the line (σ = +1) the wall climbs out of the groove towards +y, so it faces −y: away from the light.
    const [gxA, gyA] = wallGradient(1, 0, slope);
    const [gxB, gyB] = wallGradient(-1, 0, slope);
    const facingAway = shade(gxA, gyA, light);
    const facing = shade(gxB, gyB, light);
    const flat = shade(0, 0, light);
    expect(facing).toBeGreaterThan(flat);
    expect(flat).toBeGreaterThan(facingAway);
  });

  it('is symmetric: swapping the light side swaps the walls', () => {
    const slope = wallSlope(90);
    const [gx, gy] = wallGradient(1, 0.2, slope);
    const [hx, hy] = wallGradient(-1, 0.2, slope);
    expect(shade(gx, gy, lightFrom(70, 40))).toBeCloseTo(shade(hx, hy, lightFrom(250, 40)));
  });

  it('stays between 0 and 1, never below the ambient light', () => {
    for (let az = 0; az < 360; az += 45) {
      const v = shade(3, -2, lightFrom(az, 10));
      expect(v).toBeGreaterThanOrEqual(0.12);
      expect(v).toBeLessThanOrEqual(1);
    }
  });
});
