import { pathParts } from './field-catalogue';

/** The value at a dotted path of a design as the document holds it (anything, or undefined). */
export function valueAt(design: unknown, path: string): unknown {
  let node: unknown = design;
  for (const key of pathParts(path)) {
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string | number, unknown>)[key];
  }
  return node;
}
