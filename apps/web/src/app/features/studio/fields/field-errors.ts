import type { FieldError } from '@barwright/contracts';
import { fieldLabel } from './field-catalogue';

/**
 * The schema's field errors keyed by the field that shows them. An error inside a list that is
 * edited as a whole (a reading of a measured table, one phase of a list) goes to that list's field:
 * `rosette.layers[0].wave.points[3][0]` → `rosette.layers[0].wave.points`. The first message per field wins.
 */
export function errorsByField(errors: readonly FieldError[]): ReadonlyMap<string, string> {
  const byField = new Map<string, string>();
  for (const error of errors) {
    const key = fieldOf(error.path);
    if (!byField.has(key)) byField.set(key, error.message);
  }
  return byField;
}

/** The field that shows an error at `path`. */
export function fieldOf(path: string): string {
  return path.replace(/\.(points|phases)(\[\d+\])+$/, '.$1');
}

/** One line per problem for the summary above the panels: `Layer 1 · Lobes must be at most 360`. */
export function problemLines(errors: ReadonlyMap<string, string>): string[] {
  return [...errors].map(([path, message]) => `${fieldLabel(path)} ${message}`);
}

/** Problems under a panel's paths (`rosette`, `rubber`…), for the count on its header. */
export function countUnder(errors: ReadonlyMap<string, string>, prefixes: readonly string[]): number {
  let n = 0;
  for (const path of errors.keys()) if (prefixes.some((p) => path === p || path.startsWith(`${p}.`) || path.startsWith(`${p}[`))) n++;
  return n;
}
