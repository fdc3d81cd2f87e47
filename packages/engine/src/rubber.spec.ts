import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeProfile } from './profile';
import { rosetteMinRadius, rosetteRadius, sampleRosette } from './rosette';
import { readRubber, rubberReach } from './rubber';

type Rosette = Design['rosette'];

const ECCENTRIC: Rosette = { baseRadius: 30, layers: [{ lobes: 1, amplitude: 6, phase: 0, wave: { shape: 'eccentric' } }] };
const SAMPLES = 36000; // 0.01° per sample, so the checked angles fall on samples
const D_THETA = (2 * Math.PI) / SAMPLES;

/** Rubber readings at `count` angles from 0, `samples` a revolution. */
function read(rosette: Rosette, rubber: Design['rubber'], count = SAMPLES, samples = SAMPLES) {
  const dTheta = (2 * Math.PI) / samples;
  const pad = rubberReach(rubber, rosetteMinRadius(rosette), dTheta);
  const radii = sampleRosette(rosette, -pad, count + 2 * pad, dTheta);
  const radius = rosetteRadius(rosette);
  return { radii: radii.subarray(pad, pad + count), ...readRubber(radii, pad, rubber, dTheta, (j) => radius((j - pad) * dTheta)) };
}

/** Support function of the convex hull of points, by Andrew's monotone chain (independent of the rubber code). */
function hullSupport(points: [number, number][]): (psi: number) => number {
  const sorted = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const cross = (o: number[], a: number[], b: number[]) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const half = (pts: [number, number][]) => {
    const h: [number, number][] = [];
    for (const p of pts) {
      while (h.length >= 2 && cross(h[h.length - 2], h[h.length - 1], p) <= 0) h.pop();
      h.push(p);
    }
    return h;
  };
  const hull = [...half(sorted), ...half([...sorted].reverse())];
  return (psi) => Math.max(...hull.map(([x, y]) => x * Math.cos(psi) + y * Math.sin(psi)));
}

describe('round rubber', () => {
  it('reads the eccentric rosette exactly: s(θ) = e·cosθ + √((R+ρ)² − e²·sin²θ) (cam design handbooks; derived geometry)', () => {
    // R = 30, e = 3, ρ = 5, at 0, 30, 60, 90, 120, 180°.
    const expected = [38, 37.565919, 36.403438, 34.871192, 33.403438, 32];
    const { s } = read(ECCENTRIC, { shape: 'round', radius: 5 });
    [0, 30, 60, 90, 120, 180].forEach((deg, i) => expect(Math.abs(s[deg * 100] - expected[i])).toBeLessThan(1e-6));
    for (let i = 0; i < SAMPLES; i += 997) {
      const t = i * D_THETA;
      expect(s[i]).toBeCloseTo(3 * Math.cos(t) + Math.sqrt(35 ** 2 - 9 * Math.sin(t) ** 2), 8);
    }
  });

  it('with radius 0 reproduces the rosette exactly, and converges to it as ρ → 0', () => {
    const rosette = EXAMPLE_DESIGN.rosette;
    const point = read(rosette, { shape: 'round', radius: 0 }, 2000);
    expect(Array.from(point.s)).toEqual(Array.from(point.radii));
    const small = read(rosette, { shape: 'round', radius: 1e-3 }, 2000);
    small.s.forEach((v, i) => expect(Math.abs(v - 1e-3 - small.radii[i])).toBeLessThan(1e-4));
  });

  it('never rests below r + ρ and bridges a valley narrower than itself', () => {
    // 6 lobes of 6 mm on R0 = 20: valley radius (R0−a)²/|R0−a−aN²| = 289/|17−108| ≈ 3.2 mm.
    const rosette: Rosette = { baseRadius: 20, layers: [{ lobes: 6, amplitude: 6, phase: 0, wave: { shape: 'sine' } }] };
    const narrow = read(rosette, { shape: 'round', radius: 1 }, 3600, 3600);
    const wide = read(rosette, { shape: 'round', radius: 8 }, 3600, 3600);
    narrow.s.forEach((v, i) => expect(v).toBeGreaterThanOrEqual(narrow.radii[i] + 1 - 1e-12));
    const valley = 3600 / 12; // θ = π/6
    expect(narrow.s[valley]).toBeCloseTo(17 + 1, 9); // reaches the bottom
    expect(wide.s[valley]).toBeGreaterThan(17 + 8 + 0.5); // held well above it
    expect(wide.contact[valley - 1]).toBeLessThan(0); // resting on the valley's two sides
    expect(wide.contact[valley + 1]).toBeGreaterThan(0);
  });
});

