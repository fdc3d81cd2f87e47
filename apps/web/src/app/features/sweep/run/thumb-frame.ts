import type { SurfaceWindow } from '@barwright/engine';
import type { SweepStudy } from './sweep-types';

/**
 * The plate every thumbnail shows (mm): the same size for every candidate, so the grid compares them
 * at one true scale. 16 × 10 mm holds a few periods of most bars and a dozen lines at usual spacings.
 */
export const THUMB_MM = { width: 16, height: 10 } as const;
/** Where the window starts along the lines (mm): clear of their start, where a groove would end in the picture. */
const THUMB_X0 = 2;

/**
 * The window of a candidate's thumbnail: THUMB_MM, centred on its study's lines (the middle ones when
 * the study is taller), `lineTop` the engraved line's height above its lowest point (mm).
 */
export function thumbWindow(study: Pick<SweepStudy, 'lineSpacing' | 'lines'>, lineTop: number): SurfaceWindow {
  const middle = ((study.lines - 1) * study.lineSpacing + lineTop) / 2;
  return { x0: THUMB_X0, x1: THUMB_X0 + THUMB_MM.width, y0: middle - THUMB_MM.height / 2, y1: middle + THUMB_MM.height / 2 };
}

/** Length the lines are laid to (mm): past the window by a groove's reach, so none ends inside it. */
export function thumbLineLength(window: SurfaceWindow, reach: number): number {
  return window.x1 + reach + 1;
}

/** Highest value of a period array (0 for an empty one). */
export function arrayTop(values: ArrayLike<number>): number {
  let top = 0;
  for (let i = 0; i < values.length; i++) if (values[i] > top) top = values[i];
  return top;
}

/** Pixels of a thumbnail `cssWidth` wide at the device's ratio (at most 2: more costs time and shows nothing new at this size). */
export function thumbPixels(cssWidth: number, devicePixelRatio: number): { widthPx: number; heightPx: number } {
  const ratio = Math.min(2, Math.max(1, devicePixelRatio || 1));
  const widthPx = Math.max(1, Math.round(cssWidth * ratio));
  return { widthPx, heightPx: Math.max(1, Math.round((widthPx * THUMB_MM.height) / THUMB_MM.width)) };
}
