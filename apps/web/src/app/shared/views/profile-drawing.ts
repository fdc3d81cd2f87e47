import type { EngineWarning } from '@barwright/engine';
import { svgPoints, thinForDrawing, type PlotScale } from './plot-geometry';
import { lossStretches, type Severity } from './profile-marks';
import type { ProfileData } from './view-data';

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
  /** Where the engine reports lost detail, each place once (overlaps merged), viewBox units. */
  marks: { x: number; width: number; severity: Severity; title: string }[];
  /** Dimension lines (viewBox units) with the length they give (mm): the bar's height, a period, the depth cut. */
  dimensions: Dimension[];
  /** The blank's top before cutting (depth into the edge above the deepest valley), viewBox y, or null. */
  blankTop: number | null;
  /** The cutter path's peak-to-valley height over the bar (mm): what a loss is measured against. */
  amplitude: number;
  /** Grid ticks along the bar: x in viewBox units and the label in mm. */
  ticks: { x: number; mm: number }[];
}

/** A dimension line from (x1, y1) to (x2, y2) with extension ends, and where its figure goes. */
export interface Dimension {
  kind: 'height' | 'period' | 'depth';
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** The length it gives, mm (the view writes it in the design's units). */
  mm: number;
  labelX: number;
  labelY: number;
}

/** Drawing width in viewBox units; the SVG scales to its box. */
const WIDTH = 1000;
/** Buckets per drawing for each path: about one a pixel of a wide view, each keeping its crest and valley. */
const BUCKETS = 800;
/** The whole bar is drawn about this high, as a fraction of its width. */
const WHOLE_ASPECT = 0.22;

/** What else the drawing may hold: the blank above the cutter (the opposite blank), the nominal cutter path. */
export interface ProfileExtras {
  /** The edge of the opposite blank of the same cut (its material above it), on `p.x` (mm). */
  upper?: Float64Array | null;
  /** Cutter heights on the centre line with linear motion, on `p.x` (mm). */
  nominal?: Float64Array | null;
  /** Depth into the edge (mm, the cut plan's): the blank's top is drawn this far above the deepest valley. */
  depth?: number | null;
}

/** The geometry of the bar-profile drawing (pure). */
export function profileDrawing(p: ProfileData, mode: ProfileMode, warnings: readonly EngineWarning[] = p.warnings, extras: ProfileExtras = {}): ProfileDrawing {
  const [from, to] = mode === 'detail' ? detailWindow(p) : [0, p.barLength];
  const cutter = thinForDrawing(p.x, p.cutter, from, to, BUCKETS);
  const bar = thinForDrawing(p.x, p.bar, from, to, BUCKETS);
  const follower = thinForDrawing(p.x, p.follower, from, to, BUCKETS);
  const nominal = extras.nominal ? thinForDrawing(p.x, extras.nominal, from, to, BUCKETS) : null;
  const upper = extras.upper ? thinForDrawing(p.x, extras.upper, from, to, BUCKETS) : null;
  const discs = mode === 'detail' ? discsAt((from + to) / 2, p) : [];
  const paths = [cutter, follower, ...(nominal ? [nominal] : []), ...(upper ? [upper] : [])];
  const [barLow, barHigh] = rangeOf(bar);
  const blankTop = extras.depth && extras.depth > 0 && !upper ? barLow + extras.depth : null;
  let lo = Math.min(barLow, ...discs.map((d) => d.cy - d.r));
  let hi = Math.max(...paths.flatMap(rangeOf), ...discs.map((d) => d.cy + d.r), blankTop ?? -Infinity);
  lo -= Math.max(0.15 * (hi - lo), 0.2); // some bar below the deepest valley
  hi += Math.max(0.18 * (hi - lo), 0.2); // room above for the period's dimension (and the opposite blank)
  const sx = WIDTH / (to - from);
  const natural = (hi - lo) * sx;
  const exaggeration = mode === 'detail' || natural >= WHOLE_ASPECT * WIDTH ? 1 : niceFactor((WHOLE_ASPECT * WIDTH) / natural);
  const scale: PlotScale = { x0: from, y1: hi, sx, sy: sx * exaggeration };
  const height = (hi - lo) * scale.sy;
  const barEdge = svgPoints(bar, scale);
  const barOutline = `${barEdge} ${WIDTH},${round(height)} 0,${round(height)}`;
  const amplitude = peakToValley(p.cutter);
  const upperEdge = upper ? svgPoints(upper, scale) : '';
  const ys = (mm: number) => round((hi - mm) * scale.sy);
  return {
    width: WIDTH,
    height: round(height),
    from,
    to,
    exaggeration,
    bar: barOutline,
    barEdge,
    cutter: svgPoints(cutter, scale),
    follower: svgPoints(follower, scale),
    nominal: nominal ? svgPoints(nominal, scale) : '',
    upper: upperEdge ? `${upperEdge} ${WIDTH},0 0,0` : '',
    upperEdge,
    discs: discs.map((d) => ({ kind: d.kind, cx: round((d.cx - from) * sx), cy: ys(d.cy), r: round(d.r * sx) })),
    marks: lossStretches(warnings, from, to, p.period, amplitude).map((m) => {
      const width = Math.max(4, (m.to - m.from) * sx); // a place narrower than a few units still shows
      return { x: round((m.from - from) * sx - (width - (m.to - m.from) * sx) / 2), width: round(width), severity: m.severity, title: m.titles.join('\n') };
    }),
    ticks: ticksFor(from, to, sx),
    dimensions: dimensionsFor({ bar, from, to, period: p.period, barLow, barHigh, blankTop, sx, ys, }),
    blankTop: blankTop === null ? null : ys(blankTop),
    amplitude,
  };
}

interface DimensionInput {
  bar: Float64Array;
  from: number;
  to: number;
  period: number;
  barLow: number;
  barHigh: number;
  blankTop: number | null;
  sx: number;
  ys: (mm: number) => number;
}

/**
 * Narrowest period dimension drawn, viewBox units: its label (22 units high, ~80 wide) stands between
 * the arrows. The whole bar of a many-lobed rosette gives a period of a few units, where the label ran
 * over the drawing's edge and the curves; the caption and the legend still give the period.
 */
const MIN_PERIOD_SPAN = 100;

/**
 * The height of the bar edge at the right, one period between two crests above the bar, and the
 * depth cut from the blank's top at the left: the three figures a turner checks on a drawing.
 */
function dimensionsFor(d: DimensionInput): Dimension[] {
  const dims: Dimension[] = [];
  const right = WIDTH - 24;
  if (d.barHigh - d.barLow > 1e-9) {
    const [y1, y2] = [d.ys(d.barHigh), d.ys(d.barLow)];
    dims.push({ kind: 'height', x1: right, y1, x2: right, y2, mm: d.barHigh - d.barLow, labelX: right - 8, labelY: round((y1 + y2) / 2) });
  }
  const crest = firstCrest(d.bar, d.from, d.period);
  if (crest !== null && crest + d.period <= d.to && d.period * d.sx >= MIN_PERIOD_SPAN) {
    const x1 = round((crest - d.from) * d.sx);
    const x2 = round((crest + d.period - d.from) * d.sx);
    const y = round(Math.max(30, d.ys(Math.max(d.barHigh, d.blankTop ?? -Infinity)) - 14));
    dims.push({ kind: 'period', x1, y1: y, x2, y2: y, mm: d.period, labelX: round((x1 + x2) / 2), labelY: round(y - 16) });
  }
  if (d.blankTop !== null) {
    const [y1, y2] = [d.ys(d.blankTop), d.ys(d.barLow)];
    dims.push({ kind: 'depth', x1: 24, y1, x2: 24, y2, mm: d.blankTop - d.barLow, labelX: 32, labelY: round((y1 + y2) / 2) });
  }
  return dims;
}

/** The x (mm) of the highest point of the bar edge within the first period of the window, from thinned pairs. */
function firstCrest(xy: Float64Array, from: number, period: number): number | null {
  let best = -Infinity;
  let at: number | null = null;
  for (let i = 0; i < xy.length; i += 2) {
    if (xy[i] < from || xy[i] > from + period) continue;
    if (xy[i + 1] > best) [best, at] = [xy[i + 1], xy[i]];
  }
  return at;
}

function peakToValley(y: Float64Array): number {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < y.length; i++) {
    if (y[i] < lo) lo = y[i];
    if (y[i] > hi) hi = y[i];
  }
  return Number.isFinite(lo) ? hi - lo : 0;
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
