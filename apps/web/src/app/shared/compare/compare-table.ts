import type { Units } from '@barwright/contracts';
import { catalogueKey, FIELDS, fieldLabel } from '../../features/studio/fields/field-catalogue';
import { describeField, flattenDesign, inUnits, unitsOf } from './design-fields';

/** One row of the side-by-side table: a field or a figure, one value per design. */
export interface CompareRow {
  key: string;
  label: string;
  values: string[];
  /** Per design: differs from the first design's value (the first is never marked). */
  changed: boolean[];
  /** A field of the design file (false: a figure worked out from it). */
  field: boolean;
}

/** The catalogue's order (rosette, rubber, motion, cutter, bar, follower, study, plan), layers in turn. */
const ORDER = Object.keys(FIELDS);
const LAYER_BLOCK = ORDER.findIndex((key) => key.startsWith('rosette.layers[]'));
function byCatalogue(a: string, b: string): number {
  const rank = (path: string) => {
    const i = ORDER.indexOf(catalogueKey(path));
    return i < 0 ? ORDER.length : i;
  };
  const layer = (path: string) => Number(/layers\[(\d+)\]/.exec(path)?.[1] ?? -1);
  // The layers' fields stay together as one block where the catalogue lists them, layer by layer.
  const block = (path: string) => (layer(path) >= 0 ? LAYER_BLOCK : rank(path));
  return block(a) - block(b) || layer(a) - layer(b) || rank(a) - rank(b) || a.localeCompare(b);
}

/**
 * Every field of the designs, one row each, values in `units` (each valid design converted, so a
 * units switch alone changes no length), in the catalogue's order. The `units` row itself says what
 * each file was drawn up in.
 */
export function fieldRows(designs: readonly unknown[], units: Units): CompareRow[] {
  const flat = designs.map((d) => flattenDesign(inUnits(d, units)));
  const own = designs.map(unitsOf);
  const paths = [...new Set(flat.flatMap((f) => [...f.keys()]))].sort(byCatalogue);
  return paths.map((path) => {
    const raw = flat.map((f, i) => (path === 'units' ? own[i] : f.get(path)));
    const values = raw.map((v, i) => describeField(path, v, path === 'units' ? own[i] : units));
    return { key: path, label: fieldLabel(path), values, changed: marks(raw.map((v) => JSON.stringify(v))), field: true };
  });
}

/** Figures worked out per design (period, depth, passes…), rows in the order first met; a design not yet computed shows "…". */
export function figureRows(figures: readonly (readonly { label: string; value: string }[] | null)[]): CompareRow[] {
  const labels = [...new Set(figures.flatMap((f) => (f ?? []).map((x) => x.label)))];
  return labels.map((label) => {
    const values = figures.map((f) => (f ? (f.find((x) => x.label === label)?.value ?? '—') : '…'));
    return { key: `figure:${label}`, label, values, changed: marks(values), field: false };
  });
}

function marks(values: readonly string[]): boolean[] {
  return values.map((v, i) => i > 0 && v !== values[0]);
}
