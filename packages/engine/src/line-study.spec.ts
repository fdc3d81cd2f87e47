import { EXAMPLE_DESIGN, type Design, type PhaseSchedule } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeLineStudy, computeLineStudyXY, periodLineStudyXY, vGrooveWidth } from './line-study';
import { periodProfile } from './period-profile';
import { linePhase } from './phase-schedule';
import { computeProfile, invertedProfile } from './profile';
import type { Point } from './types';

/** Height of a polyline at x, by linear interpolation. */
function heightAt(points: Point[], x: number): number {
  let k = 1;
  while (k < points.length - 1 && points[k][0] < x) k++;
  const [x0, y0] = points[k - 1];
  const [x1, y1] = points[k];
  return y0 + ((x - x0) / (x1 - x0)) * (y1 - y0);
}

function withSchedule(schedule: PhaseSchedule, patch: Partial<Design> = {}): Design {
  return { ...EXAMPLE_DESIGN, ...patch, study: { ...EXAMPLE_DESIGN.study, schedule, lines: 12 } };
}

/** A lopsided wave (sin t + 0.45·sin 2t, a sawtooth-like lean), so that mirroring and shifting differ. */
const LOPSIDED: Partial<Design> = {
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'fourier', terms: [{ k: 1, a: 0, b: 1 }, { k: 2, a: 0, b: 0.45 }] } }] },
};

describe('V-groove width', () => {
  it('is w = 2·d·tan(α/2) (V-cutter geometry, common practice)', () => {
    expect(vGrooveWidth(0.1, 120)).toBeCloseTo(0.2 * Math.sqrt(3), 12);
    expect(vGrooveWidth(0.25, 90)).toBeCloseTo(0.5, 12);
    expect(vGrooveWidth(0, 60)).toBe(0);
    expect(computeLineStudy(EXAMPLE_DESIGN).width).toBeCloseTo(0.2 * Math.sqrt(3), 12);
  });
});

describe('phase schedules', () => {
  it('give the phase of line j as a fraction of the period', () => {
    const phases = (s: PhaseSchedule) => Array.from({ length: 10 }, (_, j) => linePhase(s, j));
    expect(phases({ kind: 'none' })).toEqual(new Array(10).fill(0));
    expect(phases({ kind: 'alternate' })).toEqual([0, 0.5, 0, 0.5, 0, 0.5, 0, 0.5, 0, 0.5]);
    expect(phases({ kind: 'ramp', steps: 4 })).toEqual([0, 0.125, 0.25, 0.375, 0.5, 0.375, 0.25, 0.125, 0, 0.125]);
    expect(phases({ kind: 'twist', step: 0.1 })[7]).toBeCloseTo(0.7, 12);
    expect(phases({ kind: 'list', phases: [0, 0.2, 0.7] })).toEqual([0, 0.2, 0.7, 0, 0.2, 0.7, 0, 0.2, 0.7, 0]);
    const sine = phases({ kind: 'sine', period: 8, depth: 0.3 });
    expect(sine[2]).toBeCloseTo(0.3, 12);
    expect(sine[6]).toBeCloseTo(-0.3, 12);
  });
});

