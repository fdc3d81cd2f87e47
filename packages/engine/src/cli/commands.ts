import { MM_PER_INCH, type Design } from '@barwright/contracts';
import { planCut } from '../cut-plan';
import { EXPORT_FORMATS, exportDesign, type ExportFormat } from '../export/index';
import { GCODE_SUMMARY } from '../export/gcode-standard';
import { computeLineStudy } from '../line-study';
import { lineStudySvg } from '../line-study-svg';
import { COMPANIONS, computeProfile, type Companion } from '../profile';
import { UsageError } from './design-file';
import { fileUnits, planInFileUnits, profileInFileUnits } from './file-units';
import { jsonText } from './json-text';

/** What a command may do to the outside world. */
export interface CommandIo {
  stdout(text: string): void;
  writeFile(path: string, content: string | Uint8Array): Promise<void>;
}

export type OptionValues = Record<string, string | boolean | undefined>;

export interface Command {
  summary: string;
  usage: string;
  details: string;
  options: Record<string, { type: 'string' | 'boolean' }>;
  run(design: Design, values: OptionValues, io: CommandIo): Promise<void>;
}

/** Finest sampling the CLI accepts, mm: finer only costs time. */
export const MIN_STEP_MM = 0.001;

const profileCommand: Command = {
  summary: 'the cutter path, bar edge and follower path as JSON',
  usage: 'barwright profile FILE [--step S] [--companion counter-phase|inverted|opposite]',
  details: [
    'Prints { units, period, cutterPath, barEdge, followerPath, minRadiusOfCurvature, crest, warnings }: minRadiusOfCurvature is 0 at a sharp corner, and crest says so in words ("sharp corner at x …").',
    'Paths are [[x, y], ...]: x along the bar, y the height, 0 at the cutter path\'s lowest point.',
    '  --step S   sampling interval along x, in the file\'s units, at least 0.001 mm (default: 1/2000 of the finest',
    '             feature, lobes × harmonic per travel or a measured table\'s spacing, within 0.1 % of the amplitude',
    '             at sharp crests, at most 0.02 mm and 150 000 points; a warning says when the step, yours or the',
    '             default, is coarser than the design needs, by how much, and the step that is fine enough)',
    '  --companion C   a companion of the bar instead: counter-phase (shifted half a period), inverted (the cutter',
    '             path mirrored top to bottom, cut afresh) or opposite (the blank above the cutter in the same cut:',
    '             its edge is the upper envelope of the cutter, the follower rides under it; turned over it is the',
    '             inverted bar)',
  ].join('\n'),
  options: { step: { type: 'string' }, companion: { type: 'string' } },
  async run(design, values, io) {
    const step = stepInMm(design, values.step);
    const companion = companionOf(values.companion);
    const profile = computeProfile(design, { ...(step === undefined ? {} : { step }), ...(companion ? { companion } : {}) });
    io.stdout(jsonText(profileInFileUnits(profile, fileUnits(design.units))) + '\n');
  },
};

const studyCommand: Command = {
  summary: 'the line study\'s engraved lines as JSON, or their SVG drawing',
  usage: 'barwright study FILE [--svg OUT]',
  details: [
    'Prints { units, spacing, width, length, lines: [{ index, phase, points }] } (phase: a fraction of one period).',
    '  --svg OUT   write the drawing of the lines to OUT instead',
  ].join('\n'),
  options: { svg: { type: 'string' } },
  async run(design, values, io) {
    const study = computeLineStudy(design);
    if (typeof values.svg === 'string') {
      await io.writeFile(values.svg, lineStudySvg(study, { units: design.units }));
      io.stdout(`wrote ${values.svg}\n`);
      return;
    }
    const u = fileUnits(design.units);
    const lines = study.lines.map((line) => ({ index: line.index, phase: line.phase, points: u.points(line.points) }));
    io.stdout(jsonText({ units: design.units, spacing: u.length(study.spacing), width: u.length(study.width), length: u.length(study.length), lines }) + '\n');
  },
};

