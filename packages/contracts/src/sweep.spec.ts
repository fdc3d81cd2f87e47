import { describe, expect, it } from 'vitest';
import { candidateDesign, candidateTitle, parseDesign, sweepCandidates, sweepCountProblem, sweepCountText, type SweepChoices } from './index';
import { EXAMPLE_DESIGN } from './design';

const choices: SweepChoices = {
  units: 'in',
  rosettes: { by: 'tags', tags: ['Fine'] },
  rubbers: [{ shape: 'round', radius: 0.04 }, { shape: 'flat', width: 0.125 }],
  travels: [{ travelPerRev: 4, leverRatio: 1 }, { name: 'Six', travelPerRev: 6, leverRatio: 1.5 }],
  cutters: [{ diameter: 0.1875, flutes: 2 }],
  follower: { radius: 0.09375 },
  barLength: 6,
  study: { lineSpacing: 0.018, lines: 40, schedules: [{ kind: 'alternate' }, { kind: 'none' }], vAngle: 120, depth: 0.004 },
};
const rack = [
  { id: 'a', name: 'Sine 24', units: 'mm' as const, rosette: EXAMPLE_DESIGN.rosette, tags: ['fine'] },
  { id: 'b', name: 'Bold 8', units: 'mm' as const, rosette: EXAMPLE_DESIGN.rosette, tags: ['bold'] },
  { id: 'c', name: 'Fine 36', units: 'mm' as const, rosette: EXAMPLE_DESIGN.rosette, tags: ['FINE', 'sine'] },
];

describe('the sweep contract', () => {
  it('lists the candidates in the grid’s order with their keys, deterministically', () => {
    const list = sweepCandidates(choices, rack);
    expect(list).toHaveLength(2 * 2 * 2 * 1);
    expect(list.map((c) => Object.values(c.key).join(':'))).toEqual(['a:0:0:0', 'a:0:1:0', 'a:1:0:0', 'a:1:1:0', 'c:0:0:0', 'c:0:1:0', 'c:1:0:0', 'c:1:1:0']);
    expect(sweepCandidates(choices, rack)).toEqual(list);
    expect(sweepCandidates({ ...choices, rosettes: { by: 'picked', ids: ['b'] } }, rack).map((c) => c.key.rosetteId)).toEqual(['b', 'b', 'b', 'b']);
  });

  it('makes valid design files, converting a millimetre rosette to the sweep’s inches exactly (25.4 mm to the inch)', () => {
    const { candidate } = sweepCandidates(choices, rack)[3];
    const design = candidateDesign(candidate);
    expect(parseDesign(design).ok).toBe(true);
    expect(design.units).toBe('in');
    expect(design.rosette.baseRadius).toBe(50 / 25.4);
    expect(design.rosette.layers[0].amplitude).toBe(1.5 / 25.4);
    expect(design.motion).toEqual({ travelPerRev: 6, leverRatio: 1.5 });
    expect(design.bar.material).toBe('a2');
    expect(candidateTitle(candidate)).toBe('Sine 24 · flat 0.125 in · Six');
  });

  it('says the count and refuses more than 5 000 bars, saying how to narrow it', () => {
    expect(sweepCountText({ rubbers: [1, 2], travels: [1, 2, 3], cutters: [1] } as never, 36)).toBe('36 rosettes × 2 rubbers × 3 travels × 1 cutter = 216 bars');
    expect(sweepCountProblem({ rubbers: [1, 2], travels: [1, 2, 3], cutters: [1] } as never, 36)).toBeUndefined();
    expect(sweepCountProblem({ rubbers: [1, 2], travels: [1, 2, 3], cutters: [1, 2, 3, 4, 5] } as never, 200)).toMatch(/= 6000 bars: a sweep takes at most 5 000; narrow it/);
  });
});
