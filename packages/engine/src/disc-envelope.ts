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
  const kernel = depthTable(rr, step);
  const cups: Cups = { y, sign, kernel, reach, rr, scale };
  const stack = new Int32Array(n);
  // The first node at which each cup on the stack is the lowest; whole nodes, so no rounding of a
  // position far along the curve can hand a node to a cup that does not reach it.
  const from = new Float64Array(n + 1);
  let top = 0;
  from[0] = -Infinity;
  from[1] = Infinity;
  for (let q = 1; q < n; q++) {
    let a = stack[top];
    let s = switchNode(cups, a, q);
    while (s <= from[top]) {
      a = stack[--top];
      s = switchNode(cups, a, q);
    }
    stack[++top] = q;
    from[top] = s;
    from[top + 1] = Infinity;
  }
  const out = new Float64Array(n);
  let k = 0;
  for (let i = 0; i < n; i++) {
    while (from[k + 1] <= i) k++;
    const j = stack[k];
    // Every switch node lies where both cups reach (switchNode), so the cup owning a node reaches it.
    out[i] = y[j] - sign * kernel[i > j ? i - j : j - i];
  }
  return out;
}

/** The samples and the cup's depths, as the switch between two cups reads them. */
interface Cups {
  y: Float64Array;
  sign: 1 | -1;
  /** √(r² − d²) for d = 0 … reach, in length units: the values the envelope is made of. */
  kernel: Float64Array;
  reach: number;
  rr: number;
  scale: number;
}

/**
 * The first node from which the cup centred at q is at or below the cup at a < q. Worked on whole
 * nodes: a reaches the nodes up to a + reach, q those from q − reach (reach = ⌊rr⌋), and where only
 * one of them reaches, that one is lower. Where both reach, the circles' lower crossing gives the
 * node; next to either end of the common run it is checked on the depth table itself: the crossing's
 * rounding, where a cup stands nearly upright at its edge (rr a few ulps over a whole number), once
 * gave a node the higher cup.
 */
function switchNode(cups: Cups, a: number, q: number): number {
  const { y, scale, rr, reach } = cups;
  const dx = q - a;
  const first = a + dx - reach; // the first node q reaches
  const afterA = a + reach + 1; // the first node a does not reach
  if (first >= afterA) return afterA; // no node both reach: a's run ends, then q's (or a lower cup's)
  const dy = (y[q] - y[a]) * scale; // in samples, flipped for the upper envelope
  const c = Math.sqrt(dx * (2 * rr - dx)); // depth of either cup at the other's near end
  let s: number;
  if (dy <= -c) s = first; // q is already lower where it starts
  else if (dy >= c) s = afterA; // q stays higher until a ends
  else {
    const d2 = dx * dx + dy * dy;
    const t = Math.sqrt(Math.max(0, rr * rr - d2 / 4));
    // Measured from a (small numbers, so its rounding is an ulp of a few samples), rounded up to a node.
    s = a + Math.min(reach + 1, Math.max(dx - reach, Math.ceil(dx / 2 + (t * dy) / Math.sqrt(d2))));
  }
  // Rounding can put the node off by one only next to an end of the common run, where a cup stands
  // nearly upright and a ulp of position is a visible height; inside it the cups cross at a slant.
  if (s > first + 1 && s < afterA - 1) return s;
  while (s > first && qLower(cups, a, q, s - 1)) s--;
  while (s < afterA && !qLower(cups, a, q, s)) s++;
  return s;
}

/** Whether cup q is at or below cup a at node x, both reaching it, by the values the envelope takes. */
function qLower({ y, sign, kernel }: Cups, a: number, q: number, x: number): boolean {
  return sign * y[q] - kernel[q > x ? q - x : x - q] <= sign * y[a] - kernel[x > a ? x - a : a - x];
}

/** √(r² − d²) for d = 0 … ⌊r⌋ samples, in length units. */
function depthTable(rr: number, step: number): Float64Array {
  // A plain loop: Float64Array.from with a mapping function over {length} took as long as the envelope itself.
  const table = new Float64Array(Math.floor(rr) + 1);
  for (let d = 0; d < table.length; d++) table[d] = Math.sqrt(Math.max(0, rr * rr - d * d)) * step;
  return table;
}