const planCommand: Command = {
  summary: 'the cut plan: depth, passes, time, speeds, warnings and cautions, as JSON',
  usage: 'barwright plan FILE',
  details: [
    'Prints { units, material, surfaceSpeed, depth, passes, minutesPerPass, totalMinutes, rpm, feedPerMinute,',
    'chipLoad, stepOver, warnings, reminders, cautions, heatTreatment? }. Lengths in the file\'s units,',
    'feedPerMinute in the file\'s units per minute, surfaceSpeed in m/min.',
  ].join('\n'),
  options: {},
  async run(design, _values, io) {
    io.stdout(jsonText(planInFileUnits(planCut(design), fileUnits(design.units))) + '\n');
  },
};

/** What each export format holds, for `barwright help export` (the format list itself is the engine's EXPORT_FORMATS). */
const FORMAT_HELP: Readonly<Record<ExportFormat, string>> = {
  pdf: 'a 1:1 printable template with the set-up and the cut plan',
  'pdf-pair': 'the same, with the opposite blank of the cut at 1:1',
  svg: 'bar outline at 1:1 in mm',
  'study-svg': 'the line study as a drawing',
  dxf: 'R12 drawing',
  gcode: GCODE_SUMMARY,
  csv: 'the profile\'s points',
  json: 'the design file itself',
};

const exportCommand: Command = {
  summary: `write the bar as ${EXPORT_FORMATS.join(', ')}`,
  usage: `barwright export FILE --format ${EXPORT_FORMATS.join('|')} [--out OUT]`,
  details: [
    '  --format F   one of:',
    ...EXPORT_FORMATS.map((format) => `                 ${format.padEnd(10)} ${FORMAT_HELP[format]}`),
    '  --out OUT    file to write (default bar followed by the format\'s ending: bar.svg, bar.nc, …)',
    'DXF, G-code and CSV are in the file\'s units.',
  ].join('\n'),
  options: { format: { type: 'string' }, out: { type: 'string' } },
  async run(design, values, io) {
    const format = values.format;
    if (typeof format !== 'string') throw new UsageError(`export needs --format ${EXPORT_FORMATS.join('|')}`);
    if (!(EXPORT_FORMATS as readonly string[]).includes(format)) {
      throw new UsageError(`--format: must be one of ${EXPORT_FORMATS.join(', ')} (got "${format}")`);
    }
    const file = await exportDesign(design, format as ExportFormat);
    const out = typeof values.out === 'string' ? values.out : file.filename;
    await io.writeFile(out, file.content);
    io.stdout(`wrote ${out} (${file.mime}, ${file.content.length} ${typeof file.content === 'string' ? 'characters' : 'bytes'})\n`);
  },
};

export const COMMANDS: Readonly<Record<string, Command>> = {
  profile: profileCommand,
  study: studyCommand,
  plan: planCommand,
  export: exportCommand,
};

/** Reads --companion; undefined when absent. */
function companionOf(raw: string | boolean | undefined): Companion | undefined {
  if (raw === undefined) return undefined;
  if (typeof raw !== 'string' || !(COMPANIONS as readonly string[]).includes(raw)) {
    throw new UsageError(`--companion: must be one of ${COMPANIONS.join(', ')} (got "${String(raw)}")`);
  }
  return raw as Companion;
}

/** Reads --step (file units) as mm; undefined when absent. */
function stepInMm(design: Design, raw: string | boolean | undefined): number | undefined {
  if (raw === undefined || typeof raw === 'boolean') return undefined;
  const value = Number(raw);
  const perUnit = design.units === 'in' ? MM_PER_INCH : 1;
  const minimum = MIN_STEP_MM / perUnit;
  if (raw.trim() === '' || !Number.isFinite(value) || value < minimum || value > design.bar.length) {
    throw new UsageError(`--step: must be a number between ${+minimum.toFixed(6)} and ${design.bar.length} ${design.units} (got "${raw}")`);
  }
  return value * perUnit;
}
