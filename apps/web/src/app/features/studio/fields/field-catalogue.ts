import { MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES, type MaterialId, type ScheduleKind, type StudyDirection, type WaveShape } from '@barwright/contracts';

/**
 * What a field of the design file measures, so the editor can show its unit and compare it in the
 * trade's words: a length in the file's units, a speed in file units per minute, and so on.
 */
export type FieldKind = 'length' | 'speed' | 'surfaceSpeed' | 'count' | 'angle' | 'lobeFraction' | 'periodFraction' | 'ratio' | 'fraction' | 'lines' | 'choice' | 'list';

export interface FieldInfo {
  label: string;
  kind: FieldKind;
  /** Slider range in millimetres for lengths and speeds (converted for inch files), else in the field's own terms. */
  slider?: readonly [number, number];
}

/** Field paths with list indices written `[]`: `rosette.layers[].lobes`. */
export const FIELDS: Readonly<Record<string, FieldInfo>> = {
  units: { label: 'Design units', kind: 'choice' },
  'rosette.baseRadius': { label: 'Base radius', kind: 'length', slider: [5, 150] },
  'rosette.layers[].lobes': { label: 'Lobes', kind: 'count', slider: [1, 120] },
  'rosette.layers[].amplitude': { label: 'Amplitude, peak to valley', kind: 'length', slider: [0, 10] },
  'rosette.layers[].phase': { label: 'Phase', kind: 'lobeFraction', slider: [0, 1] },
  'rosette.layers[].wave.shape': { label: 'Wave shape', kind: 'choice' },
  'rosette.layers[].wave.clip': { label: 'Clip level', kind: 'fraction', slider: [0.05, 1] },
  'rosette.layers[].wave.terms': { label: 'Fourier terms', kind: 'list' },
  'rosette.layers[].wave.terms[].k': { label: 'Harmonic', kind: 'count' },
  'rosette.layers[].wave.terms[].a': { label: 'Cosine coefficient', kind: 'ratio' },
  'rosette.layers[].wave.terms[].b': { label: 'Sine coefficient', kind: 'ratio' },
  'rosette.layers[].wave.points': { label: 'Measured readings', kind: 'list' },
  'rosette.layers[].wave.scale': { label: 'Readings taken', kind: 'choice' },
  'rubber.shape': { label: 'Rubber shape', kind: 'choice' },
  'rubber.radius': { label: 'Rubber radius', kind: 'length', slider: [0, 10] },
  'rubber.width': { label: 'Flat rubber width', kind: 'length', slider: [0.5, 30] },
  'motion.travelPerRev': { label: 'Travel per revolution', kind: 'length', slider: [10, 400] },
  'motion.leverRatio': { label: 'Lever ratio', kind: 'ratio', slider: [0.1, 5] },
  'motion.pivot.kind': { label: 'Headstock motion', kind: 'choice' },
  'motion.pivot.distance': { label: 'Rocking axis to centre line', kind: 'length', slider: [20, 500] },
  'cutter.diameter': { label: 'End mill diameter', kind: 'length', slider: [0.5, 20] },
  'cutter.flutes': { label: 'Flutes', kind: 'count', slider: [1, 8] },
  'cutter.offset': { label: 'Off the centre line', kind: 'length', slider: [-5, 5] },
  'bar.length': { label: 'Bar length', kind: 'length', slider: [10, 500] },
  'bar.thickness': { label: 'Bar thickness', kind: 'length', slider: [1, 30] },
  'bar.material': { label: 'Material', kind: 'choice' },
  'follower.radius': { label: 'Follower radius', kind: 'length', slider: [0, 10] },
  'study.lineSpacing': { label: 'Line spacing', kind: 'length', slider: [0.05, 3] },
  'study.lines': { label: 'Number of lines', kind: 'count', slider: [1, 200] },
  'study.schedule.kind': { label: 'Phase schedule', kind: 'choice' },
  'study.schedule.steps': { label: 'Ramp steps', kind: 'count', slider: [2, 50] },
  'study.schedule.period': { label: 'Moiré period', kind: 'lines', slider: [2, 200] },
  'study.schedule.depth': { label: 'Moiré depth', kind: 'periodFraction', slider: [0, 1] },
  'study.schedule.step': { label: 'Twist per line', kind: 'periodFraction', slider: [-0.5, 0.5] },
  'study.schedule.phases': { label: 'Phase list', kind: 'list' },
  'study.vAngle': { label: 'V-cutter included angle', kind: 'angle', slider: [30, 170] },
  'study.depth': { label: 'Groove depth', kind: 'length', slider: [0, 1] },
  'study.direction': { label: 'Engraved line', kind: 'choice' },
  'plan.stepOver': { label: 'Step-over per pass', kind: 'length', slider: [0.01, 2] },
  'plan.cleanup': { label: 'Clean-up depth', kind: 'length', slider: [0, 2] },
  'plan.travelSpeed': { label: 'Travel speed', kind: 'speed', slider: [10, 2000] },
  'plan.surfaceSpeed': { label: 'Surface speed', kind: 'surfaceSpeed', slider: [10, 400] },
  'plan.chipLoad': { label: 'Chip load per tooth', kind: 'length', slider: [0.005, 0.2] },
};

