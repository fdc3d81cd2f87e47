/**
 * The Bradley–Terry model, P(i beats j) = γi / (γi + γj), fitted by maximum likelihood with the MM
 * algorithm of D. R. Hunter, "MM algorithms for generalized Bradley–Terry models", Annals of
 * Statistics 32(1), 2004, eq. (3):
 *
 *   γi ← Wi / Σ_{j≠i} nij / (γi + γj)
 *
 * where Wi is i's number of wins and nij the number of comparisons of i with j. A tie counts half a
 * win to each side. The strengths are normalised to sum to 1 after every step (the likelihood does
 * not change under scaling). An item that never won has the maximum at γ = 0 and is held there; the
 * fit exists and is unique when every item both wins and loses within a connected comparison graph
 * (Hunter's Assumption 1); otherwise the steps still increase the likelihood and stop at the cap.
 */
export interface PairResult {
  /** Indices of the two items. */
  i: number;
  j: number;
  /** 1: i won, 0: j won, 0.5: a tie. */
  scoreI: number;
}

export interface BradleyTerryFit {
  /** Strengths, summing to 1 (all equal when nothing was compared). */
  strengths: number[];
  /** Wins of each item, ties counting half. */
  wins: number[];
  comparisons: number[];
  iterations: number;
  converged: boolean;
}

export interface FitOptions {
  maxIterations?: number;
  /** Stop when no strength changes by more than this, relative to the largest. */
  tolerance?: number;
}

/** Fits the strengths of `n` items to pairwise results. Pure. */
export function fitBradleyTerry(n: number, results: readonly PairResult[], options: FitOptions = {}): BradleyTerryFit {
  const maxIterations = options.maxIterations ?? 10_000;
  const tolerance = options.tolerance ?? 1e-12;
  const wins = new Array<number>(n).fill(0);
  const comparisons = new Array<number>(n).fill(0);
  const pairs = new Map<number, { i: number; j: number; count: number }>();
  for (const r of results) {
    if (r.i === r.j || r.i < 0 || r.j < 0 || r.i >= n || r.j >= n) throw new RangeError(`pair (${r.i}, ${r.j}) is not two of the ${n} items`);
    wins[r.i] += r.scoreI;
    wins[r.j] += 1 - r.scoreI;
    comparisons[r.i]++;
    comparisons[r.j]++;
    const [i, j] = r.i < r.j ? [r.i, r.j] : [r.j, r.i];
    const key = i * n + j;
    const pair = pairs.get(key) ?? { i, j, count: 0 };
    pair.count++;
    pairs.set(key, pair);
  }
  let gamma = new Array<number>(n).fill(1 / n);
  if (results.length === 0) return { strengths: gamma, wins, comparisons, iterations: 0, converged: true };
  const list = [...pairs.values()];
  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations && !converged) {
    iterations++;
    const denominator = new Array<number>(n).fill(0);
    for (const { i, j, count } of list) {
      const share = count / (gamma[i] + gamma[j]);
      denominator[i] += share;
      denominator[j] += share;
    }
    const next = gamma.map((g, i) => (wins[i] === 0 || denominator[i] === 0 ? (comparisons[i] === 0 ? g : 0) : wins[i] / denominator[i]));
    const total = next.reduce((s, g) => s + g, 0);
    for (let i = 0; i < n; i++) next[i] /= total;
    let change = 0;
    let largest = 0;
    for (let i = 0; i < n; i++) {
      change = Math.max(change, Math.abs(next[i] - gamma[i]));
      largest = Math.max(largest, next[i]);
    }
    gamma = next;
    converged = change <= tolerance * largest;
  }
  return { strengths: gamma, wins, comparisons, iterations, converged };
}

/** The log-likelihood of strengths given the results (ties as half a win each): Σ s·log(γi/(γi+γj)) + (1−s)·log(γj/(γi+γj)). */
export function bradleyTerryLogLikelihood(strengths: readonly number[], results: readonly PairResult[]): number {
  let sum = 0;
  for (const { i, j, scoreI } of results) {
    const both = strengths[i] + strengths[j];
    if (scoreI > 0) sum += scoreI * Math.log(strengths[i] / both);
    if (scoreI < 1) sum += (1 - scoreI) * Math.log(strengths[j] / both);
  }
  return sum;
}
