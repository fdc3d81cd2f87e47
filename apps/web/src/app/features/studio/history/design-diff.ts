import { fieldLabel } from '../fields/field-catalogue';
import { describeField, flattenDesign, inUnits, unitsOf } from '../../../shared/compare/design-fields';

/** One field that differs between a saved version and now, both sides written with their units. */
export interface FieldDifference {
  path: string;
  label: string;
  before: string;
  after: string;
}

/**
 * Field-by-field differences between a saved version and the design now, in the trade's words.
 * When both are valid and their units differ, the version is first converted into today's units,
 * so a units switch shows as one line rather than as every length changing.
 */
export function designDifferences(version: unknown, now: unknown): FieldDifference[] {
  const nowUnits = unitsOf(now);
  const comparable = inUnits(version, nowUnits);
  const before = flattenDesign(comparable);
  const after = flattenDesign(now);
  const paths = [...new Set([...before.keys(), ...after.keys()])];
  const differences: FieldDifference[] = [];
  for (const path of paths) {
    const b = before.get(path);
    const a = after.get(path);
    if (JSON.stringify(b) === JSON.stringify(a)) continue;
    differences.push({ path, label: fieldLabel(path), before: describeField(path, b, unitsOf(comparable)), after: describeField(path, a, nowUnits) });
  }
  if (unitsOf(version) !== nowUnits && !differences.some((d) => d.path === 'units')) {
    differences.unshift({ path: 'units', label: fieldLabel('units'), before: describeField('units', unitsOf(version), nowUnits), after: describeField('units', nowUnits, nowUnits) });
  }
  return differences;
}
