import type { EngineWarning } from './types';

/**
 * The last check on a result: every number the engine hands out is finite, or the computation
 * fails here with a clear error naming the figure, never a NaN, an Infinity or a JSON null further on.
 */
export class NonFiniteResultError extends Error {
  constructor(what: string, value: number) {
    super(`the engine could not compute a finite ${what} for this design (got ${value}); please report the design file`);
    this.name = 'NonFiniteResultError';
  }
}

/** Throws NonFiniteResultError naming `what` unless every value is finite (of values[from … to − 1] when given). */
export function assertFinite(what: string, values: ArrayLike<number>, from = 0, to = values.length): void {
  if (values instanceof Float64Array && allFinite(values, from, to)) return;
  for (let i = from; i < to; i++) {
    if (!Number.isFinite(values[i])) throw new NonFiniteResultError(values.length > 1 ? `${what} (point ${i})` : what, values[i]);
  }
}

/** Warnings' places and amounts must be finite too. */
export function assertFiniteWarnings(warnings: readonly EngineWarning[]): void {
  for (const w of warnings) {
    if (w.amount !== undefined) assertFinite(`${w.code} warning amount`, [w.amount]);
    if (w.at) assertFinite(`${w.code} warning place`, [w.at.xFrom, w.at.xTo]);
  }
}

/**
 * x·0 is 0 for every finite x and NaN for NaN and ±Infinity: one sum over a path's samples tells
 * whether to look for the culprit. Typed arrays only, so the loop stays monomorphic (the profile's
 * four paths were a tenth of its time when read through ArrayLike with the one-value checks).
 */
function allFinite(values: Float64Array, from: number, to: number): boolean {
  // Four sums, so that each addition need not wait for the one before.
  let [a, b, c, d] = [0, 0, 0, 0];
  const n = to;
  let i = from;
  for (; i + 3 < n; i += 4) {
    a += values[i] * 0;
    b += values[i + 1] * 0;
    c += values[i + 2] * 0;
    d += values[i + 3] * 0;
  }
  for (; i < n; i++) a += values[i] * 0;
  return a + b + c + d === 0;
}