describe('computeLineStudy', () => {
  it('lays the lines at the spacing, as long as the bar, each from x = 0 to the bar length', () => {
    const study = computeLineStudy(withSchedule({ kind: 'none' }));
    expect(study.spacing).toBe(0.45);
    expect(study.length).toBe(150);
    expect(study.lines).toHaveLength(12);
    study.lines.forEach((line, j) => {
      expect(line.index).toBe(j);
      expect(line.points[0][0]).toBe(0);
      expect(line.points[line.points.length - 1][0]).toBe(150);
      for (let k = 1; k < line.points.length; k++) expect(line.points[k][0]).toBeGreaterThan(line.points[k - 1][0]);
      for (const x of [3.3, 70.1, 149]) expect(heightAt(line.points, x) - j * 0.45).toBeCloseTo(heightAt(study.lines[0].points, x), 9);
    });
  });

  it('engraves the mirror of the follower path: Y_0(x) = F(−x), F from its lowest point', () => {
    const design = withSchedule({ kind: 'none' }, LOPSIDED);
    const study = computeLineStudy(design);
    const profile = computeProfile(design, { step: 0.005 });
    const fMin = Math.min(...profile.followerPath.slice(2000, 26000).map((p) => p[1]));
    const P = profile.period;
    for (const x of [0.7, 1.9, 3.3, 10.2, 50]) {
      const mirrored = heightAt(profile.followerPath, 24 * P - x) - fMin; // F(−x) = F(kP − x)
      expect(Math.abs(heightAt(study.lines[0].points, x) - mirrored)).toBeLessThan(0.02);
    }
    // mirroring is not a shift: the lopsided line does not match the bar read forwards at any phase
    const forward = (x: number, shift: number) => heightAt(profile.followerPath, 40 + x + shift) - fMin;
    const misfit = (shift: number) => Math.max(...[0.3, 0.8, 1.1, 1.7, 2.2, 2.9, 3.6, 4.0].map((x) => Math.abs(heightAt(study.lines[0].points, x) - forward(x, shift))));
    expect(Math.min(...Array.from({ length: 100 }, (_, k) => misfit((k / 100) * P)))).toBeGreaterThan(0.04);
  });

  it('shifts line j by its phase Δ_j: alternate lines half a period apart (barleycorn)', () => {
    const study = computeLineStudy(withSchedule({ kind: 'alternate' }, LOPSIDED));
    const P = 100 / 24;
    expect(study.lines[1].phase).toBe(0.5);
    for (const x of [5, 20.25, 77]) {
      // Y_1(x) = p + F(P/2 − x) = p + Y_0(x − P/2)
      expect(heightAt(study.lines[1].points, x) - 0.45).toBeCloseTo(heightAt(study.lines[0].points, x - P / 2), 2);
      expect(heightAt(study.lines[2].points, x) - 0.9).toBeCloseTo(heightAt(study.lines[0].points, x), 9);
    }
  });

  it('reduces the reported phase to [0, 1) and follows a listed schedule', () => {
    const study = computeLineStudy(withSchedule({ kind: 'list', phases: [0, -0.25, 1.5] }));
    expect(study.lines.slice(0, 4).map((l) => l.phase)).toEqual([0, 0.75, 0.5, 0]);
  });

  it('keeps the shape within its drawing tolerance with a few dozen points a period', () => {
    const design = withSchedule({ kind: 'twist', step: 0.07 });
    const { line, grid } = periodProfile(design, 0.002);
    const study = computeLineStudy(design);
    const height = Math.max(...line);
    const tolerance = Math.max(5e-4, Math.min(0.02, 0.02 * height));
    for (const l of study.lines.slice(0, 4)) {
      const shift = linePhase(design.study.schedule, l.index) * grid.period;
      for (let x = 0.013; x < 150; x += 0.37) {
        const u = shift - x;
        const i = Math.round((u - Math.floor(u / grid.period) * grid.period) / grid.step) % grid.perPeriod;
        expect(Math.abs(heightAt(l.points, x) - l.index * 0.45 - line[i])).toBeLessThan(tolerance + 0.003);
      }
      expect(l.points.length / 36).toBeLessThan(40);
    }
  });

  it('draws 200 lines (the benchmark reports its time)', () => {
    const design = { ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lines: 200 } };
    const profile = computeProfile(design, { step: 0.01 });
    const study = computeLineStudy(design, profile);
    expect(study.lines).toHaveLength(200);
  });

  it('gives the same lines as interleaved x, y pairs (the typed form the views draw)', () => {
    const design = withSchedule({ kind: 'alternate' }, LOPSIDED);
    const profile = computeProfile(design, { step: 0.01 });
    const points = computeLineStudy(design, profile);
    const typed = computeLineStudyXY(design, profile);
    expect(typed.spacing).toBe(points.spacing);
    expect(typed.width).toBe(points.width);
    expect(typed.lines).toHaveLength(points.lines.length);
    typed.lines.forEach((line, j) => {
      expect(line.index).toBe(points.lines[j].index);
      expect(line.phase).toBe(points.lines[j].phase);
      expect(Array.from(line.xy)).toEqual(points.lines[j].points.flat());
    });
  });
});

describe('computeLineStudy from a profile', () => {
  it('draws the study of the profile it is given, a companion included', () => {
    const design = withSchedule({ kind: 'none' }, LOPSIDED);
    const plain = computeLineStudy(design, computeProfile(design, { step: 0.01 }));
    const fromDesign = computeLineStudy(design);
    const inverted = computeLineStudy(design, invertedProfile(design, { step: 0.01 }));
    for (const x of [1, 2.5, 40]) {
      expect(heightAt(plain.lines[0].points, x)).toBeCloseTo(heightAt(fromDesign.lines[0].points, x), 1);
    }
    const differs = [0.5, 1, 1.5, 2, 2.5, 3, 3.5].some((x) => Math.abs(heightAt(inverted.lines[0].points, x) - heightAt(plain.lines[0].points, x)) > 0.1);
    expect(differs).toBe(true);
  });
});

