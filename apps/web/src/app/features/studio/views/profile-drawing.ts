import type { ProfileData } from '../compute/design-views';
import { svgPoints, thinForDrawing, type PlotScale } from './plot-geometry';

/** Detail: a few periods at true scale. Whole: the full bar with heights exaggerated. */
export type ProfileMode = 'detail' | 'whole';

export interface ProfileDrawing {
  width: number;
  height: number;
  /** x range shown, mm. */
  from: number;
  to: number;
  /** Heights are drawn this many times larger than lengths (1 in detail). */
  exaggeration: number;
  bar: string;
  barEdge: string;
  cutter: string;
  follower: string;
  /** The cutter path on the centre line with linear motion (the "before" of a placed cutter), or ''. */
  nominal: string;
  /** The opposite blank (above the cutter) as a polygon, and its edge, or ''. */
  upper: string;
  upperEdge: string;
  /** The cutter and follower discs at the middle of the window (detail only), viewBox units. */
  discs: { cx: number; cy: number; r: number; kind: 'cutter' | 'follower' }[];
  /** Where the engine reports lost detail, viewBox units. */
  marks: { x: number; width: number; title: string }[];
  /** Grid ticks along the bar: x in viewBox units and the label in mm. */
  ticks: { x: number; mm: number }[];
}

/** Drawing width in viewBox units; the SVG scales to its box. */
const WIDTH = 1000;
/** Samples kept per drawing for each path: several per pixel of a wide screen. */
const BUCKETS = 1400;
/** The whole bar is drawn about this high, as a fraction of its width. */
const WHOLE_ASPECT = 0.22;

/** What else the drawing may hold: the blank above the cutter (the opposite blank), the nominal cutter path. */
export interface ProfileExtras {
  /** The edge of the opposite blank of the same cut (its material above it), on `p.x` (mm). */
  upper?: Float64Array | null;
  /** Cutter heights on the centre line with linear motion, on `p.x` (mm). */
  nominal?: Float64Array | null;
}

/** The geometry of the bar-profile drawing (pure). */
export function profileDrawing(p: ProfileData, mode: ProfileMode, warnings = p.warnings, extras: ProfileExtras = {}): ProfileDrawing {
  const [from, to] = mode === 'detail' ? detailWindow(p) : [0, p.barLength];
  const cutter = thinForDrawing(p.x, p.cutter, from, to, BUCKETS);
  const bar = thinForDrawing(p.x, p.bar, from, to, BUCKETS);
  const follower = thinForDrawing(p.x, p.follower, from, to, BUCKETS);
  const nominal = extras.nominal ? thinForDrawing(p.x, extras.nominal, from, to, BUCKETS) : null;
  const upper = extras.upper ? thinForDrawing(p.x, extras.upper, from, to, BUCKETS) : null;
  const discs = mode === 'detail' ? discsAt((from + to) / 2, p) : [];
  const paths = [cutter, follower, ...(nominal ? [nominal] : []), ...(upper ? [upper] : [])];
  let lo = Math.min(...rangeOf(bar), ...discs.map((d) => d.cy - d.r));
  let hi = Math.max(...paths.flatMap(rangeOf), ...discs.map((d) => d.cy + d.r));
  lo -= Math.max(0.15 * (hi - lo), 0.2); // some bar below the deepest valley
  hi += upper ? Math.max(0.15 * (hi - lo), 0.2) : 0.08 * (hi - lo); // and some opposite blank above its highest point
  const sx = WIDTH / (to - from);
  const natural = (hi - lo) * sx;
  const exaggeration = mode === 'detail' || natural >= WHOLE_ASPECT * WIDTH ? 1 : niceFactor((WHOLE_ASPECT * WIDTH) / natural);
  const scale: PlotScale = { x0: from, y1: hi, sx, sy: sx * exaggeration };
  const height = (hi - lo) * scale.sy;
  const barOutline = `${svgPoints(bar, scale)} ${WIDTH},${round(height)} 0,${round(height)}`;
  return {
    width: WIDTH,
    height: round(height),
    from,
    to,
    exaggeration,
    bar: barOutline,
    barEdge: svgPoints(bar, scale),
    cutter: svgPoints(cutter, scale),
    follower: svgPoints(follower, scale),
    nominal: nominal ? svgPoints(nominal, scale) : '',
    upper: upper ? `${svgPoints(upper, scale)} ${WIDTH},0 0,0` : '',
    upperEdge: upper ? svgPoints(upper, scale) : '',
    discs: discs.map((d) => ({ kind: d.kind, cx: round((d.cx - from) * sx), cy: round((hi - d.cy) * scale.sy), r: round(d.r * sx) })),
    marks: marksIn(warnings, from, to, sx, p.period),
    ticks: ticksFor(from, to, sx),
  };
}

