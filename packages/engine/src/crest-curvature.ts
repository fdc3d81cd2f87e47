import { layerPeakToValley, type Design, type Units } from '@barwright/contracts';
import { formatLength } from './length-format';
import { reducedPhase } from './phase-schedule';
import { rosetteMinRadius, rosetteRepeats } from './rosette';
import { layerDerivatives, type LayerDerivatives, type WaveJet } from './wave-derivatives';

/** The smallest radius of curvature of the crests, from the exact geometry (mm). */
export interface CrestCurvature {
  /** Of the bar edge's crests: the cutter path's less the cutter radius; 0 at a sharp corner; Infinity for a straight bar. */
  radius: number;
  /** True when the bar edge has a sharp crest: a corner of the path, or a path crest tighter than the cutter. */
  corner: boolean;
  /** Where (x on the bar, mm, the first such crest); null for a straight bar. */
  x: number | null;
  /** Of the cutter path's own crests (0 at a corner of the path, Infinity when it has no crest). */
  pathRadius: number;
}

export interface CrestInput {
  /** The design in mm (a counter-phase companion's shifted rosette included). */
  design: Design;
  /** The rubber's sampled displacements at nodes 0, 1, … (node i reads ψ = i·dTheta), at most one period. */
  s: ArrayLike<number>;
  dTheta: number;
  /** Bar travel per node (mm). */
  step: number;
  /** The path mirrored top to bottom (the inverted companion): valleys become crests. */
  inverted?: boolean;
}

interface Layer {
  lobes: number;
  half: number;
  phase: number;
  jet: WaveJet;
  /** The wave's corners (t in one wave period), read once with the jet. */
  corners: LayerDerivatives['corners'];
}

interface Corner {
  theta: number;
  convex: boolean;
}

/** In words, lengths in `units`: "sharp corner at x 2.08 mm", "0.536 mm at x 0 mm", or "none (a straight bar)". */
export function crestText(crest: CrestCurvature, units: Units): string {
  if (crest.x === null || !Number.isFinite(crest.radius)) return 'none (a straight bar)';
  const where = `at x ${formatLength(crest.x, units)}`;
  return crest.corner ? `sharp corner ${where}` : `${formatLength(crest.radius, units)} ${where}`;
}

/** Polar slope and bend of the rubber's track at one angle, or why there is none. */
type Reading = { ok: true; s: number; s1: number; s2: number } | { ok: false };

/** Nodes examined per feature of the period (a lobe, times its highest harmonic or its readings), at least; the smallest is then refined on the exact geometry. */
const EXAMINED_PER_FEATURE = 48;

/**
 * The smallest radius of curvature of the crests of the cutter path y(x) = k·(s(ψ) − sMin), ψ = 2π·x/T,
 * and of the bar edge it cuts. s is the rubber's track: for a round rubber of radius ρ the polar
 * radius of the rosette's parallel curve at distance ρ (curvature κ/(1 + ρκ), normal the rosette's),
 * around a sharp rosette crest an arc of radius ρ about it; for a flat rubber the support function
 * (s + s'' = the rosette's radius of curvature at the contact). The polar form gives
 * s'' = (s² + 2s'² − κ(s² + s'²)^{3/2}) / s, and the graph's radius is (1 + y'²)^{3/2} / |y''| with
 * y' = k·ω·s', y'' = k·ω²·s'' (ω = 2π/T). The rosette's derivatives are analytic (wave-derivatives.ts).
 * A crest of the path tighter than the cutter radius rc leaves a ridge on the bar, whose crests are
 * otherwise rc less round than the path's (the lower parallel curve).
 */
