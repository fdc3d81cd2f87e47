import type { Units } from '@barwright/contracts';
import { formatLength } from './length-format';
import type { LineStudy } from './line-study';

export interface LineStudySvgOptions {
  /** Ink on paper-white (default) or light ink on a dark ground. */
  ground?: 'paper' | 'dark';
  /** Rendered width in pixels (default 800); the viewBox stays in mm. */
  widthPx?: number;
  /** Units of the lengths in the drawing's title (default mm); the drawing itself stays in mm. */
  units?: Units;
}

const GROUNDS = {
  paper: { background: '#f8f5ee', ink: '#1f1c18' },
  dark: { background: '#16181d', ink: '#e8e1d0' },
} as const;

/** Thinnest stroke drawn, in pixels, so a very fine groove still shows as a hairline. */
const HAIRLINE_PX = 0.75;

/**
 * A standalone SVG 1.1 drawing of the line study: viewBox in millimetres (y up the page as the
 * lines are numbered), each line a polyline stroked at the groove's width.
 */
export function lineStudySvg(study: LineStudy, options: LineStudySvgOptions = {}): string {
  const { background, ink } = GROUNDS[options.ground ?? 'paper'];
  const widthPx = options.widthPx ?? 800;
  const len = (mm: number) => formatLength(mm, options.units ?? 'mm');
  const [low, high] = heightRange(study);
  const margin = Math.max(study.width, study.spacing, 0.5);
  const width = study.length + 2 * margin;
  const height = high - low + 2 * margin;
  const heightPx = (widthPx * height) / width;
  const stroke = Math.max(study.width, (HAIRLINE_PX * width) / widthPx);
  const top = high + margin;
  const lines = study.lines.map((line) => {
    const points = line.points.map(([x, y]) => `${num(x + margin)},${num(top - y)}`).join(' ');
    return `<polyline points="${points}"/>`;
  });
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${num(widthPx)}px" height="${num(heightPx)}px" viewBox="0 0 ${num(width)} ${num(height)}">`,
    `<title>Line study: ${study.lines.length} lines at ${len(study.spacing)}, groove ${len(study.width)} wide</title>`,
    `<rect x="0" y="0" width="${num(width)}" height="${num(height)}" fill="${background}"/>`,
    `<g fill="none" stroke="${ink}" stroke-width="${num(stroke)}" stroke-linejoin="round" stroke-linecap="butt">`,
    ...lines,
    '</g>',
    '</svg>',
    '',
  ].join('\n');
}

function heightRange(study: LineStudy): [number, number] {
  let low = Infinity;
  let high = -Infinity;
  for (const line of study.lines) {
    for (const [, y] of line.points) {
      if (y < low) low = y;
      if (y > high) high = y;
    }
  }
  return Number.isFinite(low) ? [low, high] : [0, 0];
}

/** Millimetres to 0.1 µm, without trailing zeros. */
function num(v: number): string {
  return String(Math.round(v * 1e4) / 1e4);
}
