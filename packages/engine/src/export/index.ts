import type { Design } from '@barwright/contracts';
import { planCut } from '../cut-plan';
import { MATERIAL_PRESETS } from '../materials';
import { computeProfile } from '../profile';
import type { Profile } from '../types';
import { toMm } from '../units';
import { barDrawing, designTitle } from './bar-drawing';
import { profileCsv } from './csv';
import { barDxf } from './dxf';
import { barGcode } from './gcode';
import { barPdf } from './pdf';
import type { Paper } from './pdf-tiles';
import { simplifyPolyline } from './polyline-simplify';
import { barSvg } from './svg';

export const EXPORT_FORMATS = ['svg', 'dxf', 'gcode', 'csv', 'pdf'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

export interface ExportedFile {
  filename: string;
  mime: string;
  content: string | Uint8Array;
}

export interface ExportOptions {
  /** File name without extension; default `bar`. */
  name?: string;
  /** A profile already computed for this design (mm), to save computing it again. */
  profile?: Profile;
  /** Paper for the PDF template; default A4 for mm designs, Letter for inch designs. */
  paper?: Paper;
}

const FILE_TYPES: Readonly<Record<ExportFormat, { extension: string; mime: string }>> = {
  svg: { extension: 'svg', mime: 'image/svg+xml' },
  dxf: { extension: 'dxf', mime: 'image/vnd.dxf' },
  gcode: { extension: 'nc', mime: 'text/x-gcode' },
  csv: { extension: 'csv', mime: 'text/csv' },
  pdf: { extension: 'pdf', mime: 'application/pdf' },
};

/** G-code follows the path to within this chord tolerance, mm (a tenth of a typical machine's resolution step). */
export const GCODE_TOLERANCE_MM = 0.001;

/** Exports a validated design in one format. SVG is in mm; DXF, G-code and CSV in the design's units. */
export async function exportDesign(design: Design, format: ExportFormat, options: ExportOptions = {}): Promise<ExportedFile> {
  const { extension, mime } = FILE_TYPES[format];
  const filename = `${options.name ?? 'bar'}.${extension}`;
  const mm = toMm(design);
  const profile = options.profile ?? computeProfile(design);
  const preset = MATERIAL_PRESETS[design.bar.material];
  const title = designTitle(design, preset.name);
  const drawing = () => barDrawing(mm, profile);
  switch (format) {
    case 'svg':
      return { filename, mime, content: barSvg(drawing(), title) };
    case 'dxf':
      return { filename, mime, content: barDxf(drawing(), design.units) };
    case 'csv':
      return { filename, mime, content: profileCsv(profile, design.units) };
    case 'gcode':
      return { filename, mime, content: gcodeFor(design, mm, profile, title) };
    case 'pdf': {
      const plan = planCut(design, profile);
      const content = await barPdf({ title, units: design.units, drawing: drawing(), plan, materialName: preset.name, paper: options.paper });
      return { filename, mime, content };
    }
  }
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
