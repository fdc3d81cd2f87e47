import { XMLParser } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import type { Point } from '../types';
import { DRAWING_TOLERANCE_MM } from './bar-drawing';
import { demoDesign, demoProfile, largestGap } from '../testing/export-fixtures';
import { exportDesign } from './index';
import { SVG_MARGIN_MM } from './svg';

// Read back with fast-xml-parser (an independent XML parser from npm).
async function parsedSvg() {
  const file = await exportDesign(demoDesign, 'svg', { profile: demoProfile });
  const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' });
  return { file, svg: parser.parse(file.content as string).svg };
}

const points = (list: string): Point[] => list.split(' ').map((pair) => pair.split(',').map(Number) as Point);

describe('SVG export', () => {
  it('is a W3C SVG document sized in millimetres at 1:1', async () => {
    const { file, svg } = await parsedSvg();
    expect(file).toMatchObject({ filename: 'bar.svg', mime: 'image/svg+xml' });
    expect(svg.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(svg.width).toBe(`${150 + 2 * SVG_MARGIN_MM}mm`);
    const [, , vbWidth, vbHeight] = svg.viewBox.split(' ').map(Number);
    expect(vbWidth).toBe(150 + 2 * SVG_MARGIN_MM);
    expect(svg.height).toBe(`${vbHeight}mm`);
    expect(svg.title).toContain('24-lobe sine rosette');
  });

  it('draws the bar edge and the cutter path on the profile\'s coordinates (mm)', async () => {
    const { svg } = await parsedSvg();
    expect(svg.g.transform).toMatch(/scale\(1 -1\)/);
    const outline = points(svg.g.polygon.points);
    const edge = outline.slice(0, -2);
    expect(edge[0][0]).toBe(0);
    expect(edge.at(-1)![0]).toBe(150);
    expect(largestGap(demoProfile.barEdge, edge)).toBeLessThan(DRAWING_TOLERANCE_MM + 1e-4);
    const path = points(svg.g.polyline.points);
    expect(largestGap(demoProfile.cutterPath, path)).toBeLessThan(DRAWING_TOLERANCE_MM + 1e-4);
  });

  it('keeps everything drawn inside the page', async () => {
    const { svg } = await parsedSvg();
    const [, , width, height] = svg.viewBox.split(' ').map(Number);
    const [tx, ty] = /translate\(([-\d.]+) ([-\d.]+)\)/.exec(svg.g.transform)!.slice(1).map(Number);
    for (const [x, y] of [...points(svg.g.polygon.points), ...points(svg.g.polyline.points)]) {
      expect(tx + x).toBeGreaterThanOrEqual(0);
      expect(tx + x).toBeLessThanOrEqual(width);
      expect(ty - y).toBeGreaterThanOrEqual(0);
      expect(ty - y).toBeLessThanOrEqual(height);
    }
  });
});
