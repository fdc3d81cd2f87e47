/**
 * Exact envelopes of equal discs centred on a uniformly sampled curve, in O(n).
 *
 * The lower envelope (erosion by a disc of radius r) is e_i = min over |x_i − x_j| ≤ r of
 * y_j − √(r² − (x_i − x_j)²): the lower envelope of "cups", the bottom half-circles of the discs.
 * Two cups of equal radius with centres x_a < x_q cross at most once, q below a from the crossing on
 * (their difference is monotone where both exist; a ends first, q starts later), so the envelope is
 * built like the lower envelope of parabolas in a distance transform: a stack of cups with the x from
 * which each is lowest, each cup pushed and popped at most once. The crossing is the lower
 * intersection point of the two circles, or an end of their common span, taken as the first whole node
 * from which the later cup is lower (a cup reaches ⌊r/step⌋ nodes each way; positions rounded far along
 * the curve once handed a node a cup ending a hair short of it). Evaluating the envelope at
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
  const reach = Math.floor(rr); // a cup reaches the nodes within this many samples of its centre
  const scale = sign / step; // heights in samples, flipped for the upper envelope
  const stack = new Int32Array(n);
  // The first node at which each cup on the stack is the lowest; whole nodes, so no rounding of a
  // position far along the curve can hand a node to a cup that does not reach it.
  const from = new Float64Array(n + 1);
  let top = 0;
  from[0] = -Infinity;
  from[1] = Infinity;
  for (let q = 1; q < n; q++) {
    const yq = y[q] * scale;
    let a = stack[top];
    let s = switchNode(a, y[a] * scale, q, yq, rr, reach);
    while (s <= from[top]) {
      a = stack[--top];
      s = switchNode(a, y[a] * scale, q, yq, rr, reach);
    }
    stack[++top] = q;
    from[top] = s;
    from[top + 1] = Infinity;
  }
  const kernel = depthTable(rr, step);
  const out = new Float64Array(n);
  let k = 0;
  for (let i = 0; i < n; i++) {
    while (from[k + 1] <= i) k++;
    const j = stack[k];
    const d = i > j ? i - j : j - i;
    // The node's own cup always reaches it: a guard, should a near-tie ever leave the node a cup that does not.
    out[i] = d <= reach ? y[j] - sign * kernel[d] : y[i] - sign * kernel[0];
  }
  return out;
}

/**
 * The first node from which the cup centred at q (height yq) is at or below the cup at a < q, in
 * sample units (dx = q − a, radius rr). Worked on whole nodes: a reaches the nodes up to a + reach,
 * q those from q − reach (reach = ⌊rr⌋), and where only one of them reaches, that one is lower.
 */
function switchNode(a: number, ya: number, q: number, yq: number, rr: number, reach: number): number {
  const dx = q - a;
  const first = dx - reach; // relative to a: the first node q reaches
  const afterA = reach + 1; // relative to a: the first node a does not reach
  if (first >= afterA) return a + afterA; // no node both reach: a's run ends, then q's (or a lower cup's)
  const dy = yq - ya;
  const c = Math.sqrt(dx * (2 * rr - dx)); // depth of either cup at the other's near end
  if (dy <= -c) return a + first; // q is already lower where it starts
  if (dy >= c) return a + afterA; // q stays higher until a ends
  const d = Math.sqrt(dx * dx + dy * dy);
  const t = Math.sqrt(Math.max(0, rr * rr - (d * d) / 4));
  // The lower crossing of the two circles, measured from a (small numbers, so its rounding is an ulp
  // of a few samples), rounded up to a node and kept where both cups reach.
  const cross = Math.ceil(dx / 2 + (t * dy) / d);
  return a + Math.min(afterA, Math.max(first, cross));
}

/** √(r² − d²) for d = 0 … ⌊r⌋ samples, in length units. */
function depthTable(rr: number, step: number): Float64Array {
  // A plain loop: Float64Array.from with a mapping function over {length} took as long as the envelope itself.
  const table = new Float64Array(Math.floor(rr) + 1);
  for (let d = 0; d < table.length; d++) table[d] = Math.sqrt(Math.max(0, rr * rr - d * d)) * step;
  return table;
}
