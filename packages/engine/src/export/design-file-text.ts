import type { Design } from '@barwright/contracts';
import { jsonText } from '../cli/json-text';

/** The design file itself (format `barwright.design/1`), as the command-line tool reads it. */
export function designFileText(design: Design): string {
  return jsonText(design) + '\n';
}
