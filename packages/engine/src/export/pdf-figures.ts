import type { Units } from '@barwright/contracts';
import {
  clip,
  endPath,
  fillAndStroke,
  rectangle,
  lineTo,
  moveTo,
  popGraphicsState,
  pushGraphicsState,
  setDashPattern,
  setFillingGrayscaleColor,
  setLineWidth,
  setStrokingGrayscaleColor,
  setStrokingRgbColor,
  stroke,
  type PDFPage,
} from 'pdf-lib';
import { formatLength } from '../length-format';
import type { LineStudy } from '../line-study';
import type { Point } from '../types';
import { path, pushAll } from './pdf-paths';
import { simplifyPolyline } from './polyline-simplify';

/** One period of the bar, in mm in the bar's frame, as the enlarged drawing shows it. */
export interface PeriodFigure {
  /** Start of the middle period and the bar's length (mm); the drawing shows as many periods around it as fill the page. */
  from: number;
  length: number;
  edge: Point[];
  cutter: Point[];
  follower: Point[];
  /** The opposite blank's edge (the upper envelope of the same cut), when the pair is asked for. */
  upper?: Point[];
  period: number;
  /** Depth to cut: the edge's peak-to-valley plus the clean-up (mm). */
  depth: number;
}

/** A box on the page, points. */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

type TextFn = (s: string, x: number, y: number, size?: number) => void;

/** Thinnest line drawn, points, so a fine groove still prints. */
const HAIRLINE_PT = 0.25;
/** Chord tolerance of the drawn paths, points: well below what a printer resolves. */
const DRAW_TOLERANCE_PT = 0.05;

/** Width of the columns a drawn line is thinned to, points: a fraction of the finest printed dot. */
const COLUMN_PT = 0.2;

/**
 * A polyline (x ascending, page points) thinned to what a column of `width` can show: in each
 * column its first, lowest, highest and last points, in order. Linear in the points, however
 * jagged the line (a chord simplification is not, on a path of many equal crests).
 */
export function inColumns(points: readonly Point[], width: number): Point[] {
  const out: Point[] = [];
  let i = 0;
  while (i < points.length) {
    const column = Math.floor(points[i][0] / width);
    let j = i;
    let low = i;
    let high = i;
    while (j + 1 < points.length && Math.floor(points[j + 1][0] / width) === column) {
      j++;
      if (points[j][1] < points[low][1]) low = j;
      if (points[j][1] > points[high][1]) high = j;
    }
    for (const k of [...new Set([i, Math.min(low, high), Math.max(low, high), j])]) out.push(points[k]);
    i = j + 1;
  }
  return out;
}

/** The paths of a profile over [from, to] (mm), with the neighbouring points so lines reach the ends. */
export function pathWithin(points: readonly Point[], from: number, to: number): Point[] {
  const out: Point[] = [];
  for (let i = 0; i < points.length; i++) {
    const x = points[i][0];
    if (x >= from && x <= to) out.push(points[i]);
    else if ((x < from && points[i + 1]?.[0] >= from) || (x > to && points[i - 1]?.[0] <= to)) out.push(points[i]);
  }
  return out;
}

/** The stretch of one period from the middle of the bar (or its start when the bar is shorter). */
export function middlePeriod(length: number, period: number): { from: number; to: number } {
  if (!(period > 0) || period >= length) return { from: 0, to: length };
  const from = Math.floor(length / 2 / period) * period;
  return from + period <= length ? { from, to: from + period } : { from: length - period, to: length };
}

/** The stretch drawn: whole periods around the middle one, as many as the box's shape takes, within the bar. */
function stretchShown(figure: PeriodFigure, room: { width: number; height: number }, rise: number): { from: number; to: number } {
  const p = figure.period;
  const fit = Math.max(1, Math.floor(((room.width / room.height) * rise) / p));
  const count = Math.min(fit, Math.max(1, Math.floor(figure.length / p)));
  const before = Math.floor((count - 1) / 2);
  const from = Math.max(0, Math.min(figure.from - before * p, figure.length - count * p));
  return { from, to: Math.min(figure.length, from + count * p) };
}

/**
 * The middle period enlarged, lengths and heights to the same scale, with its neighbours as the page
 * takes them, dimension lines for the period and the edge's height, and the opposite blank above
 * when given. Returns what was drawn: the x range (mm) and the scale (times life size).
 */
