/**
 * Thins a sampled graph for drawing: in each of `buckets` equal steps of x between `from` and `to`
 * it keeps the first, lowest, highest and last sample, in order, so no crest or valley the eye could
 * see at that width is lost. Returns x, y pairs.
 */
export function thinForDrawing(x: ArrayLike<number>, y: ArrayLike<number>, from: number, to: number, buckets: number): Float64Array {
  // At most four samples a bucket, plus the one before the window and the one past it.
  const out = new Float64Array(8 * (buckets + 2));
  let n = 0;
  const width = (to - from) / buckets;
  // x increases: the first sample at or past `from` by halving, then one before it, so the line reaches the window's edge.
  let lo = 0;
  let hi = x.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (x[mid] < from) lo = mid + 1;
    else hi = mid;
  }
  let i = Math.max(0, lo - 1);
  let bucket = NaN;
  let first = -1;
  let low = -1;
  let high = -1;
  let last = -1;
  // No closures in this loop: it runs over every sample of the bar (72 000 for a 150 mm bar) for each path drawn.
  for (; i < x.length; i++) {
    const b = Math.floor((x[i] - from) / width);
    if (b !== bucket) {
      if (first >= 0) n = keepBucket(out, n, x, y, first, low, high, last);
      bucket = b;
      first = low = high = last = i;
    } else {
      const yi = y[i];
      if (yi < y[low]) low = i;
      if (yi > y[high]) high = i;
      last = i;
    }
    if (x[i] > to) break;
  }
  if (first >= 0) n = keepBucket(out, n, x, y, first, low, high, last);
  return out.slice(0, n);
}

/** Writes a bucket's first, lowest, highest and last samples into `out` at `n`, in order, each once; returns the new length. */
function keepBucket(out: Float64Array, n: number, x: ArrayLike<number>, y: ArrayLike<number>, first: number, low: number, high: number, last: number): number {
  const a = low < high ? low : high;
  const b = low < high ? high : low;
  out[n++] = x[first];
  out[n++] = y[first];
  if (a !== first) {
    out[n++] = x[a];
    out[n++] = y[a];
  }
  if (b !== a && b !== first) {
    out[n++] = x[b];
    out[n++] = y[b];
  }
  if (last !== b && last !== a && last !== first) {
    out[n++] = x[last];
    out[n++] = y[last];
  }
  return n;
}

/** Pairs from an interleaved x, y array (the worker's line format), thinned the same way. */
export function thinPairs(xy: Float64Array, from: number, to: number, buckets: number): Float64Array {
  const n = xy.length / 2;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = xy[2 * i];
    y[i] = xy[2 * i + 1];
  }
  return thinForDrawing(x, y, from, to, buckets);
}

/** A linear map from drawing units (mm) to the SVG's viewBox, with y flipped so up is up. */
export interface PlotScale {
  x0: number;
  y1: number;
  sx: number;
  sy: number;
}

/** The SVG `points` of x, y pairs under a scale, at 0.01 of a viewBox unit. */
export function svgPoints(xy: Float64Array, scale: PlotScale): string {
  const parts: string[] = new Array(xy.length / 2);
  for (let i = 0; i < parts.length; i++) {
    const px = (xy[2 * i] - scale.x0) * scale.sx;
    const py = (scale.y1 - xy[2 * i + 1]) * scale.sy;
    parts[i] = `${hundredths(Math.round(px * 100))},${hundredths(Math.round(py * 100))}`;
  }
  return parts.join(' ');
}

/**
 * An integer count of hundredths written as the number it stands for, as String(r / 100) writes it
 * ("12.5", "-0.05", "3"), from integers: writing a fraction is the slow part of drawing thousands of points.
 */
export function hundredths(r: number): string {
  if (!Number.isSafeInteger(r)) return String(r / 100);
  const sign = r < 0 ? '-' : '';
  const a = Math.abs(r);
  const whole = Math.floor(a / 100);
  const frac = a - whole * 100;
  if (frac === 0) return sign + whole;
  if (frac % 10 === 0) return `${sign}${whole}.${frac / 10}`;
  return `${sign}${whole}.${frac < 10 ? '0' : ''}${frac}`;
}

/** Lowest and highest y of x, y pairs whose x lies in [from, to]. */
export function yRange(xy: Float64Array, from = -Infinity, to = Infinity): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < xy.length; i += 2) {
    if (xy[i] < from || xy[i] > to) continue;
    lo = Math.min(lo, xy[i + 1]);
    hi = Math.max(hi, xy[i + 1]);
  }
  return Number.isFinite(lo) ? [lo, hi] : [0, 0];
}