/** Three periods about the middle of the bar (away from its ends), or the whole bar if shorter. */
export function detailWindow(p: Pick<ProfileData, 'period' | 'barLength'>): [number, number] {
  const span = Math.min(p.barLength, 3 * p.period);
  const start = Math.max(0, p.barLength / 2 - span / 2);
  return [start, start + span];
}

function discsAt(x: number, p: ProfileData) {
  const i = Math.max(0, Math.min(p.x.length - 1, Math.round(x / p.step)));
  return [
    { kind: 'cutter' as const, cx: p.x[i], cy: p.cutter[i], r: p.cutterRadius },
    { kind: 'follower' as const, cx: p.x[i], cy: p.follower[i], r: p.followerRadius },
  ].filter((d) => d.r > 0);
}

/**
 * Detail-loss zones in the window. The engine reports a zone that repeats every period once (the
 * bar repeats bit for bit each period), so each is drawn again one period, two periods… along.
 */
function marksIn(warnings: ProfileData['warnings'], from: number, to: number, sx: number, period: number): ProfileDrawing['marks'] {
  const marks: ProfileDrawing['marks'] = [];
  for (const w of warnings) {
    if (!w.at || !(w.code.startsWith('detail-lost') || w.code === 'follower-radius')) continue;
    // One warning per kind lists its places in one period (`zones`); older results gave one place each.
    for (const zone of w.zones ?? [w.at]) {
      const first = Math.max(0, Math.ceil((from - zone.xTo) / period));
      for (let k = first; zone.xFrom + k * period <= to && marks.length < 200; k++) {
        const a = Math.max(from, zone.xFrom + k * period);
        const b = Math.min(to, zone.xTo + k * period);
        if (b < a) continue;
        const width = Math.max(4, (b - a) * sx); // a zone narrower than a few units still shows
        marks.push({ x: round((a - from) * sx - (width - (b - a) * sx) / 2), width: round(width), title: w.message });
      }
    }
  }
  return marks;
}

function ticksFor(from: number, to: number, sx: number): ProfileDrawing['ticks'] {
  const span = to - from;
  const step = [0.5, 1, 2, 5, 10, 20, 50, 100, 200].find((s) => span / s <= 8) ?? 500;
  const ticks: ProfileDrawing['ticks'] = [];
  for (let mm = Math.ceil(from / step) * step; mm <= to + 1e-9; mm += step) ticks.push({ x: round((mm - from) * sx), mm: Number(mm.toFixed(3)) });
  return ticks;
}

/** 1, 2, 5 × a power of ten, not above `factor` (at least 1). */
function niceFactor(factor: number): number {
  const power = 10 ** Math.floor(Math.log10(factor));
  const nice = [5, 2, 1].find((m) => m * power <= factor) ?? 1;
  return Math.max(1, nice * power);
}

function rangeOf(xy: Float64Array): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 1; i < xy.length; i += 2) {
    lo = Math.min(lo, xy[i]);
    hi = Math.max(hi, xy[i]);
  }
  return Number.isFinite(lo) ? [lo, hi] : [0, 1];
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
