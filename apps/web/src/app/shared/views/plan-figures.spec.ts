import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { planCut } from '@barwright/engine';
import { describe, expect, it } from 'vitest';
import { formatMinutes, planFigures } from './plan-figures';

describe('formatMinutes', () => {
  it('writes times as the shop reads them', () => {
    expect(formatMinutes(0.5)).toBe('30 s');
    expect(formatMinutes(12.4)).toBe('12 min');
    expect(formatMinutes(65)).toBe('1 h 05 min');
  });
});

describe('planFigures', () => {
  it('states every figure with its unit, in the design’s units', () => {
    const plan = planCut(EXAMPLE_DESIGN);
    const mm = planFigures(plan, 'mm');
    expect(mm.find((f) => f.label === 'Passes')?.value).toMatch(/^\d+ at 0\.076 mm$/);
    expect(mm.find((f) => f.label === 'Spindle speed')?.value).toMatch(/rpm$/);
    expect(mm.find((f) => f.label === 'Feed for the chip load')?.value).toMatch(/^\d+(\.\d)? mm\/min$/);
    const inch = planFigures(plan, 'in');
    expect(inch.find((f) => f.label === 'Passes')?.value).toMatch(/ at 0\.003 in$/);
    expect(inch.find((f) => f.label === 'Feed for the chip load')?.value).toMatch(/ in\/min$/);
  });
});
