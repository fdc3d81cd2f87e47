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

/** Throws NonFiniteResultError naming `what` unless every value is finite. */
export function assertFinite(what: string, values: ArrayLike<number>): void {
  for (let i = 0; i < values.length; i++) {
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
