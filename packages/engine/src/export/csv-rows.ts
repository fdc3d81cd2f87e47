/**
 * Rows of a table of columns over one x grid, kept so that reading any column by straight lines
 * between kept rows stays within `tolerance` of every dropped row, in every column at once
 * (Ramer–Douglas–Peucker with the vertical error, the largest over the columns). The first and
 * last rows are always kept. Stretches of `chunk` rows are thinned on their own: on a periodic
 * path the split would otherwise peel one crest at a time (points × crests).
 */
export function keptRows(x: ArrayLike<number>, columns: readonly ArrayLike<number>[], tolerance: number, chunk = 512): Int32Array {
  const n = x.length;
  const keep = new Uint8Array(n);
  if (n === 0) return new Int32Array(0);
  keep[0] = 1;
  keep[n - 1] = 1;
  const stack: number[] = [];
  for (let from = 0; from < n - 1; from += chunk) {
    keep[from] = 1;
    stack.push(from, Math.min(from + chunk, n - 1));
  }
  while (stack.length > 0) {
    const b = stack.pop()!;
    const a = stack.pop()!;
    let worst = -1;
    let worstError = tolerance;
    const span = x[b] - x[a];
    for (let c = 0; c < columns.length; c++) {
      const y = columns[c];
      const ya = y[a];
      const slope = span === 0 ? 0 : (y[b] - ya) / span;
      for (let i = a + 1; i < b; i++) {
        const error = Math.abs(y[i] - (ya + slope * (x[i] - x[a])));
        if (error > worstError) {
          worst = i;
          worstError = error;
        }
      }
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
