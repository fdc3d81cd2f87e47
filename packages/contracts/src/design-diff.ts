import { MATERIAL_NAMES, SCHEDULE_NAMES, WAVE_NAMES } from './design-labels';
import { MM_PER_INCH, type Design, type PhaseSchedule, type RosetteLayer, type Rubber, type Units, type Wave } from './design';

/** One difference between two design files, worded for turners: `text` is "Lobes: 24 → 36". */
export interface DesignChange {
  /** Dotted path of the field in the design file (`cutter.diameter`, `rosette.layers[1]`). */
  path: string;
  label: string;
  /** Each side in its own file's units; null when the field is absent on that side. */
  before: string | null;
  after: string | null;
  text: string;
}

const UNIT_LABELS: Record<Units, string> = { mm: 'millimetres', in: 'inches' };

/** A number to at most 4 decimals, without trailing zeros: 4.7625, 6, 0.003. */
export const formatNumber = (v: number) => String(Number(v.toFixed(4)));

const lengthText = (v: number, units: Units) => `${formatNumber(v)} ${units}`;
const toMm = (v: number, units: Units) => (units === 'in' ? v * MM_PER_INCH : v);

class ChangeList {
  readonly changes: DesignChange[] = [];
  constructor(private readonly a: Design, private readonly b: Design) {}

  add(path: string, label: string, before: string | null, after: string | null) {
    if (before === after) return;
    this.changes.push({ path, label, before, after, text: `${label}: ${before ?? 'none'} → ${after ?? 'none'}` });
  }

  /** A length, compared in millimetres so a change of units alone is not a change of size. */
  length(path: string, label: string, get: (d: Design) => number | undefined, suffix = '') {
    const x = get(this.a);
    const y = get(this.b);
    const ux = this.a.units;
    const uy = this.b.units;
    if (x !== undefined && y !== undefined && Math.abs(toMm(x, ux) - toMm(y, uy)) < 1e-9) return;
    const show = (v: number | undefined, u: Units) => (v === undefined ? null : lengthText(v, u) + suffix);
    this.add(path, label, show(x, ux), show(y, uy));
  }

  plain<T>(path: string, label: string, get: (d: Design) => T, show: (v: T) => string | null = (v) => (v === undefined ? null : formatNumber(Number(v)))) {
    this.add(path, label, show(get(this.a)), show(get(this.b)));
  }
}

const waveText = (w: Wave): string => {
  if (w.shape === 'flat') return `${WAVE_NAMES.flat}, clipped at ${formatNumber(w.clip)}`;
  if (w.shape === 'fourier') return `${WAVE_NAMES.fourier} of ${w.terms.length} terms`;
  if (w.shape === 'measured') return `${WAVE_NAMES.measured}, ${w.points.length} readings`;
  return WAVE_NAMES[w.shape];
};

const scheduleText = (s: PhaseSchedule): string => {
  switch (s.kind) {
    case 'none':
      return `${SCHEDULE_NAMES.none} (every line in phase)`;
    case 'alternate':
      return `${SCHEDULE_NAMES.alternate} (alternate half-period)`;
    case 'ramp':
      return `${SCHEDULE_NAMES.ramp} (ramp of ${s.steps} steps)`;
    case 'sine':
      return `${SCHEDULE_NAMES.sine} (sinusoidal, period ${formatNumber(s.period)} lines, depth ${formatNumber(s.depth)})`;
    case 'twist':
      return `${SCHEDULE_NAMES.twist} (${formatNumber(s.step)} of a period per line)`;
    case 'list':
      return `${SCHEDULE_NAMES.list} of ${s.phases.length} phases`;
  }
};

const rubberText = (r: Rubber, units: Units) =>
  r.shape === 'round' ? `round, ${lengthText(r.radius, units)} radius` : `flat, ${lengthText(r.width, units)} wide`;

function layerChanges(list: ChangeList, a: Design, b: Design) {
  const la = a.rosette.layers;
  const lb = b.rosette.layers;
  const many = la.length > 1 || lb.length > 1;
  if (la.length !== lb.length) list.add('rosette.layers', 'Rosette layers', String(la.length), String(lb.length));
  for (let i = 0; i < Math.max(la.length, lb.length); i++) {
    const path = `rosette.layers[${i}]`;
    const prefix = many ? `Layer ${i + 1} ` : '';
    const cap = (s: string) => (many ? s : s[0].toUpperCase() + s.slice(1));
    const summary = (l: RosetteLayer | undefined, u: Units) => (l ? `${l.lobes} lobes, ${waveText(l.wave)}, ${lengthText(l.amplitude, u)} peak to valley` : null);
    if (!la[i] || !lb[i]) {
      list.add(path, `Layer ${i + 1}`, summary(la[i], a.units), summary(lb[i], b.units));
      continue;
    }
    const at = (d: Design) => d.rosette.layers[i];
    list.plain(`${path}.lobes`, cap(`${prefix}lobes`), (d) => at(d).lobes);
    list.length(`${path}.amplitude`, cap(`${prefix}amplitude (peak to valley)`), (d) => at(d).amplitude);
    list.plain(`${path}.phase`, cap(`${prefix}phase`), (d) => at(d).phase, (v) => `${formatNumber(v)} of a lobe`);
    const wa = la[i].wave;
    const wb = lb[i].wave;
    if (JSON.stringify(wa) === JSON.stringify(wb)) continue;
    const sameCount = (wa.shape === 'fourier' && wb.shape === 'fourier' && wa.terms.length === wb.terms.length) || (wa.shape === 'measured' && wb.shape === 'measured' && wa.points.length === wb.points.length);
    list.add(`${path}.wave`, cap(`${prefix}wave`), waveText(wa), sameCount ? `${waveText(wb)} (values changed)` : waveText(wb));
  }
}

