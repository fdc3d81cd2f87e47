import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { placementFigures } from './cutter-placement';
import { computeProfile } from './profile';
import { peakToValley } from './cut-plan';

/** A 12-lobe sine read by a point rubber: the nominal cutter path is y(t) = (A/2)·(1 + cos(2π·t/P)) exactly. */
function sineBar(extra: { offset?: number; pivot?: number; amplitude?: number } = {}): Design {
  const amplitude = extra.amplitude ?? 1.5;
  return {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 12, amplitude, phase: 0, wave: { shape: 'sine' } }] },
    rubber: { shape: 'round', radius: 0 },
    motion: { travelPerRev: 120, leverRatio: 1, ...(extra.pivot ? { pivot: { kind: 'rocking', distance: extra.pivot } } : {}) },
    cutter: { ...EXAMPLE_DESIGN.cutter, ...(extra.offset !== undefined ? { offset: extra.offset } : {}) },
    bar: { ...EXAMPLE_DESIGN.bar, length: 60 },
  };
}

/**
 * The closed form of a rocking cut (rotation about a fixed axis): the contact at t along the travel
 * sits at X(t) = t + e − (L + e)(1 − cos θ), Y(t) = (A/2)(1 + e/L)·cos(2πt/P) with sin θ = (A/2)cos(2πt/P)/L.
 * Solve X(t) = x by Newton's method and read Y; the lowest point is set to 0.
 */
function rockingClosedForm(x: number, A: number, P: number, L: number, e: number): number {
  const d = (t: number) => (A / 2) * Math.cos((2 * Math.PI * t) / P);
  const X = (t: number) => t + e - (L + e) * (1 - Math.sqrt(1 - (d(t) / L) ** 2));
  let t = x - e;
  for (let n = 0; n < 30; n++) {
    const slope = (X(t + 1e-7) - X(t - 1e-7)) / 2e-7;
    t -= (X(t) - x) / slope;
  }
  return (A / 2) * (1 + e / L) * (1 + Math.cos((2 * Math.PI * t) / P));
}

describe('cutter placement', () => {
  it('leaves a design without offset or pivot (or with a linear pivot and offset 0) exactly as it was', () => {
    const plain = computeProfile(sineBar());
    const linear = computeProfile({ ...sineBar({ offset: 0 }), motion: { travelPerRev: 120, leverRatio: 1, pivot: { kind: 'linear' } } });
    expect(linear.cutterPath).toEqual(plain.cutterPath);
    expect(linear.barEdge).toEqual(plain.barEdge);
  });

  it('with linear motion an offset only moves the pattern along the bar (closed form: y(x − e))', () => {
    const step = 0.01;
    const plain = computeProfile(sineBar(), { step });
    const moved = computeProfile(sineBar({ offset: 0.5 }), { step });
    for (let i = 200; i < plain.cutterPath.length - 200; i += 37) {
      const [x, y] = moved.cutterPath[i];
      expect(x).toBeCloseTo(plain.cutterPath[i][0], 12);
      expect(y).toBeCloseTo((1.5 / 2) * (1 + Math.cos((2 * Math.PI * (x - 0.5)) / 10)), 9);
    }
    expect(peakToValley(moved.cutterPath)).toBeCloseTo(peakToValley(plain.cutterPath), 6);
  });

  it('rocking: the cutter path matches the arc of the closed form, amplitude × (1 + e/L)', () => {
    const [A, P, L, e] = [1.5, 10, 40, 2];
    const profile = computeProfile(sineBar({ offset: e, pivot: L }), { step: 0.005 });
    let worst = 0;
    for (let i = 0; i < profile.cutterPath.length; i += 13) {
      const [x, y] = profile.cutterPath[i];
      worst = Math.max(worst, Math.abs(y - rockingClosedForm(x, A, P, L, e)));
    }
    // linear interpolation between grid nodes: within slope·h²-sized error, far under 0.1 % of A
    expect(worst).toBeLessThan(1e-4 * A);
    expect(peakToValley(profile.cutterPath)).toBeCloseTo(A * (1 + e / L), 5);
  });

  it('rocking without offset: crests and valleys shift L(1 − cos θ) towards the axis, mid-flanks stay', () => {
    const [A, P, L] = [1.5, 10, 20];
    const profile = computeProfile(sineBar({ pivot: L }), { step: 0.001 });
    const sagitta = L * (1 - Math.sqrt(1 - (A / 2 / L) ** 2)); // 0.01407 mm
    // the crest nearest x = 20 (t = 2P) lies at 20 − sagitta
    const crest = profile.cutterPath.filter(([x]) => x > 19 && x < 21).reduce((a, b) => (b[1] > a[1] ? b : a));
    expect(crest[0]).toBeCloseTo(20 - sagitta, 2);
    expect(placementFigures(sineBar({ pivot: L }), A).lean).toBeCloseTo(sagitta, 12);
    expect(peakToValley(profile.cutterPath)).toBeCloseTo(A, 6);
  });

  it('states the figures: 0.5 mm off centre, pivot 150 mm, amplitude +0.33 %, lean (L + e)(1 − cos θ)', () => {
    const design = sineBar({ offset: 0.5, pivot: 150 });
    const height = peakToValley(computeProfile(design).cutterPath);
    const f = placementFigures(design, height);
    expect(f.amplitudeChange).toBeCloseTo(0.5 / 150, 12);
    expect(f.shift).toBe(0.5);
    const theta = Math.asin(0.75 / 150);
    expect(f.lean).toBeCloseTo(150.5 * (1 - Math.cos(theta)), 7); // 1.88 µm (the sampled height misses the crest by nanometres)
    expect(placementFigures(sineBar(), 1.5)).toEqual({ amplitudeChange: 0, shift: 0, lean: 0 });
  });

  it('works in inches: the offset and the pivot distance are lengths of the file', () => {
    const mm = computeProfile(sineBar({ offset: 0.508, pivot: 50.8 }));
    const inch = computeProfile({
      ...sineBar({ offset: 0.02, pivot: 2, amplitude: 1.5 / 25.4 }),
      units: 'in',
      rosette: { baseRadius: 50 / 25.4, layers: [{ lobes: 12, amplitude: 1.5 / 25.4, phase: 0, wave: { shape: 'sine' } }] },
      motion: { travelPerRev: 120 / 25.4, leverRatio: 1, pivot: { kind: 'rocking', distance: 2 } },
      cutter: { ...EXAMPLE_DESIGN.cutter, diameter: EXAMPLE_DESIGN.cutter.diameter / 25.4, offset: 0.02 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 60 / 25.4, thickness: EXAMPLE_DESIGN.bar.thickness / 25.4 },
      follower: { radius: EXAMPLE_DESIGN.follower.radius / 25.4 },
      study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.45 / 25.4, depth: 0.1 / 25.4 },
      plan: { stepOver: 0.003, cleanup: 0.01, travelSpeed: 4 },
    });
    expect(peakToValley(inch.cutterPath)).toBeCloseTo(peakToValley(mm.cutterPath), 8);
  });
});

