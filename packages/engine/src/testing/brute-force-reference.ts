import type { Design } from '@barwright/contracts';

/**
 * A brute-force reference for the profile, written from the geometry alone and sharing no code
 * with src/ (tests compare the engine against it). Millimetre designs only.
 *
 * - Rosette: r(θ) = R0 + Σ (Aᵢ/2)·wᵢ(Nᵢθ + 2π·phaseᵢ), each wave written out again below.
 * - Round rubber of radius ρ: s(ψ) = max over φ of [r(φ)cos(φ−ψ) + √(ρ² − r(φ)² sin²(φ−ψ))]
 *   (the centre of a disc touching the point (r, φ) on the ray ψ); flat rubber of width w:
 *   s(ψ) = max r(φ)cos(φ−ψ) over |r(φ) sin(φ−ψ)| ≤ w/2.
 * - Cutter centre y(x) = k·(s(2πx/T) − min over the bar); bar edge e(x) = min over |x−x'| ≤ rc of
 *   y(x') − √(rc² − (x−x')²); follower F(x) = max over bar points |x−x'| ≤ rf of e(x') + √(rf² − (x−x')²).
 *
 * Every maximum and minimum is taken over a uniform grid fine enough that its own error is far
 * below 0.1 % of the heights: `perCycle` samples per finest feature of the rosette (a lobe ×
 * harmonic, or a measured table's smallest spacing), both along the bar and in angle.
 */
export interface ReferenceProfile {
  x: Float64Array;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
}

const TAU = 2 * Math.PI;

/** Reference paths on a dense grid over the bar [0, length] (mm design). */
export function bruteForceProfile(design: Design, perCycle = 3000): ReferenceProfile {
  const T = design.motion.travelPerRev;
  const L = design.bar.length;
  const rc = design.cutter.diameter / 2;
  const rf = design.follower.radius;
  // Path samples on x = i·h, h dividing the bar's length: i = −cupReach … n + cupReach (the cutter runs past the ends).
  const n = Math.ceil((L * finestCyclesPerRev(design) * perCycle) / T);
  const h = L / n;
  const radius = referenceRadius(design);
  const rMin = design.rosette.baseRadius - design.rosette.layers.reduce((s, l) => s + peakToValley(l) / 2, 0);
  const rubberHalf = design.rubber.shape === 'round' ? design.rubber.radius : design.rubber.width / 2;
  const reachAngle = rubberHalf <= 0 ? 0 : rubberHalf >= rMin ? Math.PI / 2 : Math.asin(rubberHalf / rMin);
  // The rosette is read `fine` times more densely in angle than the path, so that even a small rubber spans 8 readings.
  const dPsi = (TAU * h) / T;
  const fine = rubberHalf > 0 ? Math.min(64, Math.max(1, Math.ceil((8 * dPsi) / reachAngle))) : 1;
  const dPhi = dPsi / fine;
  const reach = Math.ceil(reachAngle / dPhi) + 1;
  const cupReach = Math.ceil(rc / h) + 1;
  const first = -cupReach;
  const count = n + 1 + 2 * cupReach;
  const radii = Float64Array.from({ length: (count - 1) * fine + 1 + 2 * reach }, (_, j) => radius(first * dPsi + (j - reach) * dPhi));
  const s = new Float64Array(count);
  for (let i = 0; i < count; i++) s[i] = rubberAt(radii, i * fine + reach, reach, dPhi, design.rubber);
  if (design.rubber.shape === 'flat') {
    const half = design.rubber.width / 2;
    for (let i = 0; i < count; i++) s[i] = Math.max(s[i], faceEdges(radius, (first + i) * dPsi, half, dPhi, reach));
  }
  let sMin = Infinity;
  for (let i = cupReach; i <= cupReach + n; i++) sMin = Math.min(sMin, s[i]);
  const y = s.map((v) => design.motion.leverRatio * (v - sMin));
  const edgeAll = envelope(y, h, rc, -1);
  const edge = edgeAll.slice(cupReach, cupReach + n + 1);
  const follower = envelope(edge, h, rf, 1);
  return {
    x: Float64Array.from({ length: n + 1 }, (_, i) => (i === n ? L : i * h)),
    cutter: y.slice(cupReach, cupReach + n + 1),
    bar: edge,
    follower,
  };
}