export function crestCurvature(input: CrestInput): CrestCurvature {
  const { design, s, dTheta, step } = input;
  const sign = input.inverted ? -1 : 1;
  const k = design.motion.leverRatio;
  const omega = (2 * Math.PI) / design.motion.travelPerRev;
  const rc = design.cutter.diameter / 2;
  const track = trackReader(design);
  const tolerance = design.rosette.baseRadius * dTheta;
  const radiusAt = (psi: number, sampled?: number): number => {
    const read = track.read(psi);
    if (!read.ok || (sampled !== undefined && read.s < sampled - tolerance)) return NaN;
    const y1 = sign * k * omega * read.s1;
    const y2 = sign * k * omega * omega * read.s2;
    return y2 < 0 ? (1 + y1 * y1) ** 1.5 / -y2 : Infinity;
  };
  const stride = Math.max(1, Math.floor(s.length / (EXAMINED_PER_FEATURE * featuresPerPeriod(design))));
  let least = Infinity;
  let best = -1;
  let trimmed = -1;
  for (let i = 0; i < s.length; i += stride) {
    const r = radiusAt(i * dTheta, s[i]);
    if (Number.isNaN(r)) trimmed = trimmed < 0 ? i : trimmed;
    else if (r < least) [least, best] = [r, i];
  }
  let at = best * dTheta;
  if (best >= 0) [least, at] = refineMinimum(radiusAt, at, stride * dTheta, least);
  const corner = pathCorner(track.corners, input, trimmed);
  if (corner !== null) return { radius: 0, corner: true, x: corner, pathRadius: 0 };
  if (best < 0) return { radius: Infinity, corner: false, x: null, pathRadius: Infinity };
  const ridge = least <= rc;
  const x = Math.max(0, Math.min((s.length - 1) * step, (at / dTheta) * step));
  return { radius: ridge ? 0 : least - rc, corner: ridge, x, pathRadius: least };
}

/** x (mm) of the first sharp crest of the path, or null: a convex rosette corner read by a point, or (inverted) any valley corner. */
function pathCorner(corners: Corner[], input: CrestInput, trimmed: number): number | null {
  const { design, dTheta, step, s } = input;
  const rubber = design.rubber;
  const span = s.length * dTheta;
  const toX = (theta: number) => (theta / dTheta) * step;
  if (!input.inverted) {
    if (rubber.shape !== 'round' || rubber.radius > 0) return null;
    const sharp = corners.find((c) => c.convex && c.theta < span);
    return sharp ? toX(sharp.theta) : null;
  }
  const cusp = rubber.shape === 'round' ? corners.find((c) => !c.convex && c.theta < span) : undefined;
  const first = Math.min(cusp ? cusp.theta : Infinity, trimmed >= 0 ? trimmed * dTheta : Infinity);
  return Number.isFinite(first) ? toX(first) : null;
}

