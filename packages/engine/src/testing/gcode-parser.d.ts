// Types for the parts of gcode-parser (npm, no bundled types) that the G-code export spec uses.
declare module 'gcode-parser' {
  export interface ParsedLine {
    line: string;
    words: Array<[string, number]>;
  }
  export function parseLine(line: string, options?: { flatten?: boolean }): ParsedLine;
  export function parseStringSync(text: string): ParsedLine[];
}
