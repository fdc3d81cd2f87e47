import type { Units } from '@barwright/contracts';
import { fieldLabel } from '../../features/studio/fields/field-catalogue';
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

/**
 * Every field of the designs, one row each, values in `units` (each valid design converted, so a
 * units switch alone changes no length), in the order of the first design's file, then fields only
 * the others have. The `units` row itself says what each file was drawn up in.
 */
export function fieldRows(designs: readonly unknown[], units: Units): CompareRow[] {
  const flat = designs.map((d) => flattenDesign(inUnits(d, units)));
  const own = designs.map(unitsOf);
  const paths = [...new Set(flat.flatMap((f) => [...f.keys()]))];
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