/** Golden-section search for the smallest radius within one examined interval each side of ψ. */
function refineMinimum(radiusAt: (psi: number) => number, psi: number, width: number, found: number): [radius: number, psi: number] {
  const g = (Math.sqrt(5) - 1) / 2;
  const f = (p: number) => {
    const r = radiusAt(p);
    return Number.isNaN(r) ? Infinity : r;
  };
  let a = psi - width;
  let b = psi + width;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let n = 0; n < 40; n++) {
    if (fc < fd) {
      [b, d, fd] = [d, c, fc];
      c = b - g * (b - a);
      fc = f(c);
    } else {
      [a, c, fc] = [c, d, fd];
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  if (Math.min(fc, fd) >= found) return [found, psi];
  return fc < fd ? [fc, c] : [fd, d];
}

interface TrackReader {
  read(psi: number): Reading;
  corners: Corner[];
}

/** The rubber's track s(ψ) with its first two derivatives, from the rosette's analytic derivatives. */
function trackReader(design: Design): TrackReader {
  const { rosette, rubber } = design;
  const layers: Layer[] = rosette.layers
    .filter((l) => layerPeakToValley(l) > 0)
    .map((l) => {
      const { jet, corners } = layerDerivatives(l, rosette.baseRadius);
      return { lobes: l.lobes, half: layerPeakToValley(l) / 2, phase: 2 * Math.PI * reducedPhase(l.phase), jet, corners };
    });
  const rosetteJet = (theta: number): [number, number, number] => {
    let r = rosette.baseRadius;
    let r1 = 0;
    let r2 = 0;
    for (const l of layers) {
      const [w, w1, w2] = l.jet(l.lobes * theta + l.phase);
      r += l.half * w;
      r1 += l.half * l.lobes * w1;
      r2 += l.half * l.lobes * l.lobes * w2;
    }
    return [r, r1, r2];
  };
  const corners = rosetteCorners(rosetteRepeats(rosette), layers);
  const convex = corners.filter((c) => c.convex);
  const period = (2 * Math.PI) / rosetteRepeats(rosette);
  const rho = rubber.shape === 'round' ? rubber.radius : 0;
  const halfWidth = rubber.shape === 'flat' ? rubber.width / 2 : 0;
  const lead = { delta: 0 };
  const reach = Math.asin(Math.min(1, (rho + halfWidth) / Math.max(1e-9, rosetteMinRadius(rosette)))) + 1e-9;
  const read = (psi: number): Reading => {
    for (const c of nearCorners(convex, psi, reach, period)) {
      const arc = rubber.shape === 'round' ? roundOnCorner(rosetteJet, c, psi, rho) : flatOnCorner(rosetteJet, c, psi);
      if (arc) return arc;
    }
    if (rubber.shape === 'flat') return flatRead(rosetteJet, psi, halfWidth);
    return roundRead(rosetteJet, psi, rho, lead);
  };
  return { read, corners };
}

/** How many distinct features one period of the bar holds: Σ lobes × (highest harmonic, or readings) / G, at least 1. */
function featuresPerPeriod(design: Design): number {
  const moving = design.rosette.layers.filter((l) => layerPeakToValley(l) > 0);
  const repeats = rosetteRepeats(design.rosette);
  const detail = (l: (typeof moving)[number]) =>
    l.wave.shape === 'fourier' ? Math.max(...l.wave.terms.map((t) => t.k)) : l.wave.shape === 'measured' ? l.wave.points.length : 1;
  return Math.max(1, moving.reduce((sum, l) => sum + (l.lobes * detail(l)) / repeats, 0));
}

/** Corners of the rosette over one period of the bar (θ in [0, 2π/G)), sorted. */
function rosetteCorners(repeats: number, layers: Layer[]): Corner[] {
  const all: Corner[] = [];
  const period = (2 * Math.PI) / repeats;
  for (const { lobes, phase, corners } of layers) {
    for (const c of corners) {
      for (let m = 0; m < lobes / repeats; m++) {
        const theta = (c.t - phase + 2 * Math.PI * m) / lobes;
        all.push({ theta: theta - Math.floor(theta / period) * period, convex: c.convex });
      }
    }
  }
  return all.sort((a, b) => a.theta - b.theta);
}

/** The convex corners within `reach` (rad) of ψ, in the periodic sense: a binary search in the sorted list, then its neighbours. */
function nearCorners(corners: Corner[], psi: number, reach: number, period: number): Corner[] {
  const n = corners.length;
  if (n === 0) return [];
  const local = psi - Math.floor(psi / period) * period;
  let lo = 0;
  let hi = n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (corners[mid].theta < local - reach) lo = mid + 1;
    else hi = mid;
  }
  const near: Corner[] = [];
  // Walk forward from the first corner at or after local − reach, wrapping round the period once at most.
  for (let k = 0; k < n; k++) {
    const c = corners[(lo + k) % n];
    let d = c.theta - local;
    d -= Math.round(d / period) * period;
    if (Math.abs(d) > reach) {
      if (k > 0) break;
      continue;
    }
    near.push({ theta: psi + d, convex: true });
  }
  // Corners just below the period's end seen from just above its start.
  if (local - reach < 0) {
    for (let k = n - 1; k >= 0 && corners[k].theta - period >= local - reach; k--) {
      const d = corners[k].theta - period - local;
      if (!near.some((c) => Math.abs(c.theta - (psi + d)) < 1e-12)) near.push({ theta: psi + d, convex: true });
    }
  }
  return near;
}

/** Direction (rad) of the rosette's outward normal at θ from its jet. */
function normalAngle(theta: number, r: number, r1: number): number {
  return theta + Math.atan2(-r1, r);
}

/** The one-sided normals at a corner (rad): before and after it. */
function cornerNormals(jet: (t: number) => [number, number, number], theta: number): [number, number, number] {
  const d = 1e-9;
  const [r] = jet(theta);
  const [ra, r1a] = jet(theta - d);
  const [rb, r1b] = jet(theta + d);
  return [r, normalAngle(theta - d, ra, r1a), normalAngle(theta + d, rb, r1b)];
}

/** A round rubber resting on a sharp rosette crest: its centre runs on an arc of radius ρ about the corner. */
function roundOnCorner(jet: (t: number) => [number, number, number], c: Corner, psi: number, rho: number): Reading | undefined {
  if (!(rho > 0)) return undefined;
  const [q, before, after] = cornerNormals(jet, c.theta);
  const a = psi - c.theta;
  const inside = rho * rho - q * q * Math.sin(a) ** 2;
  if (inside < 0) return undefined;
  const s = q * Math.cos(a) + Math.sqrt(inside);
  const alpha = Math.atan2(s * Math.sin(psi) - q * Math.sin(c.theta), s * Math.cos(psi) - q * Math.cos(c.theta));
  if (!withinTurn(alpha, before, after)) return undefined;
  return polarReading(s, Math.cos(alpha - psi), Math.sin(alpha - psi), 1 / rho);
}