/**
 * The reference's detail loss (mm): the largest departure of the follower path from the reading a
 * flat bar would give, y + (rf − rc), over the bar clear of its ends by rc + rf (where the follower
 * reads cuts the cutter made beyond the bar), with where it happens; 0 when nothing is lost.
 */
export function referenceDetailLoss(ref: ReferenceProfile, design: Design): { amount: number; x: number } {
  const rc = design.cutter.diameter / 2;
  const rf = design.follower.radius;
  const clear = rc + rf;
  const length = ref.x[ref.x.length - 1];
  let amount = 0;
  let at = NaN;
  for (let i = 0; i < ref.x.length; i++) {
    if (ref.x[i] < clear || ref.x[i] > length - clear) continue;
    const departure = Math.abs(ref.follower[i] - (ref.cutter[i] + rf - rc));
    if (departure > amount) [amount, at] = [departure, ref.x[i]];
  }
  return { amount, x: at };
}

/** The reference's value at x by linear interpolation between its dense samples. */
export function referenceAt(x: Float64Array, values: Float64Array, at: number): number {
  const h = x[1] - x[0];
  const i = Math.max(0, Math.min(x.length - 2, Math.floor(at / h)));
  const w = (at - x[i]) / (x[i + 1] - x[i]);
  return values[i] + Math.max(0, Math.min(1, w)) * (values[i + 1] - values[i]);
}

/** Finest features of the rosette per revolution: lobes × (harmonic, or 360° over the table's smallest gap). */
export function finestCyclesPerRev(design: Design): number {
  let finest = 1;
  for (const l of design.rosette.layers) {
    if (!(l.amplitude > 0) && !(l.wave.shape === 'measured')) continue;
    const w = l.wave;
    let per = 1;
    if (w.shape === 'fourier') per = Math.max(...w.terms.map((t) => t.k));
    if (w.shape === 'measured') {
      let gap = 360 - w.points[w.points.length - 1][0] + w.points[0][0];
      for (let j = 1; j < w.points.length; j++) gap = Math.min(gap, w.points[j][0] - w.points[j - 1][0]);
      per = 360 / gap;
    }
    finest = Math.max(finest, l.lobes * per);
  }
  return finest;
}

/** Min (sign −1) or max (sign 1) over |j − i|·h ≤ r of y_j + sign·√(r² − ((j − i)h)²). */
function envelope(y: Float64Array, h: number, r: number, sign: 1 | -1): Float64Array {
  if (!(r > 0)) return Float64Array.from(y);
  const w = Math.floor(r / h);
  const cup = Float64Array.from({ length: w + 1 }, (_, d) => sign * Math.sqrt(Math.max(0, r * r - d * h * (d * h))));
  const out = new Float64Array(y.length);
  for (let i = 0; i < y.length; i++) {
    let best = sign * -Infinity;
    const lo = Math.max(0, i - w);
    const hi = Math.min(y.length - 1, i + w);
    for (let j = lo; j <= hi; j++) {
      const v = y[j] + cup[j > i ? j - i : i - j];
      if (sign > 0 ? v > best : v < best) best = v;
    }
    out[i] = best;
  }
  return out;
}

function rubberAt(radii: Float64Array, centre: number, reach: number, dPhi: number, rubber: Design['rubber']): number {
  let best = -Infinity;
  for (let k = -reach; k <= reach; k++) {
    const r = radii[centre + k];
    const a = k * dPhi;
    const along = r * Math.cos(a);
    const across = r * Math.sin(a);
    if (rubber.shape === 'round') {
      const d = rubber.radius * rubber.radius - across * across;
      if (d >= 0) best = Math.max(best, along + Math.sqrt(d));
    } else if (Math.abs(across) <= rubber.width / 2) {
      best = Math.max(best, along);
    }
  }
  return best;
}

