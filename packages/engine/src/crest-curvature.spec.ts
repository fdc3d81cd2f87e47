import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeProfile } from './profile';

const design = (over: Partial<Design>): Design => ({ ...EXAMPLE_DESIGN, ...over });
const pointRubber = { shape: 'round', radius: 0 } as const;

describe('smallest crest radius from the exact geometry', () => {
  // Closed form (calculus): ρ = (1 + y'²)^{3/2} / |y''|; for y = (A/2)·cos(2πx/λ) the least is at the crest, 1 / ((A/2)·(2π/λ)²).
  it.each([
    [1.5, 24, 100],
    [2, 4, 200],
    [0.5, 2, 300],
    [3, 7, 90],
  ])('a sine path of peak-to-valley %s, %s lobes over %s mm: the closed form within 1 %%', (amplitude, lobes, travel) => {
    const rc = 0.05;
    const d = design({
      rosette: { baseRadius: 50, layers: [{ lobes, amplitude, phase: 0, wave: { shape: 'sine' } }] },
      rubber: pointRubber,
      motion: { travelPerRev: travel, leverRatio: 1 },
      cutter: { diameter: 2 * rc, flutes: 2 },
    });
    const lambda = travel / lobes;
    const exact = 1 / ((amplitude / 2) * ((2 * Math.PI) / lambda) ** 2);
    const { crest, minRadiusOfCurvature } = computeProfile(d);
    expect(crest!.pathRadius).toBeGreaterThan(exact * 0.99);
    expect(crest!.pathRadius).toBeLessThan(exact * 1.01);
    // The bar edge is the lower parallel curve of the path: its crest is rc less round.
    expect(minRadiusOfCurvature).toBeCloseTo(crest!.pathRadius - rc, 9);
    expect(crest!.corner).toBe(false);
  });

  // Closed form (calculus) for the eccentric circle r(θ) = e·cos θ + √(R0² − e²·sin²θ): r'' = −e − e²/R0 at the
  // crest θ = 0, so the path y = r(2πx/T) has there the radius 1 / (ω²·(e + e²/R0)), ω = 2π/T.
  it.each([
    [5, 50, 100],
    [2, 30, 60],
    [10, 40, 300],
  ])('an eccentric circle of offset %s on a base radius of %s, %s mm a turn: the closed form within 1 %%', (e, r0, travel) => {
    const d = design({
      rosette: { baseRadius: r0, layers: [{ lobes: 1, amplitude: 2 * e, phase: 0, wave: { shape: 'eccentric' } }] },
      rubber: pointRubber,
      motion: { travelPerRev: travel, leverRatio: 1 },
      cutter: { diameter: 0.5, flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: travel },
    });
    const omega = (2 * Math.PI) / travel;
    const exact = 1 / (omega * omega * (e + (e * e) / r0));
    const { crest } = computeProfile(d);
    expect(Math.abs(crest!.pathRadius / exact - 1)).toBeLessThan(0.01);
  });

  it('reports a sharp rosette crest read by a point as a corner, not a small radius', () => {
    const d = design({
      rosette: { baseRadius: 50, layers: [{ lobes: 12, amplitude: 2, phase: 0, wave: { shape: 'pointed' } }] },
      rubber: pointRubber,
      cutter: { diameter: 0.1, flutes: 2 },
    });
    const { crest, minRadiusOfCurvature } = computeProfile(d);
    expect(crest).toMatchObject({ radius: 0, corner: true, pathRadius: 0 });
    expect(minRadiusOfCurvature).toBe(0);
  });

  it('reads the same crest through a round rubber as an arc of the rubber radius about the corner', () => {
    // Closed form: about a corner at radius q the centre runs on s(ψ) = q·cos a + √(ρ² − q²·sin²a), so
    // s''(0) = −q − q²/ρ and the path's crest radius is 1 / (ω²·(q + q²/ρ)).
    const [r0, amplitude, rho, travel] = [40, 2, 2, 120];
    const d = design({
      rosette: { baseRadius: r0, layers: [{ lobes: 8, amplitude, phase: 0, wave: { shape: 'pointed' } }] },
      rubber: { shape: 'round', radius: rho },
      motion: { travelPerRev: travel, leverRatio: 1 },
      cutter: { diameter: 0.2, flutes: 2 },
    });
    const q = r0 + amplitude / 2;
    const omega = (2 * Math.PI) / travel;
    const exact = 1 / (omega * omega * (q + (q * q) / rho));
    const { crest } = computeProfile(d);
    expect(crest!.corner).toBe(false);
    expect(Math.abs(crest!.pathRadius / exact - 1)).toBeLessThan(0.01);
  });

  it('calls a crest of the path tighter than the cutter a sharp ridge on the bar', () => {
    const { crest } = computeProfile(EXAMPLE_DESIGN); // path crest about 0.68 mm, cutter radius 2.38 mm
    expect(crest!.corner).toBe(true);
    expect(crest!.radius).toBe(0);
    expect(crest!.pathRadius).toBeGreaterThan(0.5);
    expect(crest!.pathRadius).toBeLessThan(EXAMPLE_DESIGN.cutter.diameter / 2);
  });

  it('turns the cusps of a scallop into sharp crests on the inverted companion', () => {
    const d = design({ rosette: { baseRadius: 40, layers: [{ lobes: 8, amplitude: 2, phase: 0, wave: { shape: 'scallop' } }] }, rubber: pointRubber });
    expect(computeProfile(d).crest!.corner).toBe(false);
    expect(computeProfile(d, { companion: 'inverted' }).crest!.corner).toBe(true);
  });

  it('gives Infinity and no place for a straight bar', () => {
    const d = design({ rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 0, phase: 0, wave: { shape: 'sine' } }] } });
    expect(computeProfile(d).crest).toEqual({ radius: Infinity, corner: false, x: null, pathRadius: Infinity });
  });
});
