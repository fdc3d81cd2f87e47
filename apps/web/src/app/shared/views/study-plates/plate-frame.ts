import { studyBounds, windowRange, type StudyWindow } from '../study-drawing';
import type { StudyData } from '../view-data';

/** The plate window drawn (mm, y up) and its size on screen (CSS px). */
export interface PlateFrame {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  widthCss: number;
  heightCss: number;
  /** True when the study is taller than the plate drawn: its middle lines are shown. */
  cropped: boolean;
}

/** Tallest a plate is drawn (CSS px); a taller window shows its middle lines. */
export const PLATE_MAX_HEIGHT_PX = 360;

/** The window of the plates (flat and lit) at true scale across `widthCss` pixels (pure). */
export function plateFrame(study: Pick<StudyData, 'lines' | 'length' | 'width' | 'spacing'>, window: StudyWindow, widthCss: number): PlateFrame | null {
  if (widthCss <= 0) return null;
  const [x0, x1] = windowRange(study, window);
  const [low, high] = studyBounds(study, x0, x1);
  const perPx = (x1 - x0) / widthCss;
  const heightCss = Math.round(Math.min(PLATE_MAX_HEIGHT_PX, Math.max(48, (high - low) / perPx)));
  const span = heightCss * perPx;
  const cropped = span < high - low;
  const y0 = cropped ? (low + high) / 2 - span / 2 : low;
  return { x0, x1, y0, y1: y0 + span, widthCss, heightCss, cropped };
}

/**
 * The part of each line (x, y pairs) that can reach the window: one sample either side of
 * [x0 − reach, x1 + reach]. What the painter needs, so only that crosses to its worker.
 */
export function linesInWindow(lines: readonly Float64Array[], x0: number, x1: number, reach: number): Float64Array[] {
  return lines.map((xy) => {
    const n = xy.length / 2;
    let a = 0;
    while (a < n - 1 && xy[2 * (a + 1)] < x0 - reach) a++;
    let b = n - 1;
    while (b > 0 && xy[2 * (b - 1)] > x1 + reach) b--;
    return b >= a ? xy.slice(2 * a, 2 * b + 2) : new Float64Array(0);
  });
}