export function drawPeriod(page: PDFPage, figure: PeriodFigure, box: Box, units: Units, text: TextFn): { from: number; to: number; scale: number } {
  let low = Infinity;
  let high = -Infinity;
  const near = (x: number) => x >= figure.from - figure.period && x <= figure.from + 2 * figure.period;
  for (const points of [figure.edge, figure.cutter, figure.follower, figure.upper ?? []]) {
    for (const [x, y] of points) if (near(x)) [low, high] = [Math.min(low, y), Math.max(high, y)];
  }
  const room = { width: box.width - 90, height: box.height - 40 }; // room for the dimension labels right and below
  const pad = (high - low) * 0.08;
  const { from, to } = stretchShown(figure, room, high - low + 2 * pad);
  const span = to - from;
  const k = Math.min(room.width / span, room.height / (high - low + 2 * pad));
  const foot = box.y + 30;
  const toPt = ([x, y]: Point): Point => [box.x + (x - from) * k, foot + (y - low + pad) * k];
  const draw = (points: readonly Point[]) => simplifyPolyline(pathWithin(points, from, to).map(toPt), DRAW_TOLERANCE_PT);
  const edge = draw(figure.edge);
  const base = foot;
  const body: Point[] = [...edge, [edge[edge.length - 1][0], base], [edge[0][0], base]];
  pushAll(page, [pushGraphicsState(), setLineWidth(0.6), setStrokingGrayscaleColor(0), setFillingGrayscaleColor(0.88)], path(body, true), [fillAndStroke(), popGraphicsState()]);
  if (figure.upper) {
    const upper = draw(figure.upper);
    const top = foot + (high - low + 2 * pad) * k;
    const blank: Point[] = [...upper, [upper[upper.length - 1][0], top], [upper[0][0], top]];
    pushAll(page, [pushGraphicsState(), setLineWidth(0.6), setStrokingGrayscaleColor(0), setFillingGrayscaleColor(0.8)], path(blank, true), [fillAndStroke(), popGraphicsState()]);
  }
  pushAll(page, [pushGraphicsState(), setLineWidth(0.5), setStrokingRgbColor(0.7, 0, 0.12), setDashPattern([3, 2], 0)], path(draw(figure.cutter), false), [stroke(), popGraphicsState()]);
  pushAll(page, [pushGraphicsState(), setLineWidth(0.5), setStrokingRgbColor(0.1, 0.3, 0.65)], path(draw(figure.follower), false), [stroke(), popGraphicsState()]);
  const len = (mm: number) => formatLength(mm, units);
  // Period: a dimension line under the drawing.
  const [x0] = toPt([figure.from, 0]);
  const [x1] = toPt([figure.from + figure.period, 0]);
  const y = box.y + 12;
  page.pushOperators(pushGraphicsState(), setLineWidth(0.5), setStrokingGrayscaleColor(0), moveTo(x0, y), lineTo(x1, y), moveTo(x0, y - 4), lineTo(x0, y + 4), moveTo(x1, y - 4), lineTo(x1, y + 4), stroke(), popGraphicsState());
  text(`period ${len(figure.period)}`, (x0 + x1) / 2 - 24, y + 4, 8);
  // Height of the bar edge: a dimension line at the right.
  let edgeLow = Infinity;
  let edgeHigh = -Infinity;
  for (const [x, v] of figure.edge) if (x >= from && x <= to) [edgeLow, edgeHigh] = [Math.min(edgeLow, v), Math.max(edgeHigh, v)];
  const xr = box.x + span * k + 10;
  const [, yLow] = toPt([0, edgeLow]);
  const [, yHigh] = toPt([0, edgeHigh]);
  page.pushOperators(pushGraphicsState(), setLineWidth(0.5), setStrokingGrayscaleColor(0), moveTo(xr, yLow), lineTo(xr, yHigh), moveTo(xr - 4, yLow), lineTo(xr + 4, yLow), moveTo(xr - 4, yHigh), lineTo(xr + 4, yHigh), stroke(), popGraphicsState());
  text(`edge ${len(edgeHigh - edgeLow)}`, xr + 6, (yLow + yHigh) / 2 + 2, 8);
  text(`depth to cut ${len(figure.depth)}`, xr + 6, (yLow + yHigh) / 2 - 8, 8);
  return { from, to, scale: k / (72 / 25.4) };
}

/**
 * The line study over [from, to] (mm along the bar) fitted to the box at one scale, from its top
 * edge, each groove stroked at its width and clipped to the stretch. Returns the scale (times life
 * size) and the height used (points).
 */
export function drawStudy(page: PDFPage, study: LineStudy, box: Box, from = 0, to = study.length): { scale: number; height: number } {
  let low = Infinity;
  let high = -Infinity;
  for (const line of study.lines) for (const [, y] of line.points) [low, high] = [Math.min(low, y), Math.max(high, y)];
  if (!Number.isFinite(low)) return { scale: 0, height: 0 };
  const pad = Math.max(study.width, study.spacing);
  const k = Math.min(box.width / (to - from), box.height / (high - low + 2 * pad));
  const top = box.y + box.height;
  const toPt = ([x, y]: Point): Point => [box.x + (x - from) * k, top - (high + pad - y) * k];
  const width = Math.max(HAIRLINE_PT, study.width * k);
  const height = (high - low + 2 * pad) * k;
  const ops = [pushGraphicsState(), rectangle(box.x, top - height, (to - from) * k, height), clip(), endPath(), setLineWidth(width), setStrokingGrayscaleColor(0.1)];
  for (const line of study.lines) {
    for (const op of path(inColumns(pathWithin(line.points, from, to).map(toPt), COLUMN_PT), false)) ops.push(op);
    ops.push(stroke());
  }
  pushAll(page, ops, [popGraphicsState()]);
  return { scale: k / (72 / 25.4), height };
}
