import type { Design } from '@barwright/contracts';
import { planCut } from '../cut-plan';
import { computeLineStudy } from '../line-study';
import { lineStudySvg } from '../line-study-svg';
import { MATERIAL_PRESETS } from '../materials';
import { computeProfile, oppositeProfile } from '../profile';
import type { Point, Profile } from '../types';
import { toMm } from '../units';
import { barDrawing, designTitle } from './bar-drawing';
import { profileCsv } from './csv';
import { designFileText } from './design-file-text';
import { barDxf } from './dxf';
import { barGcode } from './gcode';
import { barPdf } from './pdf';
import { middlePeriod, type PeriodFigure } from './pdf-figures';
import type { Paper } from './pdf-tiles';
import { simplifyPolyline } from './polyline-simplify';
import { setUpLines } from './set-up-lines';
import { barSvg } from './svg';

/**
 * Every file a design can be downloaded as: `pdf-pair` is the PDF with the opposite blank of the same
 * cut added (the shown-and-opposite pair), `study-svg` the line study, `json` the design file the
 * command-line tool reads.
 */
export const EXPORT_FORMATS = ['pdf', 'pdf-pair', 'svg', 'study-svg', 'dxf', 'gcode', 'csv', 'json'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export interface ExportedFile {
  filename: string;
  mime: string;
  content: string | Uint8Array;
}

export interface ExportOptions {
  /** File name without extension; default `bar`. */
  name?: string;
  /** The design's own name, printed on the PDF; default the file name. */
  title?: string;
  /** A profile already computed for this design (mm), to save computing it again. */
  profile?: Profile;
  /** Paper for the PDF template; default A4 for mm designs, Letter for inch designs. */
  paper?: Paper;
}

const FILE_TYPES: Readonly<Record<ExportFormat, { suffix: string; mime: string }>> = {
  pdf: { suffix: '.pdf', mime: 'application/pdf' },
  'pdf-pair': { suffix: '-shown-and-opposite.pdf', mime: 'application/pdf' },
  svg: { suffix: '.svg', mime: 'image/svg+xml' },
  'study-svg': { suffix: '-line-study.svg', mime: 'image/svg+xml' },
  dxf: { suffix: '.dxf', mime: 'image/vnd.dxf' },
  gcode: { suffix: '.nc', mime: 'text/x-gcode' },
  csv: { suffix: '.csv', mime: 'text/csv' },
  json: { suffix: '.barwright.json', mime: 'application/json' },
};

/** G-code follows the path to within this chord tolerance, mm (a tenth of a typical machine's resolution step). */
export const GCODE_TOLERANCE_MM = 0.001;

/** Exports a validated design in one format. SVG is in mm; DXF, G-code and CSV in the design's units. */
export async function exportDesign(design: Design, format: ExportFormat, options: ExportOptions = {}): Promise<ExportedFile> {
  const { suffix, mime } = FILE_TYPES[format];
  const filename = `${options.name ?? 'bar'}${suffix}`;
  if (format === 'json') return { filename, mime, content: designFileText(design) };
  const mm = toMm(design);
  const profile = options.profile ?? computeProfile(design);
  const preset = MATERIAL_PRESETS[design.bar.material];
  const title = designTitle(design, preset.name);
  const drawing = () => barDrawing(mm, profile);
  switch (format) {
    case 'svg':
      return { filename, mime, content: barSvg(drawing(), title) };
    case 'study-svg':
      return { filename, mime, content: lineStudySvg(computeLineStudy(design, profile), { units: design.units }) };
    case 'dxf':
      return { filename, mime, content: barDxf(drawing(), design.units) };
    case 'csv':
      return { filename, mime, content: profileCsv(profile, design.units, GCODE_TOLERANCE_MM) };
    case 'gcode':
      return { filename, mime, content: gcodeFor(design, mm, profile, title) };
    case 'pdf':
    case 'pdf-pair':
      return { filename, mime, content: await pdfFor(design, mm, profile, title, options, format === 'pdf-pair') };
  }
}

async function pdfFor(design: Design, mm: Design, profile: Profile, title: string, options: ExportOptions, pair: boolean): Promise<Uint8Array> {
  const plan = planCut(design, profile);
  const preset = MATERIAL_PRESETS[design.bar.material];
  const opposite = pair ? oppositeProfile(design) : undefined;
  return barPdf({
    name: options.title ?? options.name ?? 'Bar design',
    title,
    units: design.units,
    drawing: barDrawing(mm, profile),
    plan,
    materialName: preset.name,
    setUp: setUpLines(design, preset.name),
    // As the studio lists them: the profile's warnings (one per kind, summarised along the bar), then the plan's.
    warnings: [...profile.warnings, ...plan.warnings],
    period: periodFigure(mm, profile, plan.depth, opposite),
    study: computeLineStudy(design, profile),
    ...(opposite ? { opposite: barDrawing(mm, turnedOver(opposite)) } : {}),
    paper: options.paper,
  });
}

function periodFigure(mm: Design, profile: Profile, depth: number, opposite: Profile | undefined): PeriodFigure {
  const { from, to } = middlePeriod(mm.bar.length, profile.period);
  return {
    from,
    length: mm.bar.length,
    edge: profile.barEdge,
    cutter: profile.cutterPath,
    follower: profile.followerPath,
    ...(opposite ? { upper: opposite.barEdge } : {}),
    period: Math.min(profile.period, to - from),
    depth,
  };
}

/** The opposite blank turned over (y → −y), so its cut edge is on top as the 1:1 tiles draw a bar. */
function turnedOver(profile: Profile): Profile {
  const flip = (points: readonly Point[]): Point[] => points.map(([x, y]) => [x, -y]);
  return { ...profile, cutterPath: flip(profile.cutterPath), barEdge: flip(profile.barEdge), followerPath: flip(profile.followerPath) };
}

function gcodeFor(design: Design, mm: Design, profile: Profile, title: string): string {
  const within = profile.cutterPath.filter(([x]) => x >= -1e-9 && x <= mm.bar.length + 1e-9);
  return barGcode({
    title,
    units: design.units,
    cutterPath: simplifyPolyline(within, GCODE_TOLERANCE_MM),
    plan: planCut(design, profile),
    ...(profile.leadIn && profile.leadOut
      ? { leadIn: simplifyPolyline(profile.leadIn, GCODE_TOLERANCE_MM), leadOut: simplifyPolyline(profile.leadOut, GCODE_TOLERANCE_MM) }
      : {}),
    cutterDiameter: mm.cutter.diameter,
    flutes: mm.cutter.flutes,
    barLength: mm.bar.length,
    barThickness: mm.bar.thickness,
  });
}