/**
 * A flat face resting on its edge: on each side, the point where r(φ)·|sin(φ − ψ)| reaches w/2,
 * found by bisection between the last grid angle under the face and the next, and its height r·cos.
 */
function faceEdges(radius: (theta: number) => number, psi: number, half: number, dPhi: number, reach: number): number {
  const inside = (a: number) => Math.abs(radius(psi + a) * Math.sin(a)) <= half;
  let best = -Infinity;
  for (const dir of [1, -1]) {
    let k = 0;
    while (k < reach && inside(dir * (k + 1) * dPhi)) k++;
    let [lo, hi] = [k * dPhi, (k + 1) * dPhi];
    for (let n = 0; n < 50; n++) {
      const mid = (lo + hi) / 2;
      if (inside(dir * mid)) lo = mid;
      else hi = mid;
    }
    best = Math.max(best, radius(psi + dir * lo) * Math.cos(lo));
  }
  return best;
}

function peakToValley(layer: Design['rosette']['layers'][number]): number {
  const w = layer.wave as { shape: string; scale?: string; points?: [number, number][] };
  if (w.shape === 'measured' && w.scale === 'as-read' && w.points) {
    const radii = w.points.map((p) => p[1]);
    return Math.max(...radii) - Math.min(...radii);
  }
  return layer.amplitude;
}

/** r(θ) of the rosette, θ in radians. */
export function referenceRadius(design: Design): (theta: number) => number {
  const R0 = design.rosette.baseRadius;
  const layers = design.rosette.layers.map((l) => {
    const phase = TAU * (l.phase - Math.floor(l.phase));
    return { lobes: l.lobes, phase, term: layerTerm(l, R0) };
  });
  return (theta) => layers.reduce((r, l) => r + l.term(l.lobes * theta + l.phase), R0);
}

/** The radius a layer adds at wave angle t. */
function layerTerm(layer: Design['rosette']['layers'][number], R0: number): (t: number) => number {
  const half = layer.amplitude / 2;
  const w = layer.wave;
  const centred = (t: number) => {
    const u = t - TAU * Math.floor(t / TAU); // [0, 2π)
    return u >= Math.PI ? u - TAU : u; // [−π, π)
  };
  switch (w.shape) {
    case 'sine':
      return (t) => half * Math.cos(t);
    case 'pointed':
      return (t) => half * (1 - (2 * Math.abs(centred(t))) / Math.PI);
    case 'flat':
      return (t) => half * ((2 * (Math.min(Math.cos(t), w.clip) + 1)) / (w.clip + 1) - 1);
    case 'scallop': {
      // An arc through the two cusps (u = ±1, height 0) and the crest (u = 0, height a), in units of half a lobe.
      const a = (layer.amplitude * layer.lobes) / (Math.PI * R0);
      if (a >= 1) return (t) => half * (2 * Math.sqrt(Math.max(0, 1 - (centred(t) / Math.PI) ** 2)) - 1);
      const q = (1 + a * a) / (2 * a);
      return (t) => {
        const u = centred(t) / Math.PI;
        return half * ((2 * (a - q + Math.sqrt(q * q - u * u))) / a - 1);
      };
    }
    case 'eccentric':
      // A circle of radius R0 whose centre is e from the axis: r = e·cos θ + √(R0² − e² sin² θ).
      return (t) => half * Math.cos(t) + Math.sqrt(R0 * R0 - half * half * Math.sin(t) ** 2) - R0;
    case 'fourier':
      return scaledToRange(half, (t) => w.terms.reduce((s, { k, a, b }) => s + a * Math.cos(k * t) + b * Math.sin(k * t), 0), 200 * Math.max(...w.terms.map((x) => x.k)));
    case 'measured': {
      const spline = monotoneSpline(w.points.map((p) => (p[0] * Math.PI) / 180), w.points.map((p) => p[1]));
      const radii = w.points.map((p) => p[1]);
      const lo = Math.min(...radii);
      const hi = Math.max(...radii);
      if ((w as { scale?: string }).scale === 'as-read') return (t) => spline(t) - (lo + hi) / 2;
      return (t) => (hi > lo ? half * ((2 * (spline(t) - lo)) / (hi - lo) - 1) : 0);
    }
  }
}

