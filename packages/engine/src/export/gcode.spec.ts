import { parseStringSync } from 'gcode-parser';
import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { planCut } from '../cut-plan';
import { computeProfile } from '../profile';
import { demoDesign, demoInInches, demoProfile, largestGap, yAt } from '../testing/export-fixtures';
import { passOffset, SAFE_HEIGHT_MM } from './gcode';
import { exportDesign, GCODE_TOLERANCE_MM } from './index';

interface Move {
  motion: 'G0' | 'G1';
  x: number;
  y: number;
  z: number;
  feed: number;
}

/**
 * Reads a program back with gcode-parser (an independent G-code reader from npm) and replays
 * the RS274NGC modal state: motion mode, units, absolute positions, feed, spindle.
 */
function replay(text: string) {
  const state = { motion: 'G0' as 'G0' | 'G1', x: NaN, y: NaN, z: NaN, feed: NaN, units: '', absolute: false, spindle: 0, ended: false };
  const moves: Move[] = [];
  for (const { words } of parseStringSync(text)) {
    let moved = false;
    for (const [letter, value] of words) {
      if (letter === 'G' && (value === 0 || value === 1)) state.motion = value === 0 ? 'G0' : 'G1';
      else if (letter === 'G' && (value === 20 || value === 21)) state.units = value === 20 ? 'in' : 'mm';
      else if (letter === 'G' && value === 90) state.absolute = true;
      else if (letter === 'M' && value === 3) state.spindle = 1;
      else if (letter === 'M' && value === 5) state.spindle = 0;
      else if (letter === 'M' && value === 30) state.ended = true;
      else if (letter === 'S') state.spindle = value;
      else if (letter === 'F') state.feed = value;
      else if (letter === 'X' || letter === 'Y' || letter === 'Z') {
        state[letter.toLowerCase() as 'x' | 'y' | 'z'] = value;
        moved = true;
      }
    }
    if (moved) moves.push({ motion: state.motion, x: state.x, y: state.y, z: state.z, feed: state.feed });
  }
  return { state, moves };
}

/** Splits the feed moves into passes: each pass starts with a plunge in Z. */
function passes(moves: Move[]): Move[][] {
  const result: Move[][] = [];
  for (const move of moves) {
    if (move.motion === 'G0') continue;
    const previous = result.at(-1)?.at(-1);
    if (!previous || previous.z !== move.z || move.x < previous.x) result.push([]);
    result.at(-1)!.push(move);
  }
  return result.map((pass) => pass.slice(1)); // drop the plunge itself
}

