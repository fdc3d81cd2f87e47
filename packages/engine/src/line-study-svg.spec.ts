import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { XMLParser } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { computeLineStudy, type LineStudy } from './line-study';
import { lineStudySvg } from './line-study-svg';

// fast-xml-parser (npm) reads the drawing back as an independent XML parser.
const parser = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' });
const study = computeLineStudy({ ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lines: 6 } });

function parse(svg: string) {
  return parser.parse(svg).svg as { version: string; viewBox: string; width: string; height: string; rect: { fill: string }; g: { stroke: string; 'stroke-width': string; polyline: { points: string }[] } };
}

describe('lineStudySvg', () => {
  it('is a standalone SVG 1.1 document with its viewBox in millimetres', () => {
    const svg = lineStudySvg(study);
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    const root = parse(svg);
    expect(root.version).toBe('1.1');
    const [x, y, w, h] = root.viewBox.split(' ').map(Number);
    expect([x, y]).toEqual([0, 0]);
    const margin = Math.max(study.width, study.spacing, 0.5);
    expect(w).toBeCloseTo(150 + 2 * margin, 4);
    expect(h).toBeGreaterThan(5 * 0.45);
    expect(parseFloat(root.width) / parseFloat(root.height)).toBeCloseTo(w / h, 3);
  });

  it('draws every line at its points, y up the page, stroked at the groove width', () => {
    const root = parse(lineStudySvg(study));
    expect(root.g.polyline).toHaveLength(6);
    expect(Number(root.g['stroke-width'])).toBeCloseTo(study.width, 4);
    const margin = Math.max(study.width, study.spacing, 0.5);
    const top = Math.max(...study.lines.flatMap((l) => l.points.map((p) => p[1]))) + margin;
    root.g.polyline.forEach((polyline, j) => {
      const points = polyline.points.split(' ').map((pair) => pair.split(',').map(Number));
      expect(points).toHaveLength(study.lines[j].points.length);
      points.forEach(([px, py], k) => {
        expect(px).toBeCloseTo(study.lines[j].points[k][0] + margin, 3);
        expect(py).toBeCloseTo(top - study.lines[j].points[k][1], 3);
      });
    });
  });

  it('keeps a hairline for a groove too fine to see, and draws light ink on a dark ground', () => {
    const fine: LineStudy = { ...study, width: 1e-4 };
    const paper = parse(lineStudySvg(fine, { widthPx: 400 }));
    const [, , w] = paper.viewBox.split(' ').map(Number);
    expect(Number(paper.g['stroke-width'])).toBeCloseTo((0.75 * w) / 400, 4);
    const dark = parse(lineStudySvg(study, { ground: 'dark' }));
    expect(luminance(dark.rect.fill)).toBeLessThan(0.2);
    expect(luminance(dark.g.stroke)).toBeGreaterThan(0.7);
    expect(luminance(paper.rect.fill)).toBeGreaterThan(0.9);
    expect(luminance(paper.g.stroke)).toBeLessThan(0.2);
  });
});

function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
