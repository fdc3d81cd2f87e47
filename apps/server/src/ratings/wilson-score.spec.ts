import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import * as ss from 'simple-statistics';
import { wilsonLowerBound, Z_95 } from './wilson-score';

/**
 * Checked against an independent library, not against the closed form itself: the Wilson bound
 * is where the score test just rejects, i.e. (p̂ − L) / √(L(1 − L)/n) = Φ⁻¹(0.975). jStat gives
 * Φ and Φ⁻¹; simple-statistics' standard normal table agrees to its 4 decimals.
 */
describe('wilsonLowerBound', () => {
  it('uses the 97.5 % normal quantile (jStat.normal.inv)', () => {
    expect(Z_95).toBeCloseTo(jStat.normal.inv(0.975, 0, 1), 12);
  });

  it.each([
    [1, 1],
    [9, 10],
    [3, 3],
    [50, 100],
    [1, 20],
    [95, 100],
    [400, 1000],
    [2, 7],
  ])('%i positive of %i inverts the score test at 95 %', (positive, total) => {
    const low = wilsonLowerBound(positive, total);
    const share = positive / total;
    const z = (share - low) / Math.sqrt((low * (1 - low)) / total);
    expect(jStat.normal.cdf(z, 0, 1)).toBeCloseTo(0.975, 10);
    expect(ss.cumulativeStdNormalProbability(z)).toBeCloseTo(0.975, 3);
    expect(low).toBeLessThan(share);
  });

  it('is 0 with no ratings or no positive ones, and ranks many good ratings above one perfect one', () => {
    expect(wilsonLowerBound(0, 0)).toBe(0);
    expect(wilsonLowerBound(0, 12)).toBeCloseTo(0, 12);
    expect(wilsonLowerBound(90, 100)).toBeGreaterThan(wilsonLowerBound(1, 1));
    expect(wilsonLowerBound(3, 3)).toBeGreaterThan(wilsonLowerBound(1, 1));
  });
});
