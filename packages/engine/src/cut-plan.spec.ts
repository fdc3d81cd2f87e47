import { EXAMPLE_DESIGN, MM_PER_INCH, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { LEAD_CLEARANCE_MM, peakToValley, planCut, RETURN_SPEED_FACTOR } from './cut-plan';
import { withMaterialDefaults } from './materials';
import { spindleRpm } from './spindle-speed';
import { handMadeProfile } from './testing/hand-made-profile';

const demoProfile = handMadeProfile(EXAMPLE_DESIGN);

function design(patch: (d: Design) => void): Design {
  const copy = structuredClone(EXAMPLE_DESIGN);
  patch(copy);
  return copy;
}

/** The same bar in inches: every length divided by 25.4 (inch = 25.4 mm exactly, NIST). */
function inInches(d: Design): Design {
  const i = (mm: number) => mm / MM_PER_INCH;
  return {
    ...d,
    units: 'in',
    rosette: { baseRadius: i(d.rosette.baseRadius), layers: d.rosette.layers.map((l) => ({ ...l, amplitude: i(l.amplitude) })) },
    rubber: d.rubber.shape === 'round' ? { shape: 'round', radius: i(d.rubber.radius) } : { shape: 'flat', width: i(d.rubber.width) },
    motion: { ...d.motion, travelPerRev: i(d.motion.travelPerRev) },
    cutter: { ...d.cutter, diameter: i(d.cutter.diameter) },
    bar: { ...d.bar, length: i(d.bar.length), thickness: i(d.bar.thickness) },
    follower: { radius: i(d.follower.radius) },
    study: { ...d.study, lineSpacing: i(d.study.lineSpacing), depth: i(d.study.depth) },
    plan: { ...d.plan, stepOver: i(d.plan.stepOver), cleanup: i(d.plan.cleanup), travelSpeed: i(d.plan.travelSpeed) },
  };
}

describe('planCut on the demo bar', () => {
  const plan = planCut(EXAMPLE_DESIGN, demoProfile);

  it('takes 30–40 minutes in A2 with a 3/16 in end mill at 0.003 in per pass (common practice)', () => {
    expect(EXAMPLE_DESIGN.cutter.diameter).toBeCloseTo((3 / 16) * MM_PER_INCH, 10);
    expect(plan.stepOver).toBeCloseTo(0.003 * MM_PER_INCH, 10);
    expect(plan.totalMinutes).toBeGreaterThanOrEqual(30);
    expect(plan.totalMinutes).toBeLessThanOrEqual(40);
  });

  it('lands in the same ranges with the engine\'s own profile (common practice)', () => {
    expect(planCut(EXAMPLE_DESIGN).totalMinutes).toBeGreaterThanOrEqual(30);
    expect(planCut(EXAMPLE_DESIGN).totalMinutes).toBeLessThanOrEqual(40);
    const trial = planCut(withMaterialDefaults(EXAMPLE_DESIGN, 'acrylic'));
    expect(trial.totalMinutes).toBeGreaterThanOrEqual(0.5);
    expect(trial.totalMinutes).toBeLessThanOrEqual(1.5);
  });

  it('takes about a minute as an acrylic trial with the acrylic defaults (common practice)', () => {
    const trial = planCut(withMaterialDefaults(EXAMPLE_DESIGN, 'acrylic'), demoProfile);
    expect(trial.passes).toBeLessThanOrEqual(2);
    expect(trial.totalMinutes).toBeGreaterThanOrEqual(0.5);
    expect(trial.totalMinutes).toBeLessThanOrEqual(1.5);
    expect(trial.warnings).toEqual([]);
  });

  it('has depth = bar edge peak-to-valley + clean-up and passes = ⌈depth / step-over⌉', () => {
    expect(plan.depth).toBeCloseTo(peakToValley(demoProfile.barEdge) + 0.25, 12);
    expect(plan.passes).toBe(Math.ceil(plan.depth / plan.stepOver));
  });

  it('times each pass from the bar length plus lead, the travel speed and the return', () => {
    const passLength = 150 + 4.7625 + 2 * LEAD_CLEARANCE_MM;
    expect(plan.minutesPerPass).toBeCloseTo(passLength / 100 + passLength / (RETURN_SPEED_FACTOR * 100), 12);
    expect(plan.totalMinutes).toBeCloseTo(plan.passes * plan.minutesPerPass, 12);
    const fastReturn = planCut(EXAMPLE_DESIGN, demoProfile, { returnSpeed: 5000 });
    expect(fastReturn.minutesPerPass).toBeCloseTo(passLength / 100 + passLength / 5000, 12);
  });

  it('sets RPM = 1000·Vc/(π·D) and feed = rpm × flutes × chip load (machining handbook formulas)', () => {
    expect(plan.rpm).toBeCloseTo((1000 * 61) / (Math.PI * 4.7625), 9);
    expect(plan.feedPerMinute).toBeCloseTo(plan.rpm * 2 * plan.chipLoad, 9);
    expect(plan.feedPerMinute).toBeGreaterThan(90);
  });

  it('raises no warning for the demo bar, and gives A2 heat-treatment notes', () => {
    expect(plan.warnings).toEqual([]);
    expect(plan.heatTreatment?.join(' ')).toMatch(/air-hardening/);
  });

  it('always carries the safety cautions', () => {
    const text = plan.cautions.join(' ').toLowerCase();
    for (const word of ['eye protection', 'gloves', 'loose clothing', 'chips', 'hot work', "supplier's data", 'local rules']) {
      expect(text).toContain(word);
    }
  });

  it('gives the same plan, in mm, for the same bar written in inches', () => {
    const inches = planCut(inInches(EXAMPLE_DESIGN), demoProfile);
    expect(inches.passes).toBe(plan.passes);
    expect(inches.depth).toBeCloseTo(plan.depth, 9);
    expect(inches.rpm).toBeCloseTo(plan.rpm, 6);
    expect(inches.totalMinutes).toBeCloseTo(plan.totalMinutes, 9);
    expect(inches.reminders.join(' ')).toContain('0.003 in');
  });
});

describe('planCut warnings', () => {
  const codes = (d: Design) => planCut(d, demoProfile).warnings.map((w) => w.code);

  it('warns of a pass too deep for the material', () => {
    const plan = planCut(design((d) => (d.plan.stepOver = 0.2)), demoProfile);
    const warning = plan.warnings.find((w) => w.code === 'pass-too-deep');
    expect(warning?.amount).toBeCloseTo(0.2 - 0.0762, 9);
    expect(warning?.message).toContain('0.076 mm');
  });

  it('warns of rubbing when the travel leaves too thin a chip, with the rpm that fixes it', () => {
    const plan = planCut(design((d) => (d.plan.travelSpeed = 20)), demoProfile);
    const warning = plan.warnings.find((w) => w.code === 'rubbing');
    expect(warning?.message).toMatch(new RegExp(`${Math.round(20 / (2 * plan.chipLoad))} rpm`));
  });

  it('warns of too heavy a chip when the travel is far too fast', () => {
    expect(codes(design((d) => (d.plan.travelSpeed = 400)))).toContain('other');
  });

  it('warns that a lever ratio other than 1 puts the cutter off the centre line', () => {
    expect(codes(design((d) => (d.motion.leverRatio = 1.5)))).toContain('cutter-off-centre');
    expect(codes(EXAMPLE_DESIGN)).not.toContain('cutter-off-centre');
  });

  it('notes when acrylic is cut at tool-steel step-overs', () => {
    const plan = planCut(design((d) => (d.bar.material = 'acrylic')), demoProfile);
    expect(plan.warnings.map((w) => w.message).join(' ')).toMatch(/far below/);
    expect(plan.heatTreatment).toBeUndefined();
  });

  it('uses the file\'s surface speed and chip load for a custom material, in the file\'s units', () => {
    const custom = inInches(design((d) => {
      d.bar.material = 'custom';
      d.plan.surfaceSpeed = 30;
      d.plan.chipLoad = 0.02;
    }));
    custom.plan.chipLoad = 0.02 / MM_PER_INCH;
    const plan = planCut(custom, demoProfile);
    expect(plan.rpm).toBeCloseTo(spindleRpm(30, 4.7625), 6);
    expect(plan.chipLoad).toBeCloseTo(0.02, 12);
    expect(plan.warnings.map((w) => w.code)).not.toContain('pass-too-deep');
  });

  it('never returns NaN for extreme but valid inputs', () => {
    const extreme = design((d) => {
      d.cutter.diameter = 0.1;
      d.plan.stepOver = 5;
      d.plan.travelSpeed = 20000;
      d.plan.cleanup = 0;
    });
    const plan = planCut(extreme, { ...demoProfile, barEdge: demoProfile.barEdge.map(([x]) => [x, 0]) });
    for (const value of [plan.depth, plan.passes, plan.totalMinutes, plan.rpm, plan.feedPerMinute, plan.chipLoad]) {
      expect(Number.isFinite(value)).toBe(true);
    }
    expect(plan.passes).toBe(1);
  });
});
