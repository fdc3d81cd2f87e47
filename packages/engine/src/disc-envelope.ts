/**
 * Exact envelopes of equal discs centred on a uniformly sampled curve, in O(n).
 *
 * The lower envelope (erosion by a disc of radius r) is e_i = min over |x_i − x_j| ≤ r of
 * y_j − √(r² − (x_i − x_j)²): the lower envelope of "cups", the bottom half-circles of the discs.
 * Two cups of equal radius with centres x_a < x_q cross at most once, q below a from the crossing on
 * (their difference is monotone where both exist; a ends first, q starts later), so the envelope is
 * built like the lower envelope of parabolas in a distance transform: a stack of cups with the x from
 * which each is lowest, each cup pushed and popped at most once. The crossing is the lower
 * intersection point of the two circles, or an end of their common span. Evaluating the envelope at
 * the samples uses a precomputed table of √(r² − d²), so the whole pass costs a few square roots
 * per sample whatever the radius.
 */

/** Erosion by a disc: e_i = min_j [y_j − √(r² − (x_i − x_j)²)] over the samples within r; step is the sample spacing. */
export function lowerDiscEnvelope(y: Float64Array, step: number, radius: number): Float64Array {
  return discEnvelope(y, step, radius, 1);
}

/** Dilation by a disc: F_i = max_j [y_j + √(r² − (x_i − x_j)²)] over the samples within r. */
export function upperDiscEnvelope(y: Float64Array, step: number, radius: number): Float64Array {
  return discEnvelope(y, step, radius, -1);
}

/** The lower envelope of sign·y (sign = 1) or the upper envelope of y (sign = −1, by symmetry). */
function discEnvelope(y: Float64Array, step: number, radius: number, sign: 1 | -1): Float64Array {
  const n = y.length;
  if (radius <= 0 || n === 0) return Float64Array.from(y);
  const rr = radius / step; // radius in samples
  const scale = sign / step; // heights in samples, flipped for the upper envelope
  const stack = new Int32Array(n);
  const from = new Float64Array(n + 1);
  let top = 0;
  from[0] = -Infinity;
  from[1] = Infinity;
  for (let q = 1; q < n; q++) {
    const yq = y[q] * scale;
    let a = stack[top];
    let s = switchPoint(a, y[a] * scale, q, yq, rr);
    while (s <= from[top]) {
      a = stack[--top];
      s = switchPoint(a, y[a] * scale, q, yq, rr);
    }
    stack[++top] = q;
    from[top] = s;
    from[top + 1] = Infinity;
  }
  const kernel = depthTable(rr, step);
  const last = kernel.length - 1;
  const out = new Float64Array(n);
  let k = 0;
  for (let i = 0; i < n; i++) {
    while (from[k + 1] < i) k++;
    // The switch points are absolute sample positions, so their rounding grows with the index: one
    // within an ulp of a node can give the node a cup that ends a hair short of it (a radius a hair
    // under a whole number of steps: at node 532, a + rr rounds up to a + 1). So the node takes the
    // lowest of the cups that reach it among the stack's pick, the next cup, and its own cup, which
    // always reaches it; each is a cup of the definition, so the minimum is the envelope.
    let low = sign * y[i] - kernel[0];
    for (let c = k; c <= k + 1 && c <= top; c++) {
      const j = stack[c];
      const d = i > j ? i - j : j - i;
      if (d <= last) {
        const v = sign * y[j] - kernel[d];
        if (v < low) low = v;
      }
    }
    out[i] = sign * low;
  }
  return out;
}

/**
 * The x (in samples) from which the cup centred at q (height yq) is at or below the cup at a < q.
 * Works in sample units: dx = q − a, radius rr.
 */
function switchPoint(a: number, ya: number, q: number, yq: number, rr: number): number {
  const dx = q - a;
  if (dx >= 2 * rr) return a + rr; // the cups do not overlap: a ends, then q is all there is
  const dy = yq - ya;
  const c = Math.sqrt(dx * (2 * rr - dx)); // depth of either cup at the other's near end
  if (dy <= -c) return q - rr; // q is already lower where it starts
  if (dy >= c) return a + rr; // q stays higher until a ends
  const d2 = dx * dx + dy * dy;
  const d = Math.sqrt(d2);
  const t = Math.sqrt(Math.max(0, rr * rr - d2 / 4));
  return a + dx / 2 + (t * dy) / d;
}

/** √(r² − d²) for d = 0 … ⌊r⌋ samples, in length units. */
function depthTable(rr: number, step: number): Float64Array {
  // A plain loop: Float64Array.from with a mapping function over {length} took as long as the envelope itself.
  const table = new Float64Array(Math.floor(rr) + 1);
  for (let d = 0; d < table.length; d++) table[d] = Math.sqrt(Math.max(0, rr * rr - d * d)) * step;
  return table;
}
