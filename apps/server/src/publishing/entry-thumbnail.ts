import type { Design } from '@barwright/contracts';
import { computeLineStudy, computeProfile, lineStudySvg, type LineStudy } from '@barwright/engine';

/** Width the thumbnail is drawn for, in pixels; its viewBox stays in millimetres. */
export const THUMBNAIL_WIDTH_PX = 480;
/** Width to height of the window shown: a card's proportions. */
const ASPECT = 4 / 3;
/** The window shows at least this many periods of the bar, so the wave reads as a pattern. */
const MIN_PERIODS = 4;

/**
 * The line study of a design, cropped to a card-shaped window at the start of the bar (the study
 * repeats along the bar, so a few periods show the pattern; the whole study of a 150 mm bar is
 * some 0.5 MB of SVG, the window a tenth of that).
 */
export function entryThumbnailSvg(design: Design): string {
  const profile = computeProfile(design);
  const study = computeLineStudy(design, profile);
  return lineStudySvg(cropStudy(study, profile.period), { widthPx: THUMBNAIL_WIDTH_PX });
}

function cropStudy(study: LineStudy, period: number): LineStudy {
  let low = Infinity;
  let high = -Infinity;
  for (const line of study.lines) for (const [, y] of line.points) [low, high] = [Math.min(low, y), Math.max(high, y)];
  const height = Number.isFinite(low) ? high - low : 0;
  const length = Math.min(study.length, Math.max(height * ASPECT, MIN_PERIODS * period));
  const maxHeight = length / ASPECT;
  const lines = study.lines.filter((line) => line.index * study.spacing <= maxHeight || line.index === 0);
  // Coordinates to a power of ten below half a pixel: shorter numbers, no visible change.
  const quantum = 10 ** Math.floor(Math.log10(length / THUMBNAIL_WIDTH_PX / 2));
  return { ...study, length, lines: lines.map((line) => ({ ...line, points: quantise(clipLine(line.points, length), quantum) })) };
}

/** Points rounded to multiples of `quantum` (mm), consecutive repeats dropped. */
function quantise(points: [number, number][], quantum: number): [number, number][] {
  const out: [number, number][] = [];
  for (const [x, y] of points) {
    const p: [number, number] = [Math.round(x / quantum) * quantum, Math.round(y / quantum) * quantum];
    const last = out.at(-1);
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  }
  return out;
}

/** The part of a polyline with x ≤ length, ending exactly at length (interpolated). */
function clipLine(points: [number, number][], length: number): [number, number][] {
  const out: [number, number][] = [];
  for (let i = 0; i < points.length; i++) {
    const [x, y] = points[i];
    if (x <= length) {
      out.push([x, y]);
      continue;
    }
    const [x0, y0] = points[i - 1] ?? points[i];
    const w = x === x0 ? 0 : (length - x0) / (x - x0);
    out.push([length, y0 + w * (y - y0)]);
    break;
  }
  return out;
}
