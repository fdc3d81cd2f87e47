/**
 * JSON with two-space indentation, except that arrays of numbers stay on one line, so a path
 * prints one `[x, y]` point per line. Non-finite numbers print as null, as JSON.stringify does.
 */
export function jsonText(value: unknown, indent = ''): string {
  if (Array.isArray(value)) {
    if (value.every((v) => typeof v === 'number')) return `[${value.map((v) => JSON.stringify(v)).join(', ')}]`;
    if (value.length === 0) return '[]';
    const inner = indent + '  ';
    return `[\n${value.map((v) => inner + jsonText(v, inner)).join(',\n')}\n${indent}]`;
  }
  if (value !== null && typeof value === 'object') {
    const entries = Object.entries(value).filter(([, v]) => v !== undefined);
    if (entries.length === 0) return '{}';
    const inner = indent + '  ';
    return `{\n${entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${jsonText(v, inner)}`).join(',\n')}\n${indent}}`;
  }
  return JSON.stringify(value) ?? 'null';
}