describe('flat rubber', () => {
  it('sees the convex hull: with a face wider than the rosette it reads the hull support function', () => {
    const rosette: Rosette = { baseRadius: 20, layers: [{ lobes: 6, amplitude: 6, phase: 0.1, wave: { shape: 'sine' } }] };
    const count = 3600;
    const dTheta = (2 * Math.PI) / count;
    // The hull of a ten times finer sampling stands for the true rosette's hull.
    const fine = sampleRosette(rosette, 0, 10 * count, dTheta / 10);
    const support = hullSupport(Array.from(fine, (r, j) => [r * Math.cos((j * dTheta) / 10), r * Math.sin((j * dTheta) / 10)]));
    const { s } = read(rosette, { shape: 'flat', width: 50 }, count, count);
    for (let i = 0; i < count; i += 50) expect(Math.abs(s[i] - support(i * dTheta))).toBeLessThan(1e-6);
    // and bridges the concave valleys instead of dipping into them
    expect(s[count / 12 - 50]).toBeGreaterThan(17.5);
  });

  it('with a narrow face follows the rosette where it is convex', () => {
    const { s, radii } = read(EXAMPLE_DESIGN.rosette, { shape: 'flat', width: 0.2 }, 3000);
    expect(s[0]).toBeCloseTo(radii[0], 9); // on a crest the face touches the crest itself
    s.forEach((v, i) => expect(v).toBeGreaterThanOrEqual(radii[i] - 1e-12));
  });

  it('never reads above the exact value at the kinks of a clipped wave, and is within 0.1 % of it coarsely, 0.01 % at 2000 samples a lobe', () => {
    // 12 lobes, A = 2 mm, clipped at 0.5: flat tops (arcs of radius R0 + 1) meeting sine flanks in kinks,
    // where a parabola through three samples overshoots; the face often rests on its edge on a flank.
    const clip = 0.5;
    const rosette: Rosette = { baseRadius: 50, layers: [{ lobes: 12, amplitude: 2, phase: 0, wave: { shape: 'flat', clip } }] };
    const rubber = { shape: 'flat' as const, width: 2 };
    const r = (phi: number) => 50 + (2 * (Math.min(Math.cos(12 * phi), clip) + 1)) / (clip + 1) - 1;
    const kinks = [-1, 1].flatMap((side) => Array.from({ length: 12 }, (_, m) => (side * Math.acos(clip) + 2 * Math.PI * m) / 12));
    for (const [perLobe, within] of [[200, 1e-3], [2000, 1e-4]] as const) {
      const samples = perLobe * 12;
      const { s } = read(rosette, rubber, samples / 12, samples); // one lobe: the rest repeats
      let worstOver = -Infinity;
      let worstUnder = 0;
      for (let i = 0; i < s.length; i += perLobe / 200) {
        const exact = exactFlatRubber(r, (2 * Math.PI * i) / samples, rubber.width / 2, kinks);
        worstOver = Math.max(worstOver, s[i] - exact);
        worstUnder = Math.max(worstUnder, exact - s[i]);
      }
      expect(worstOver).toBeLessThanOrEqual(1e-12);
      expect(worstUnder).toBeLessThan(within * 2);
    }
  });
});