function studyChanges(list: ChangeList, a: Design, b: Design) {
  list.length('study.lineSpacing', 'Line spacing', (d) => d.study.lineSpacing);
  list.plain('study.lines', 'Lines', (d) => d.study.lines);
  const sa = a.study.schedule;
  const sb = b.study.schedule;
  if (JSON.stringify(sa) !== JSON.stringify(sb)) {
    const listChanged = sa.kind === 'list' && sb.kind === 'list' && sa.phases.length === sb.phases.length;
    list.add('study.schedule', 'Phase schedule', scheduleText(sa), listChanged ? `${scheduleText(sb)} (values changed)` : scheduleText(sb));
  }
  list.plain('study.vAngle', 'V-cutter included angle', (d) => d.study.vAngle, (v) => `${formatNumber(v)}°`);
  list.length('study.depth', 'Engraving depth', (d) => d.study.depth);
  const direction = (d: Design) => (d.study.direction === 'as-bar' ? 'as the bar' : 'mirror of the bar');
  list.plain('study.direction', 'Engraved line', direction, (v) => v);
}

/**
 * The differences from `before` to `after`, field by field, in the order a turner reads a set-up:
 * rosette, rubber, motion, cutter, bar, follower, line study, cut plan. Lengths show in each file's
 * own units and count as changed only when their size in millimetres differs.
 */
export function diffDesigns(before: Design, after: Design): DesignChange[] {
  const list = new ChangeList(before, after);
  list.plain('units', 'Units', (d) => d.units, (u) => UNIT_LABELS[u]);
  list.length('rosette.baseRadius', 'Rosette base radius', (d) => d.rosette.baseRadius);
  layerChanges(list, before, after);
  if (before.rubber.shape !== after.rubber.shape) {
    list.add('rubber', 'Rubber', rubberText(before.rubber, before.units), rubberText(after.rubber, after.units));
  } else {
    list.length('rubber.radius', 'Rubber radius', (d) => (d.rubber.shape === 'round' ? d.rubber.radius : undefined));
    list.length('rubber.width', 'Rubber width', (d) => (d.rubber.shape === 'flat' ? d.rubber.width : undefined));
  }
  list.length('motion.travelPerRev', 'Travel per revolution', (d) => d.motion.travelPerRev);
  list.plain('motion.leverRatio', 'Lever ratio', (d) => d.motion.leverRatio);
  list.length('cutter.diameter', 'Cutter diameter', (d) => d.cutter.diameter);
  list.plain('cutter.flutes', 'Cutter flutes', (d) => d.cutter.flutes);
  list.length('bar.length', 'Bar length', (d) => d.bar.length);
  list.length('bar.thickness', 'Bar thickness', (d) => d.bar.thickness);
  list.plain('bar.material', 'Material', (d) => d.bar.material, (m) => MATERIAL_NAMES[m]);
  list.length('follower.radius', 'Follower radius', (d) => d.follower.radius);
  studyChanges(list, before, after);
  list.length('plan.stepOver', 'Step-over per pass', (d) => d.plan.stepOver);
  list.length('plan.cleanup', 'Clean-up depth', (d) => d.plan.cleanup);
  list.length('plan.travelSpeed', 'Travel speed', (d) => d.plan.travelSpeed, '/min');
  list.plain('plan.surfaceSpeed', 'Surface speed', (d) => d.plan.surfaceSpeed, (v) => (v === undefined ? "material's preset" : `${formatNumber(v)} m/min`));
  const chip = (d: Design) => d.plan.chipLoad;
  const ca = chip(before);
  const cb = chip(after);
  if (ca === undefined || cb === undefined) list.add('plan.chipLoad', 'Chip load', ca === undefined ? "material's preset" : `${lengthText(ca, before.units)} per tooth`, cb === undefined ? "material's preset" : `${lengthText(cb, after.units)} per tooth`);
  else list.length('plan.chipLoad', 'Chip load', chip, ' per tooth');
  return list.changes;
}
