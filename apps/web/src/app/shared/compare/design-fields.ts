import { parseDesign, type Units } from '@barwright/contracts';
import { catalogueKey, FIELDS, MATERIAL_LABELS, RUBBER_LABELS, SCHEDULE_LABELS, WAVE_LABELS } from '../../features/studio/fields/field-catalogue';
import { convertDesignUnits, formatValue } from '../../features/studio/units/field-units';

/*
 * A design file read field by field in the trade's words: what the comparisons (a version against
 * now, a remix against its parent, bars side by side) lay out as rows.
 */

const ABSENT = '—';
const CHOICE_LABELS: Record<string, Readonly<Record<string, string>>> = {
  'rosette.layers[].wave.shape': WAVE_LABELS,
  'study.schedule.kind': SCHEDULE_LABELS,
  'bar.material': MATERIAL_LABELS,
  'rubber.shape': RUBBER_LABELS,
  units: { mm: 'Millimetres (mm)', in: 'Inches (in)' },
};

export function unitsOf(design: unknown): Units {
  return (design as { units?: unknown } | null)?.units === 'in' ? 'in' : 'mm';
}

/** A valid design converted into `units`; anything else as it is (a field being typed stays comparable). */
export function inUnits(design: unknown, units: Units): unknown {
  const parsed = parseDesign(design);
  return parsed.ok && parsed.design.units !== units ? convertDesignUnits(parsed.design, units) : design;
}

/** Leaf values by dotted path; the layer list is walked, other lists (terms, readings, phases) are one value. */
export function flattenDesign(value: unknown, path = '', out = new Map<string, unknown>()): Map<string, unknown> {
  if (Array.isArray(value) && path === 'rosette.layers') {
    value.forEach((item, i) => flattenDesign(item, `${path}[${i}]`, out));
  } else if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [key, child] of Object.entries(value)) if (key !== 'format') flattenDesign(child, path ? `${path}.${key}` : key, out);
  } else if (path) {
    out.set(path, value);
  }
  return out;
}

/** One field's value written with its unit, choices by their names. */
export function describeField(path: string, value: unknown, units: Units): string {
  if (value === undefined || value === null) return ABSENT;
  const key = catalogueKey(path);
  const choices = CHOICE_LABELS[key];
  if (choices && typeof value === 'string') return choices[value] ?? value;
  if (Array.isArray(value)) return describeList(key, value);
  const info = FIELDS[key];
  if (typeof value === 'number' && info) return formatValue(info.kind, value, units);
  return String(value);
}

function describeList(key: string, list: unknown[]): string {
  if (key.endsWith('.points')) return list.length === 1 ? '1 reading' : `${list.length} readings`;
  if (key.endsWith('.terms')) {
    return list.map((t) => { const { k, a, b } = t as { k: number; a: number; b: number }; return `k ${k}: ${a}, ${b}`; }).join('; ');
  }
  return list.map(String).join(', ');
}
