import { parseDesign, type Design } from '@barwright/contracts';

/** A problem the user can fix (bad arguments or a bad file): printed plainly, exit code 2. */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}

/**
 * Reads and validates a design file's text. Every problem becomes a UsageError whose message
 * names the file and each bad field, e.g. `rosette.layers[0].lobes: must be a whole number`.
 */
export function designFromText(text: string, fileName: string): Design {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new UsageError(`${fileName} is not valid JSON: ${(error as Error).message}`);
  }
  const result = parseDesign(value);
  if (result.ok) return result.design;
  const lines = result.errors.map((e) => `  ${e.path || '(the file)'}: ${e.message}`);
  throw new UsageError([`${fileName} is not a valid design file:`, ...lines].join('\n'));
}