// Names from the one table in the contracts; the menus add a few words on what each is.
export const WAVE_LABELS: Readonly<Record<WaveShape, string>> = {
  sine: WAVE_NAMES.sine,
  pointed: `${WAVE_NAMES.pointed} (triangle)`,
  scallop: `${WAVE_NAMES.scallop} (arcs meeting in cusps)`,
  flat: `${WAVE_NAMES.flat} (clipped)`,
  eccentric: WAVE_NAMES.eccentric,
  fourier: WAVE_NAMES.fourier,
  measured: `${WAVE_NAMES.measured} (table of readings)`,
};

export const SCHEDULE_LABELS: Readonly<Record<ScheduleKind, string>> = {
  none: `${SCHEDULE_NAMES.none} (every line in phase)`,
  alternate: `${SCHEDULE_NAMES.alternate} (alternate half-period)`,
  ramp: `${SCHEDULE_NAMES.ramp} (triangular ramp)`,
  sine: `${SCHEDULE_NAMES.sine} (sinusoidal)`,
  twist: `${SCHEDULE_NAMES.twist} (linear)`,
  list: `${SCHEDULE_NAMES.list} (your own phases)`,
};

export const MATERIAL_LABELS: Readonly<Record<MaterialId, string>> = {
  acrylic: `${MATERIAL_NAMES.acrylic} (cast, trial cut)`,
  brass: `${MATERIAL_NAMES.brass} (free-machining)`,
  a2: `${MATERIAL_NAMES.a2} (keeper)`,
  custom: `${MATERIAL_NAMES.custom} (own figures)`,
};

export const PIVOT_LABELS: Readonly<Record<'linear' | 'rocking', string>> = {
  linear: 'Straight line (pumping)',
  rocking: 'Rocking about an axis',
};

export const STUDY_DIRECTION_LABELS: Readonly<Record<StudyDirection, string>> = {
  mirrored: 'Mirror of the bar',
  'as-bar': 'Same way as the bar',
};

export const MEASURED_SCALE_LABELS: Readonly<Record<'as-read' | 'to-amplitude', string>> = {
  'as-read': 'As read (the table’s own rise)',
  'to-amplitude': 'Scaled to the layer’s amplitude',
};

export const RUBBER_LABELS: Readonly<Record<'round' | 'flat', string>> = { round: 'Round', flat: 'Flat' };

/** The catalogue key of a dotted path: `rosette.layers[2].lobes` → `rosette.layers[].lobes`. */
export function catalogueKey(path: string): string {
  return path.replace(/\[\d+\]/g, '[]');
}

/** The path as an array for the document: `rosette.layers[2].lobes` → `['rosette', 'layers', 2, 'lobes']`. */
export function pathParts(path: string): (string | number)[] {
  const parts: (string | number)[] = [];
  for (const piece of path.split('.')) {
    const match = /^([^[\]]*)((?:\[\d+\])*)$/.exec(piece);
    if (!match) return [];
    if (match[1]) parts.push(match[1]);
    for (const index of match[2].matchAll(/\[(\d+)\]/g)) parts.push(Number(index[1]));
  }
  return parts;
}

/** The dotted form of a path array: `['rosette', 'layers', 2, 'lobes']` → `rosette.layers[2].lobes`. */
export function pathKey(parts: readonly (string | number)[]): string {
  return parts.reduce<string>((s, key) => (typeof key === 'number' ? `${s}[${key}]` : s ? `${s}.${key}` : key), '');
}

/** A field's name in the trade's words with its place: `Layer 2 · Lobes`, `Term 1 · Harmonic`. */
export function fieldLabel(path: string): string {
  const info = FIELDS[catalogueKey(path)];
  const layer = /^rosette\.layers\[(\d+)\]/.exec(path);
  const term = /\.terms\[(\d+)\]/.exec(path);
  const base = info?.label ?? fallbackLabel(path);
  const place = [layer ? `Layer ${Number(layer[1]) + 1}` : '', term ? `Term ${Number(term[1]) + 1}` : ''].filter(Boolean);
  return place.length > 0 ? `${place.join(' · ')} · ${base}` : base;
}

function fallbackLabel(path: string): string {
  if (path === '' ) return 'Design file';
  if (path === 'rosette.layers' || /^rosette\.layers\[\d+\]$/.test(path)) return 'Rosette layers';
  const last = pathParts(path).filter((p) => typeof p === 'string').pop() ?? path;
  return String(last).replace(/([A-Z])/g, ' $1').replace(/^./, (c) => c.toUpperCase());
}
