import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import 'fmin';
import type * as Fmin from 'fmin';
import { bradleyTerryLogLikelihood, fitBradleyTerry, type PairResult } from './bradley-terry';

// fmin's build is a UMD script under "type": "module": loaded as ESM it exports nothing and sets globalThis.fmin.
const { conjugateGradient } = (globalThis as unknown as { fmin: typeof Fmin }).fmin;

const repeat = (count: number, r: PairResult): PairResult[] => Array.from({ length: count }, () => r);

describe('Bradley–Terry by the MM algorithm', () => {
  it('matches the two-item closed form: γ1 / (γ1 + γ2) = W1 / n (the likelihood W1·log p + W2·log(1 − p) is largest there)', () => {
    // 7 wins, 2 losses and 3 ties: W1 = 7 + 1.5 = 8.5 of n = 12.
    const results = [...repeat(7, { i: 0, j: 1, scoreI: 1 }), ...repeat(2, { i: 1, j: 0, scoreI: 1 }), ...repeat(3, { i: 0, j: 1, scoreI: 0.5 })];
    const fit = fitBradleyTerry(2, results);
    expect(fit.converged).toBe(true);
    expect(fit.strengths[0]).toBeCloseTo(8.5 / 12, 12);
    expect(fit.strengths[1]).toBeCloseTo(3.5 / 12, 12);
    expect(fit.wins).toEqual([8.5, 3.5]);
    expect(fit.comparisons).toEqual([12, 12]);
  });

  it('gives equal strengths when nothing was compared, and 0 to an item that never won', () => {
    expect(fitBradleyTerry(3, []).strengths).toEqual([1 / 3, 1 / 3, 1 / 3]);
    const fit = fitBradleyTerry(3, [{ i: 0, j: 1, scoreI: 0.5 }, { i: 1, j: 2, scoreI: 1 }, { i: 0, j: 2, scoreI: 1 }]);
    expect(fit.strengths[2]).toBe(0);
    expect(fit.strengths[0]).toBeCloseTo(0.5, 6);
  });

  it('finds the same maximum of the log-likelihood as a general-purpose optimizer (fmin, conjugate gradient) on random data', () => {
    const data = fc
      .integer({ min: 3, max: 8 })
      .chain((n) =>
        fc.record({
          n: fc.constant(n),
          truth: fc.array(fc.double({ min: 0.2, max: 5, noNaN: true }), { minLength: n, maxLength: n }),
          counts: fc.array(fc.integer({ min: 0, max: 6 }), { minLength: (n * (n - 1)) / 2, maxLength: (n * (n - 1)) / 2 }),
          draws: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 200, maxLength: 200 }),
        }),
      );
    fc.assert(
      fc.property(data, ({ n, truth, counts, draws }) => {
        const results: PairResult[] = [];
        let d = 0;
        let k = 0;
        for (let i = 0; i < n; i++) {
          for (let j = i + 1; j < n; j++) {
            for (let c = 0; c < counts[k]; c++) {
              const u = draws[d++ % draws.length];
              const p = truth[i] / (truth[i] + truth[j]);
              results.push({ i, j, scoreI: u < 0.1 ? 0.5 : u < 0.1 + 0.9 * p ? 1 : 0 });
            }
            k++;
          }
        }
        // A tie round the ring of items: every item both wins and loses (half) in one connected graph,
        // so the maximum exists and is unique (Hunter 2004, Assumption 1).
        for (let i = 0; i < n; i++) results.push({ i, j: (i + 1) % n, scoreI: 0.5 });
        const fit = fitBradleyTerry(n, results);
        expect(fit.converged).toBe(true);
        // The optimizer works on θ = log γ (unconstrained); ∂ℓ/∂θi = Wi − Σ_j nij·γi/(γi+γj).
        const negLogLikelihood = (theta: number[], gradient: number[]) => {
          const g = theta.map(Math.exp);
          gradient.fill(0);
          for (const { i, j, scoreI } of results) {
            const pi = g[i] / (g[i] + g[j]);
            gradient[i] -= scoreI - pi;
            gradient[j] -= 1 - scoreI - (1 - pi);
          }
          return -bradleyTerryLogLikelihood(g, results);
        };
        const best = conjugateGradient(negLogLikelihood, new Array(n).fill(0), { maxIterations: 2000 });
        const g = best.x.map(Math.exp);
        const total = g.reduce((s, v) => s + v, 0);
        g.forEach((v, i) => expect(Math.abs(v / total - fit.strengths[i])).toBeLessThan(1e-4));
        expect(bradleyTerryLogLikelihood(fit.strengths, results)).toBeGreaterThanOrEqual(-best.fx - 1e-9);
      }),
      { numRuns: 40, seed: 20040101 },
    );
  });
});