describe('G-code export', () => {
  const plan = planCut(demoDesign, demoProfile);

  it('sets mm, absolute coordinates, the spindle speed and ends with M30', async () => {
    const file = await exportDesign(demoDesign, 'gcode', { profile: demoProfile });
    expect(file).toMatchObject({ filename: 'bar.nc', mime: 'text/x-gcode' });
    const { state } = replay(file.content as string);
    expect(state).toMatchObject({ units: 'mm', absolute: true, ended: true, spindle: 0 });
    expect(file.content).toContain(`M3 S${Math.round(plan.rpm)}`);
    expect(file.content).toMatch(/\(CAUTION: Eye protection; no gloves or loose clothing/);
  });

  it('cuts the passes of the cut plan, stepping down by the step-over onto the cutter path', async () => {
    const file = await exportDesign(demoDesign, 'gcode', { profile: demoProfile });
    const cuts = passes(replay(file.content as string).moves);
    expect(cuts).toHaveLength(plan.passes);
    cuts.forEach((pass, i) => {
      const offset = passOffset(plan, i + 1);
      const onBar = pass.filter((m) => m.x >= 0 && m.x <= 150);
      expect(onBar[0].x).toBe(0);
      expect(onBar.at(-1)!.x).toBe(150);
      for (const move of onBar) {
        expect(move.feed).toBeCloseTo(plan.feedPerMinute, 3); // the plan's feed (rpm × flutes × chip load), not the slide's travel
        expect(Math.abs(move.y - offset - yAt(demoProfile.cutterPath, move.x))).toBeLessThan(1e-4);
      }
    });
    expect(passOffset(plan, plan.passes)).toBe(0);
    expect(passOffset(plan, 1) - passOffset(plan, 2)).toBeCloseTo(plan.stepOver, 12);
  });

  it('follows the path to within the chord tolerance between its points', async () => {
    const file = await exportDesign(demoDesign, 'gcode', { profile: demoProfile });
    const last = passes(replay(file.content as string).moves).at(-1)!.map((m): [number, number] => [m.x, m.y]);
    expect(largestGap(demoProfile.cutterPath, last)).toBeLessThan(GCODE_TOLERANCE_MM + 1e-4);
  });

  it('makes rapids only at the safe height, away from the bar', async () => {
    const file = await exportDesign(demoDesign, 'gcode', { profile: demoProfile });
    const { moves } = replay(file.content as string);
    for (const move of moves.filter((m) => m.motion === 'G0')) {
      expect(move.z).toBe(SAFE_HEIGHT_MM);
    }
  });

  it('writes an inch design with G20 and inch coordinates (inch = 25.4 mm, NIST)', async () => {
    const file = await exportDesign(demoInInches(), 'gcode', { profile: demoProfile });
    const { state, moves } = replay(file.content as string);
    expect(state.units).toBe('in');
    const cuts = passes(moves);
    expect(cuts).toHaveLength(plan.passes);
    const final = cuts.at(-1)!.filter((m) => m.x >= 0 && m.x <= 150 / 25.4);
    for (const move of final) {
      expect(Math.abs(move.y - yAt(demoProfile.cutterPath, move.x * 25.4) / 25.4)).toBeLessThan(1e-5);
    }
    expect(final[0].feed).toBeCloseTo(planCut(demoInInches(), demoProfile).feedPerMinute / 25.4, 4);
  });

  it('runs in and out along the pattern, so the ends are cut as the profile shows them', async () => {
    // A 6 mm cutter and a phase that puts a flank at each end: straight leads used to leave up to 0.76 mm there.
    const design: Design = { ...EXAMPLE_DESIGN, rosette: { ...EXAMPLE_DESIGN.rosette, layers: [{ ...EXAMPLE_DESIGN.rosette.layers[0], phase: 0.13 }] }, cutter: { diameter: 6, flutes: 2 } };
    const profile = computeProfile(design);
    const file = await exportDesign(design, 'gcode', { profile });
    const final = passes(replay(file.content as string).moves).at(-1)!;
    const rc = 3;
    const centres: [number, number][] = [];
    const nearEnd = (x: number) => x < 2 * rc || x > design.bar.length - 2 * rc;
    for (let i = 1; i < final.length; i++) {
      const [a, b] = [final[i - 1], final[i]];
      if (!nearEnd(a.x) && !nearEnd(b.x)) continue;
      const steps = Math.max(1, Math.ceil(Math.abs(b.x - a.x) / 0.002));
      for (let k = 0; k <= steps; k++) centres.push([a.x + ((b.x - a.x) * k) / steps, a.y + ((b.y - a.y) * k) / steps]);
    }
    let worst = 0;
    for (const [x, edge] of profile.barEdge.filter((_, i) => i % 4 === 0)) {
      if (x > rc && x < design.bar.length - rc) continue;
      let cut = Infinity;
      for (const [cx, cy] of centres) if (Math.abs(x - cx) <= rc) cut = Math.min(cut, cy - Math.sqrt(rc * rc - (x - cx) ** 2));
      worst = Math.max(worst, Math.abs(cut - edge));
    }
    expect(worst).toBeLessThan(GCODE_TOLERANCE_MM + 0.001); // the chord tolerance, and the replay's own 2 µm steps
  });
});
