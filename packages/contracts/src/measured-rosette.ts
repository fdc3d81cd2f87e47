/**
 * A measured rosette's readings from a table of angle (degrees) and radius rows, as a turner
 * takes them with a dial indicator: one reading per row, angles increasing from 0 to below 360.
 *   POST /api/rosettes/measured/preview   text/csv (or text/plain) body, or multipart field `table`
 *     → MeasuredPreview (200 even with errors: the preview shows them beside the rows)
 * Separators: comma, semicolon, tab or spaces. Blank lines and lines starting with # are
 * skipped; a first line without numbers (a header such as "angle,radius") is skipped too.
 * Radii are in the units of the design they go into.
 */
export const MEASURED_MIN_POINTS = 8;
export const MEASURED_MAX_POINTS = 3600;
export const MEASURED_TABLE_FIELD = 'table';
export const MEASURED_TABLE_MAX_BYTES = 512 * 1024;

export interface MeasuredRowError {
  /** 1-based line number in the table; null for a problem of the table as a whole. */
  line: number | null;
  message: string;
}

export interface MeasuredPreview {
  /** The readings that parsed, `[degrees, radius]`, in table order. */
  points: [number, number][];
  errors: MeasuredRowError[];
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

function parseRow(cells: string[], line: number, previous: number | undefined): { point?: [number, number]; error?: MeasuredRowError } {
  if (cells.length !== 2) return { error: { line, message: `needs two values, angle and radius; found ${cells.length}` } };
  const [a, r] = cells;
  if (!NUMBER.test(a)) return { error: { line, message: `angle "${a.slice(0, 20)}" is not a number` } };
  if (!NUMBER.test(r)) return { error: { line, message: `radius "${r.slice(0, 20)}" is not a number` } };
  const angle = Number(a);
  const radius = Number(r);
  if (angle < 0 || angle >= 360) return { error: { line, message: `angle ${angle}° is outside 0° to below 360°` } };
  if (!(radius > 0)) return { error: { line, message: `radius ${radius} must be greater than 0` } };
  if (previous !== undefined && angle <= previous) return { error: { line, message: `angle ${angle}° does not increase (the row before has ${previous}°)` } };
  return { point: [angle, radius] };
}

/** Parses the table (pure). Every bad row is reported with its line; good rows are kept. */
export function parseMeasuredTable(text: string): MeasuredPreview {
  const points: [number, number][] = [];
  const errors: MeasuredRowError[] = [];
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  let seenData = false;
  lines.forEach((raw, i) => {
    const row = raw.trim();
    if (!row || row.startsWith('#')) return;
    const cells = row.split(/\s*[,;\t]\s*|\s+/).filter((c) => c !== '');
    if (!seenData && !cells.some((c) => NUMBER.test(c))) return; // the header
    seenData = true;
    const { point, error } = parseRow(cells, i + 1, points.at(-1)?.[0]);
    if (point) points.push(point);
    if (error) errors.push(error);
  });
  if (points.length < MEASURED_MIN_POINTS) errors.push({ line: null, message: `needs at least ${MEASURED_MIN_POINTS} good readings; found ${points.length}` });
  if (points.length > MEASURED_MAX_POINTS) errors.push({ line: null, message: `takes at most ${MEASURED_MAX_POINTS} readings; found ${points.length}` });
  return { points, errors };
}