describe('rubber warnings', () => {
  const pointed = (radius: number): Design => ({
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'pointed' } }] },
    rubber: { shape: 'round', radius },
  });

  it('reports the rounded crest and the bridged valley of a pointed rosette, by ρ·(sec β − 1)', () => {
    // Flank of the pointed wave: dr/dθ = A·N/π; β is the angle between flank normal and radius.
    const slope = (1.5 * 24) / Math.PI;
    const crestLoss = 1 * (Math.hypot(1, slope / 50.75) - 1);
    const valleyLoss = 1 * (Math.hypot(1, slope / 49.25) - 1);
    const { warnings, period } = computeProfile(pointed(1), { step: 0.005 });
    const cusp = warnings.find((w) => w.code === 'cusp-rounded')!;
    const valley = warnings.find((w) => w.code === 'valley-bridged')!;
    // within 3 %: the formula takes the flanks as straight; in polar they are slightly curved
    expect(Math.abs(cusp.amount! / crestLoss - 1)).toBeLessThan(0.03);
    expect(Math.abs(valley.amount! / valleyLoss - 1)).toBeLessThan(0.03);
    // crests at multiples of the period, valleys half-way between
    const mid = (w: typeof cusp) => (w.at!.xFrom + w.at!.xTo) / 2;
    expect(Math.abs(mid(cusp) / period - Math.round(mid(cusp) / period))).toBeLessThan(0.02);
    expect(Math.abs((mid(valley) / period) % 1 - 0.5)).toBeLessThan(0.02);
    expect(cusp.message).toMatch(/every 4.17 mm/);
  });

  it('reports nothing for a point rubber or a smooth rosette the rubber fits', () => {
    expect(computeProfile(pointed(0), { step: 0.01 }).warnings.filter((w) => w.code === 'cusp-rounded' || w.code === 'valley-bridged')).toEqual([]);
    expect(computeProfile(EXAMPLE_DESIGN, { step: 0.01 }).warnings.filter((w) => w.code === 'cusp-rounded' || w.code === 'valley-bridged')).toEqual([]);
  });
});

/**
 * max r(φ)·cos(φ − ψ) over |r(φ)·sin(φ − ψ)| ≤ half: a dense scan of the face's reach refined by
 * golden-section search, with the wave's kinks (known in closed form) and the face's two edges
 * (bisection on r·sin(φ − ψ) = half) as candidates of their own.
 */
function exactFlatRubber(r: (phi: number) => number, psi: number, half: number, kinks: number[]): number {
  const inside = (phi: number) => Math.abs(r(phi) * Math.sin(phi - psi)) <= half;
  const f = (phi: number) => (inside(phi) ? r(phi) * Math.cos(phi - psi) : -Infinity);
  const reach = Math.asin(half / 48);
  const n = 4000;
  let best = -Infinity;
  let bestPhi = psi;
  for (let j = -n; j <= n; j++) {
    const phi = psi + (reach * j) / n;
    if (f(phi) > best) [best, bestPhi] = [f(phi), phi];
  }
  let [a, b] = [bestPhi - reach / n, bestPhi + reach / n];
  const g = (Math.sqrt(5) - 1) / 2;
  for (let it = 0; it < 80; it++) {
    const c = b - g * (b - a);
    const d = a + g * (b - a);
    if (f(c) > f(d)) b = d;
    else a = c;
  }
  best = Math.max(best, f((a + b) / 2));
  for (const dir of [1, -1]) {
    let j = 0;
    while (j < n && inside(psi + (dir * reach * (j + 1)) / n)) j++;
    let [lo, hi] = [(reach * j) / n, (reach * (j + 1)) / n];
    for (let it = 0; it < 80; it++) {
      const mid = (lo + hi) / 2;
      if (inside(psi + dir * mid)) lo = mid;
      else hi = mid;
    }
    best = Math.max(best, f(psi + dir * lo));
  }
  for (const k of kinks) for (const turn of [-1, 0, 1]) best = Math.max(best, f(k + 2 * Math.PI * turn));
  return best;
}
