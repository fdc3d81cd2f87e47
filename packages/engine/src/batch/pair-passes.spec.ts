import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { shownAndOpposite } from '../cut-pair';
import { planCut } from '../cut-plan';
import { profileSamples } from '../profile';
import { pairPasses, passesFor } from './pair-passes';

const edges = (design: Design) => {
  const pair = shownAndOpposite(design);
  return { pair, shownEdge: profileSamples(pair.shown)!.bar, oppositeEdge: profileSamples(pair.opposite)!.bar };
};

describe('pairPasses', () => {
  it('counts the shown blank exactly as the cut plan does', () => {
    const { pair, shownEdge, oppositeEdge } = edges(EXAMPLE_DESIGN);
    const plan = planCut(EXAMPLE_DESIGN, pair.shown);
    const result = pairPasses({ shownEdge, oppositeEdge, cleanup: EXAMPLE_DESIGN.plan.cleanup, stepOver: plan.stepOver, units: 'mm' });
    expect(result.shownPasses).toBe(plan.passes);
    expect(result.shownDepth).toBeCloseTo(plan.depth, 12);
  });

  it('says both are cut in the same passes for a symmetric sine, fed from either side', () => {
    const sine: Design = { ...EXAMPLE_DESIGN, rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] }, rubber: { shape: 'round', radius: 0 } };
    const { shownEdge, oppositeEdge } = edges(sine);
    const result = pairPasses({ shownEdge, oppositeEdge, cleanup: 0.25, stepOver: 0.0762, units: 'mm' });
    expect(result.samePasses).toBe(true);
    expect(result.text).toMatch(/^Both blanks are cut in the same \d+ passes/);
    expect(result.text).toContain('the lower one up and the upper one down');
    // The upper envelope lies a cutter diameter above the lower wherever the path is smooth.
    expect(Math.max(...oppositeEdge.map((y, i) => y - shownEdge[i]))).toBeGreaterThanOrEqual(EXAMPLE_DESIGN.cutter.diameter - 1e-9);
  });

  it('says which blank is withdrawn when the depths need different passes, and when the edges interlock', () => {
    const shownEdge = Float64Array.from([0, 1, 0, 1]);
    const oppositeEdge = Float64Array.from([0.5, 3, 0.5, 3]);
    const result = pairPasses({ shownEdge, oppositeEdge, cleanup: 0, stepOver: 1, units: 'mm' });
    expect([result.shownPasses, result.oppositePasses, result.samePasses]).toEqual([1, 3, false]);
    expect(result.text).toContain('withdraw the shown blank and take the last 2 passes on the other alone');
    expect(result.clearance).toBeCloseTo(-0.5, 12);
    expect(result.text).toContain('interlock by 0.5 mm');
  });

  it('takes at least one pass', () => {
    expect(passesFor(0, 0.1)).toBe(1);
    expect(passesFor(0.3, 0.1)).toBe(3);
  });
});
