import { parseDesign, type Units } from '@barwright/contracts';
import { catalogueKey, FIELDS, fieldLabel, MATERIAL_LABELS, RUBBER_LABELS, SCHEDULE_LABELS, WAVE_LABELS } from '../fields/field-catalogue';
import { convertDesignUnits, formatValue } from '../units/field-units';

/** One field that differs between a saved version and now, both sides written with their units. */
export interface FieldDifference {
  path: string;
  label: string;
  before: string;
  after: string;
}

const ABSENT = '—';
const CHOICE_LABELS: Record<string, Readonly<Record<string, string>>> = {
  'rosette.layers[].wave.shape': WAVE_LABELS,
  'study.schedule.kind': SCHEDULE_LABELS,
  'bar.material': MATERIAL_LABELS,
  'rubber.shape': RUBBER_LABELS,
  units: { mm: 'Millimetres (mm)', in: 'Inches (in)' },
};

/**
 * Field-by-field differences between a saved version and the design now, in the trade's words.
 * When both are valid and their units differ, the version is first converted into today's units,
 * so a units switch shows as one line rather than as every length changing.
 */
export function designDifferences(version: unknown, now: unknown): FieldDifference[] {
  const nowUnits = unitsOf(now);
  const comparable = sameUnits(version, nowUnits);
  const before = flatten(comparable);
  const after = flatten(now);
  const paths = [...new Set([...before.keys(), ...after.keys()])];
  const differences: FieldDifference[] = [];
  for (const path of paths) {
    const b = before.get(path);
    const a = after.get(path);
    if (JSON.stringify(b) === JSON.stringify(a)) continue;
    differences.push({ path, label: fieldLabel(path), before: describe(path, b, unitsOf(comparable)), after: describe(path, a, nowUnits) });
  }
  if (unitsOf(version) !== nowUnits && !differences.some((d) => d.path === 'units')) {
    differences.unshift({ path: 'units', label: fieldLabel('units'), before: describe('units', unitsOf(version), nowUnits), after: describe('units', nowUnits, nowUnits) });
  }
  return differences;
}

function unitsOf(design: unknown): Units {
  return (design as { units?: unknown } | null)?.units === 'in' ? 'in' : 'mm';
}

function sameUnits(version: unknown, units: Units): unknown {
  const parsed = parseDesign(version);
  return parsed.ok && parsed.design.units !== units ? convertDesignUnits(parsed.design, units) : version;
}

/** Leaf values by dotted path; the layer list is walked, other lists (terms, readings, phases) are one value. */
function flatten(value: unknown, path = '', out = new Map<string, unknown>()): Map<string, unknown> {
  if (Array.isArray(value) && path === 'rosette.layers') {
    value.forEach((item, i) => flatten(item, `${path}[${i}]`, out));
  } else if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [key, child] of Object.entries(value)) if (key !== 'format') flatten(child, path ? `${path}.${key}` : key, out);
  } else if (path) {
    out.set(path, value);
  }
  return out;
}

function describe(path: string, value: unknown, units: Units): string {
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
