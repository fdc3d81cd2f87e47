/**
 * Error-bounded simplification (Ramer–Douglas–Peucker) of a sampled graph y(x) at uniform x steps:
 * keeps the first and last samples and every sample needed so that no dropped sample lies farther
 * than `tolerance` (vertically, same unit as y) from the kept polyline.
 */
export function decimateGraph(y: ArrayLike<number>, tolerance: number): Int32Array {
  const n = y.length;
  if (n <= 2) return Int32Array.from({ length: n }, (_, i) => i);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  const stack = [0, n - 1];
  while (stack.length) {
    const b = stack.pop()!;
    const a = stack.pop()!;
    let worst = -1;
    let worstError = tolerance;
    const slope = (y[b] - y[a]) / (b - a);
    for (let i = a + 1; i < b; i++) {
      const error = Math.abs(y[i] - (y[a] + slope * (i - a)));
      if (error > worstError) [worst, worstError] = [i, error];
    }
    if (worst < 0) continue;
    keep[worst] = 1;
    stack.push(a, worst, worst, b);
  }
  let count = 0;
  for (const k of keep) count += k;
  const out = new Int32Array(count);
  for (let i = 0, o = 0; i < n; i++) if (keep[i]) out[o++] = i;
  return out;
}
