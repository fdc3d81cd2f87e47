import type { StudyData } from './view-data';
import { svgPoints, thinPairs, yRange } from './plot-geometry';

/** How much of the study to show: the whole bar length, or a window about its middle (mm). */
export type StudyWindow = 'whole' | number;

export interface StudyDrawing {
  width: number;
  height: number;
  /** x and y ranges shown (mm). */
  from: number;
  to: number;
  low: number;
  high: number;
  /** One `points` string per engraved line. */
  lines: string[];
  /** Stroke width in viewBox units: the groove's width, or a hairline for a very fine groove. */
  stroke: number;
}

const WIDTH = 1000;
const BUCKETS = 900;
/** Thinnest line drawn, as a fraction of the drawing's width (about one pixel on a phone). */
const HAIRLINE = 1 / 700;

/** The x range (mm) of a window about the middle of a study. */
export function windowRange(study: Pick<StudyData, 'length'>, window: StudyWindow): [number, number] {
  if (window === 'whole' || window >= study.length) return [0, study.length];
  const start = study.length / 2 - window / 2;
  return [start, start + window];
}

/** The lowest and highest y (mm) the study's lines reach between x `from` and `to`, with a groove's room either side. */
export function studyBounds(study: Pick<StudyData, 'lines' | 'width' | 'spacing'>, from: number, to: number): [low: number, high: number] {
  let low = Infinity;
  let high = -Infinity;
  for (const line of study.lines) {
    const [lo, hi] = yRange(line, from, to);
    low = Math.min(low, lo);
    high = Math.max(high, hi);
  }
  if (!Number.isFinite(low)) [low, high] = [0, 1];
  const margin = Math.max(study.width, study.spacing);
  return [low - margin, high + margin];
}

/** The flat line-study drawing at true scale (pure). */
export function studyDrawing(study: StudyData, window: StudyWindow): StudyDrawing {
  const [from, to] = windowRange(study, window);
  const [low, high] = studyBounds(study, from, to);
  const sx = WIDTH / (to - from);
  const scale = { x0: from, y1: high, sx, sy: sx };
  return {
    width: WIDTH,
    height: Math.round((high - low) * sx * 100) / 100,
    from,
    to,
    low,
    high,
    lines: study.lines.map((line) => svgPoints(thinPairs(line, from, to, BUCKETS), scale)),
    stroke: Math.max(study.width * sx, HAIRLINE * WIDTH),
  };
}
