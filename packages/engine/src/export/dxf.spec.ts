import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import type { Point } from '../types';
import { DRAWING_TOLERANCE_MM } from './bar-drawing';
import { demoDesign, demoInInches, demoProfile, largestGap } from '../testing/export-fixtures';
import { exportDesign } from './index';

// Read back with dxf-parser (an independent DXF reader from npm).
async function parsedDxf(design = demoDesign) {
  const file = await exportDesign(design, 'dxf', { profile: demoProfile });
  return { file, dxf: new DxfParser().parseSync(file.content as string)! };
}

function layerPoints(dxf: any, layer: string): { closed: boolean; points: Point[] } {
  const entity = dxf.entities.find((e: any) => e.layer === layer && e.type === 'POLYLINE');
  return { closed: Boolean(entity.shape), points: entity.vertices.map((v: any) => [v.x, v.y]) };
}

describe('DXF export', () => {
  it('is an R12 (AC1009) ASCII file with its units in the header', async () => {
    const { file, dxf } = await parsedDxf();
    expect(file.filename).toBe('bar.dxf');
    expect(dxf.header.$ACADVER).toBe('AC1009');
    expect(dxf.header.$INSUNITS).toBe(4); // millimetres
    expect(dxf.entities.map((e: any) => e.type).sort()).toEqual(['LINE', 'POLYLINE', 'POLYLINE']);
  });

  it('holds the bar outline as a closed polyline on the profile\'s coordinates', async () => {
    const { dxf } = await parsedDxf();
    const outline = layerPoints(dxf, 'OUTLINE');
    expect(outline.closed).toBe(true);
    expect(largestGap(demoProfile.barEdge, outline.points.slice(0, -2))).toBeLessThan(DRAWING_TOLERANCE_MM + 1e-5);
    expect(largestGap(demoProfile.cutterPath, layerPoints(dxf, 'CUTTER_PATH').points)).toBeLessThan(DRAWING_TOLERANCE_MM + 1e-5);
  });

  it('writes an inch design in inches (inch = 25.4 mm, NIST)', async () => {
    const { dxf } = await parsedDxf(demoInInches());
    expect(dxf.header.$INSUNITS).toBe(1);
    const outline = layerPoints(dxf, 'OUTLINE').points;
    expect(outline[outline.length - 3][0]).toBeCloseTo(150 / 25.4, 6);
    expect(largestGap(demoProfile.barEdge, outline.slice(0, -2), 25.4)).toBeLessThan(DRAWING_TOLERANCE_MM + 1e-4);
  });
});
