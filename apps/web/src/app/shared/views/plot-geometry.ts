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
  let i = 0;
  while (i < x.length && x[i] < from) i++;
  if (i > 0) i--; // one sample before the window, so the line reaches its edge
  let bucket = NaN;
  let first = -1;
  let low = -1;
  let high = -1;
  let last = -1;
  const keep = (k: number) => {
    out[n++] = x[k];
    out[n++] = y[k];
  };
  // The bucket's first, lowest, highest and last samples, in order, each once (no allocation: this runs per bucket).
  const flush = () => {
    if (first < 0) return;
    const [a, b] = low < high ? [low, high] : [high, low];
    keep(first);
    if (a !== first) keep(a);
    if (b !== a && b !== first) keep(b);
    if (last !== b && last !== a && last !== first) keep(last);
  };
  for (; i < x.length; i++) {
    const b = Math.floor((x[i] - from) / width);
    if (b !== bucket) {
      flush();
      bucket = b;
      first = low = high = last = i;
    } else {
      if (y[i] < y[low]) low = i;
      if (y[i] > y[high]) high = i;
      last = i;
    }
    if (x[i] > to) break;
  }
  flush();
  return out.slice(0, n);
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
    parts[i] = `${Math.round(px * 100) / 100},${Math.round(py * 100) / 100}`;
  }
  return parts.join(' ');
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
