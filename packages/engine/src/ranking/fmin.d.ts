// fmin ships no types: the part the Bradley–Terry check uses.
declare module 'fmin' {
  export function conjugateGradient(
    f: (x: number[], gradient: number[]) => number,
    initial: number[],
    params?: { maxIterations?: number },
  ): { x: number[]; fx: number; fxprime: number[] };
  export function nelderMead(f: (x: number[]) => number, initial: number[], params?: { maxIterations?: number; minErrorDelta?: number }): { x: number[]; fx: number };
}
