import type { Units } from '@barwright/contracts';

const POINT = /^file\.rosette\.layers\[0\]\.wave\.points\[(\d+)\]/;

/**
 * One refusal of the design file made from the readings (`POST /api/boards/:id/designs` answers
 * `file.<path>`), in the words of the import page (pure). The rosette's numbers come from the
 * readings, so they are named after them; a base radius out of range most often means the radii
 * are in the other unit.
 */
export function readingsProblem(path: string, message: string, units: Units): string {
  const point = POINT.exec(path);
  if (point) return `Reading ${Number(point[1]) + 1}: ${message}`;
  switch (path) {
    case 'file.rosette.layers[0].wave.points':
      return `The readings: ${message}`;
    case 'file.rosette.baseRadius':
      return `The base radius (halfway between the smallest and largest reading) ${message}. Are the radii really in ${units === 'in' ? 'inches' : 'millimetres'}?`;
    case 'file.rosette.layers':
    case 'file.rosette.layers[0].amplitude':
      return `The peak to valley (largest minus smallest reading): ${message}`;
    case 'file.rubber.radius':
      return `The rubber the new design starts with ${message}`;
    default:
      return `${path.replace(/^file\./, 'Design file ')} ${message}`;
  }
}