/** A flat rubber resting on a sharp rosette crest: s = q·cos(ψ − θc) while its face turns between the flanks' normals. */
function flatOnCorner(jet: (t: number) => [number, number, number], c: Corner, psi: number): Reading | undefined {
  const [q, before, after] = cornerNormals(jet, c.theta);
  if (!withinTurn(psi, before, after)) return undefined;
  const s = q * Math.cos(psi - c.theta);
  return { ok: true, s, s1: q * Math.sin(c.theta - psi), s2: -s };
}

function withinTurn(angle: number, from: number, to: number): boolean {
  const wrap = (u: number) => u - 2 * Math.PI * Math.round(u / (2 * Math.PI));
  const span = wrap(to - from);
  const at = wrap(angle - from);
  return span > 0 && at >= 0 && at <= span;
}

/** s' and s'' of a polar curve from its normal (components along and across the ray) and curvature κ. */
function polarReading(s: number, along: number, across: number, kappa: number): Reading {
  if (!(along > 0)) return { ok: false };
  const s1 = (-s * across) / along;
  const s2 = (s * s + 2 * s1 * s1 - kappa * (s * s + s1 * s1) ** 1.5) / s;
  return { ok: true, s, s1, s2 };
}

/** The contact φ whose image lies on the ray ψ: Newton's method on g(φ) = angle − ψ from φ = ψ. */
function solveContact(angleOf: (phi: number) => number, psi: number, start = psi): number | undefined {
  let phi = start;
  const d = 1e-7;
  for (let n = 0; n < 40; n++) {
    const g = angleOf(phi) - psi;
    if (Math.abs(g) < 1e-13) return phi;
    const slope = (angleOf(phi + d) - angleOf(phi - d)) / (2 * d);
    if (!(slope > 0)) return undefined;
    phi -= Math.max(-0.5, Math.min(0.5, g / slope));
  }
  return Math.abs(angleOf(phi) - psi) < 1e-9 ? phi : undefined;
}

function roundRead(jet: (t: number) => [number, number, number], psi: number, rho: number, lead: { delta: number }): Reading {
  const centreAngle = (phi: number) => {
    const [r, r1] = jet(phi);
    const len = Math.hypot(r, r1);
    return phi + Math.atan2((-rho * r1) / len, r + (rho * r) / len);
  };
  // Started from the previous reading's lead of the contact over the ray: one or two steps then.
  const phi = rho > 0 ? (solveContact(centreAngle, psi, psi + lead.delta) ?? solveContact(centreAngle, psi)) : psi;
  if (phi === undefined) return { ok: false };
  lead.delta = phi - psi;
  const [r, r1, r2] = jet(phi);
  const len = Math.hypot(r, r1);
  const kappa = (r * r + 2 * r1 * r1 - r * r2) / len ** 3;
  if (!(1 + rho * kappa > 0)) return { ok: false };
  const delta = phi - psi;
  const s = Math.hypot(r + (rho * r) / len, (rho * r1) / len);
  const along = (r * Math.cos(delta) + r1 * Math.sin(delta)) / len;
  const across = (r * Math.sin(delta) - r1 * Math.cos(delta)) / len;
  return polarReading(s, along, across, kappa / (1 + rho * kappa));
}

function flatRead(jet: (t: number) => [number, number, number], psi: number, halfWidth: number): Reading {
  const phi = solveContact((p) => {
    const [r, r1] = jet(p);
    return normalAngle(p, r, r1);
  }, psi);
  if (phi === undefined) return { ok: false };
  const [r, r1, r2] = jet(phi);
  const kappa = (r * r + 2 * r1 * r1 - r * r2) / Math.hypot(r, r1) ** 3;
  const delta = phi - psi;
  if (!(kappa > 0) || Math.abs(r * Math.sin(delta)) > halfWidth) return { ok: false };
  const s = r * Math.cos(delta);
  return { ok: true, s, s1: r * Math.sin(delta), s2: 1 / kappa - s };
}