describe('which way the engraved line runs', () => {
  // A lopsided lobe (a Fourier wave with a sine term), so that a line and its mirror differ.
  const lopsided: Design = {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 12, amplitude: 1.5, phase: 0, wave: { shape: 'fourier', terms: [{ k: 1, a: 1, b: 0 }, { k: 2, a: 0, b: 0.4 }] } }] },
    study: { ...EXAMPLE_DESIGN.study, lines: 2, schedule: { kind: 'alternate' } },
  };
  const profile = computeProfile(lopsided);
  const P = profile.period;
  const low = Math.min(...profile.followerPath.slice(1000, 10000).map((p) => p[1]));
  /** The follower path F(u) − its lowest point, read clear of the bar's ends (u taken modulo the period). */
  const F = (u: number) => {
    const local = u - Math.floor(u / P) * P + 10 * P;
    const i = Math.round(local / profile.step);
    return profile.followerPath[i][1] - low;
  };
  const tolerance = 0.02 * 1.5 + 1e-3; // the template is decimated to 2 % of its height

  it('is the mirror of the bar by default: Y_j(x) = j·p + F(Δ_j − x)', () => {
    const study = computeLineStudy(lopsided, profile);
    for (const line of study.lines) {
      for (const [x, y] of line.points.filter((_, i) => i % 7 === 0)) expect(Math.abs(y - line.index * study.spacing - F(line.phase * P - x))).toBeLessThan(tolerance);
    }
  });

  it('runs as the bar when the design says so: Y_j(x) = j·p + F(x + Δ_j)', () => {
    const study = computeLineStudy({ ...lopsided, study: { ...lopsided.study, direction: 'as-bar' } }, profile);
    let apart = 0;
    for (const line of study.lines) {
      for (const [x, y] of line.points.filter((_, i) => i % 7 === 0)) {
        const height = y - line.index * study.spacing;
        expect(Math.abs(height - F(x + line.phase * P))).toBeLessThan(tolerance);
        apart = Math.max(apart, Math.abs(height - F(line.phase * P - x)));
      }
    }
    expect(apart).toBeGreaterThan(0.1); // a lopsided lobe reads differently the other way round
  });
});

describe('the typed walk of a line, against the closed form of a triangle wave', () => {
  // F(u): a triangle of period 3 mm rising 2 mm per mm to 3 mm at u = 1.5 (exact case: the template's
  // vertices are its corners, so every vertex lies on F and the ends interpolate it exactly).
  const F = (u: number) => {
    const w = u - Math.floor(u / 3) * 3;
    return w <= 1.5 ? 2 * w : 2 * (3 - w);
  };
  const triangle = { line: [0, 1, 2, 3, 2, 1], step: 0.5 };
  const flat = { line: [0, 0, 0, 0], step: 0.75 };
  const study = (direction: 'mirrored' | 'as-bar', schedule: PhaseSchedule): Design['study'] => ({ ...EXAMPLE_DESIGN.study, direction, schedule, lines: 2, lineSpacing: 10 });

  for (const direction of ['mirrored', 'as-bar'] as const) {
    for (const length of [0, 0.2, 7.3, 9]) {
      it(`lays Y_j(x) = j·p + F(${direction === 'as-bar' ? 'x + Δ_j' : 'Δ_j − x'}) with a vertex at every corner, ${direction}, length ${length} mm`, () => {
        const s = periodLineStudyXY(study(direction, { kind: 'alternate' }), triangle, length);
        for (const { index, phase, xy } of s.lines) {
          const shift = phase * 3;
          const y = (x: number) => index * 10 + (direction === 'as-bar' ? F(x + shift) : F(shift - x));
          const xs = Array.from({ length: xy.length / 2 }, (_, i) => xy[2 * i]);
          expect(xs[0]).toBe(0);
          expect(xs.at(-1)).toBe(length);
          for (let i = 1; i < xs.length - 1; i++) expect(xs[i]).toBeGreaterThan(xs[i - 1]);
          xs.forEach((x, i) => expect(xy[2 * i + 1]).toBeCloseTo(y(x), 12));
          // Corners of F(±x + c) lie 1.5 mm apart from x ≡ ∓c; each one strictly inside (0, length) is a vertex.
          const first = (((direction === 'as-bar' ? -shift : shift) % 1.5) + 1.5) % 1.5;
          let corners = 0;
          for (let c = first; c < length; c += 1.5) if (c > 0) corners++;
          expect(xs).toHaveLength(2 + corners);
        }
      });
    }
  }

  it('walks a flat line (one segment a period) to its end at the base line', () => {
    const s = periodLineStudyXY(study('as-bar', { kind: 'none' }), flat, 7);
    for (const { index, xy } of s.lines) {
      expect(xy[0]).toBe(0);
      expect(xy.at(-2)).toBe(7);
      for (let i = 1; i < xy.length; i += 2) expect(xy[i]).toBe(index * 10);
    }
  });
});
