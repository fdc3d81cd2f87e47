import type { SurfaceWindow } from '@barwright/engine';
import type { SweepStudy } from './sweep-types';

/**
 * The plate every thumbnail shows (mm): the same size for every candidate, so the grid compares them
 * at one true scale. 16 mm across holds a few periods of most bars; 10 mm high (a dozen lines at
 * usual spacings) where the thumbnail sets its own shape, else as high as the page's box makes it.
 */
export const THUMB_MM = { width: 16, height: 10 } as const;
/** Where the window starts along the lines (mm): clear of their start, where a groove would end in the picture. */
const THUMB_X0 = 2;

/**
 * The window of a candidate's thumbnail: THUMB_MM, centred on its study's lines (the middle ones when
 * the study is taller), `lineTop` the engraved line's height above its lowest point (mm).
 */
export function thumbWindow(study: Pick<SweepStudy, 'lineSpacing' | 'lines'>, lineTop: number, heightMm: number = THUMB_MM.height): SurfaceWindow {
  const middle = ((study.lines - 1) * study.lineSpacing + lineTop) / 2;
  return { x0: THUMB_X0, x1: THUMB_X0 + THUMB_MM.width, y0: middle - heightMm / 2, y1: middle + heightMm / 2 };
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

/**
 * Pixels of a thumbnail of `cssWidth` × `cssHeight` at the device's ratio (at most 2: more costs time
 * and shows nothing new at this size), and the window's height in mm at THUMB_MM.width across.
 */
export function thumbPixels(cssWidth: number, cssHeight: number, devicePixelRatio: number): { widthPx: number; heightPx: number; heightMm: number } {
  const ratio = Math.min(2, Math.max(1, devicePixelRatio || 1));
  const widthPx = Math.max(1, Math.round(cssWidth * ratio));
  const heightPx = Math.max(1, Math.round(cssHeight * ratio));
  return { widthPx, heightPx, heightMm: (THUMB_MM.width * heightPx) / widthPx };
}