/** f stretched so that its range over a period maps onto [−half, half]; the range by dense sampling and golden-section refinement. */
function scaledToRange(half: number, f: (t: number) => number, samples: number): (t: number) => number {
  const h = TAU / samples;
  let iLo = 0;
  let iHi = 0;
  const v = Float64Array.from({ length: samples }, (_, i) => f(i * h));
  v.forEach((x, i) => {
    if (x < v[iLo]) iLo = i;
    if (x > v[iHi]) iHi = i;
  });
  const hi = Math.max(v[iHi], golden(f, (iHi - 1) * h, (iHi + 1) * h, 1));
  const lo = Math.min(v[iLo], golden(f, (iLo - 1) * h, (iLo + 1) * h, -1));
  if (!(hi > lo)) return () => 0;
  return (t) => half * ((2 * (f(t) - lo)) / (hi - lo) - 1);
}

/** Extreme value (sign 1: max, −1: min) of f on [a, b] by golden-section search. */
function golden(f: (t: number) => number, a: number, b: number, sign: 1 | -1): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  for (let i = 0; i < 60; i++) {
    if (sign * f(c) > sign * f(d)) b = d;
    else a = c;
    c = b - g * (b - a);
    d = a + g * (b - a);
  }
  return f((a + b) / 2);
}

/**
 * Periodic (2π) monotone cubic Hermite interpolation: at a reading between two secants of the same
 * sign the slope is their weighted harmonic mean (Fritsch and Butland, 1984), elsewhere 0, so no
 * piece overshoots its two readings.
 */
function monotoneSpline(angles: number[], values: number[]): (t: number) => number {
  const n = angles.length;
  const at = (i: number) => angles[((i % n) + n) % n] + TAU * Math.floor(i / n);
  const val = (i: number) => values[((i % n) + n) % n];
  const secant = (i: number) => (val(i + 1) - val(i)) / (at(i + 1) - at(i));
  const slope = angles.map((_, i) => {
    const s0 = secant(i - 1);
    const s1 = secant(i);
    if (s0 * s1 <= 0) return 0;
    const h0 = at(i) - at(i - 1);
    const h1 = at(i + 1) - at(i);
    const w1 = 2 * h1 + h0;
    const w2 = h1 + 2 * h0;
    return (w1 + w2) / (w1 / s0 + w2 / s1);
  });
  return (t) => {
    const u = angles[0] + (t - angles[0] - TAU * Math.floor((t - angles[0]) / TAU));
    let i = 0;
    for (let hi = n - 1; i < hi; ) {
      const mid = (i + hi + 1) >> 1;
      if (angles[mid] <= u) i = mid;
      else hi = mid - 1;
    }
    const x0 = angles[i];
    const x1 = i + 1 < n ? angles[i + 1] : angles[0] + TAU;
    const hh = x1 - x0;
    const s = (u - x0) / hh;
    const m0 = slope[i];
    const m1 = slope[(i + 1) % n];
    const y0 = values[i];
    const y1 = values[(i + 1) % n];
    return (2 * s ** 3 - 3 * s * s + 1) * y0 + (s ** 3 - 2 * s * s + s) * hh * m0 + (-2 * s ** 3 + 3 * s * s) * y1 + (s ** 3 - s * s) * hh * m1;
  };
}