describe('cutter placement in words', () => {
  it('says the figures in the file\'s units, and the rule comes with them in the cut plan\'s reminders', async () => {
    const { planCut } = await import('./cut-plan');
    const { placementText } = await import('./cutter-placement');
    const design = sineBar({ offset: 0.5, pivot: 150 });
    expect(placementText(design, 1.505, 'mm')).toBe(
      '0.5 mm off the centre line, rocking 150 mm from its axis: amplitude +0.33 %, crests and valleys lean 0.002 mm towards the axis, the pattern moved 0.5 mm along the bar',
    );
    expect(placementText(sineBar({ offset: -0.5 }), 1.5, 'mm')).toBe('0.5 mm off the centre line, linear motion: the shape unchanged, the pattern moved 0.5 mm back along the bar');
    expect(placementText(sineBar(), 1.5, 'mm')).toBeUndefined();
    const [first] = planCut(design).reminders;
    expect(first).toContain('The profile models the cutter 0.5 mm off the centre line');
    expect(first).toContain('never the cross slide');
    const warning = planCut(design).warnings.find((w) => w.code === 'cutter-off-centre');
    expect(warning?.message).toContain('the cutter is set 0.5 mm off the centre line, rocking 150 mm from its axis');
    expect(warning?.amount).toBe(0.5);
    expect(planCut(sineBar({ pivot: 150 })).warnings.filter((w) => w.code === 'cutter-off-centre')).toEqual([]); // on the line, only rocking
    expect(planCut(sineBar()).reminders[0]).toMatch(/^Set the end mill's centre on the spindle centre line.*never the cross slide/);
  });
});

describe('cutter placement on an endless bar', () => {
  it('moves one period as it moves the bar (the line study reads the same engraved line)', async () => {
    const { periodProfile } = await import('./period-profile');
    const design = sineBar({ offset: 1.25, pivot: 40 });
    const step = 10 / 2000;
    const period = periodProfile(design, step);
    const bar = computeProfile(design, { step });
    // x = i·h on both; the bar is periodic away from its ends
    for (let i = 0; i < period.grid.perPeriod; i += 97) {
      expect(period.cutter[i]).toBeCloseTo(bar.cutterPath[i + 2 * period.grid.perPeriod][1], 9);
    }
  });
});
