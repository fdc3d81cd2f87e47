import { EXAMPLE_DESIGN, parseDesign } from '@barwright/contracts';
import { XMLParser } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { designFromText } from '../cli/design-file';
import { computeLineStudy } from '../line-study';
import { computeProfile } from '../profile';
import { demoInInches } from '../testing/export-fixtures';
import { EXPORT_FORMATS, exportDesign } from './index';

// fast-xml-parser (npm) reads the drawing back as an independent XML parser.
const xml = new XMLParser({ ignoreAttributes: false, attributeNamePrefix: '' });

describe('line-study SVG download', () => {
  it('is the line study as an SVG 1.1 drawing, one polyline per line, named for the design', async () => {
    const design = { ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, lines: 12 } };
    const file = await exportDesign(design, 'study-svg', { name: 'guild-reference' });
    expect(file).toMatchObject({ filename: 'guild-reference-line-study.svg', mime: 'image/svg+xml' });
    const root = xml.parse(file.content as string).svg;
    expect(root.version).toBe('1.1');
    expect(root.title).toBe('Line study: 12 lines at 0.45 mm, groove 0.346 mm wide');
    expect(root.g.polyline).toHaveLength(12);
    const study = computeLineStudy(design, computeProfile(design));
    const first = (root.g.polyline[0].points as string).split(' ');
    expect(first).toHaveLength(study.lines[0].points.length);
  });

  it('titles an inch design in inches', async () => {
    const file = await exportDesign(demoInInches(), 'study-svg');
    expect(xml.parse(file.content as string).svg.title).toMatch(/ in apart| in,| in wide/);
  });
});

describe('design file download', () => {
  it('is the design file itself, which the command-line tool reads back to the same design', async () => {
    const file = await exportDesign(EXAMPLE_DESIGN, 'json', { name: 'guild-reference' });
    expect(file).toMatchObject({ filename: 'guild-reference.barwright.json', mime: 'application/json' });
    const text = file.content as string;
    expect(JSON.parse(text)).toEqual(EXAMPLE_DESIGN);
    expect(designFromText(text, 'guild-reference.barwright.json')).toEqual(EXAMPLE_DESIGN);
    expect(parseDesign(JSON.parse(text)).ok).toBe(true);
  });

  it('keeps an inch design in inches, exactly as stored', async () => {
    const design = demoInInches();
    const file = await exportDesign(design, 'json');
    expect(JSON.parse(file.content as string)).toEqual(design);
  });
});

describe('export formats', () => {
  it('offers every download the web lists: PDF (alone or with the opposite blank), bar SVG, line-study SVG, DXF, G-code, CSV and the design file', () => {
    expect([...EXPORT_FORMATS].sort()).toEqual(['csv', 'dxf', 'gcode', 'json', 'pdf', 'pdf-pair', 'study-svg', 'svg']);
  });
});
