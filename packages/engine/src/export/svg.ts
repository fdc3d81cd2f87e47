import type { Point } from '../types';
import type { BarDrawing } from './bar-drawing';
import { fixed } from './number-format';

/** Margin around the drawing, mm. */
export const SVG_MARGIN_MM = 5;
const DECIMALS = 4;

/**
 * The bar outline at 1:1 as a W3C SVG 1.1 document, width and height in mm (one user unit = 1 mm).
 * Inside the `bar` group, coordinates are the bar's own (x along the bar, y up, mm): the group
 * flips the SVG's downward y.
 */
export function barSvg(drawing: BarDrawing, title: string): string {
  const m = SVG_MARGIN_MM;
  const width = drawing.length + 2 * m;
  const height = drawing.topY - drawing.backY + 2 * m;
  const top = m + drawing.topY;
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${fixed(width, DECIMALS)}mm" height="${fixed(height, DECIMALS)}mm" viewBox="0 0 ${fixed(width, DECIMALS)} ${fixed(height, DECIMALS)}">`,
    `  <title>${escapeXml(title)}</title>`,
    '  <desc>Pattern bar at 1:1, millimetres. Outline: the cut edge over a drawn band of bar body; dashed: the cutter-centre path; thin: the blank\'s edge before cutting.</desc>',
    `  <g id="bar" transform="translate(${fixed(m, DECIMALS)} ${fixed(top, DECIMALS)}) scale(1 -1)" fill="none" stroke-linejoin="round">`,
    `    <polygon id="bar-outline" fill="#e8e8e8" stroke="#000000" stroke-width="0.1" points="${pointList(drawing.outline)}"/>`,
    `    <polyline id="cutter-path" stroke="#b00020" stroke-width="0.05" stroke-dasharray="0.5 0.5" points="${pointList(drawing.cutterPath)}"/>`,
    `    <line id="blank-edge" stroke="#606060" stroke-width="0.05" x1="0" y1="${fixed(drawing.blankEdgeY, DECIMALS)}" x2="${fixed(drawing.length, DECIMALS)}" y2="${fixed(drawing.blankEdgeY, DECIMALS)}"/>`,
    '  </g>',
    '</svg>',
    '',
  ].join('\n');
}

function pointList(points: readonly Point[]): string {
  return points.map(([x, y]) => `${fixed(x, DECIMALS)},${fixed(y, DECIMALS)}`).join(' ');
}

export function escapeXml(text: string): string {
  return text.replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);
}
