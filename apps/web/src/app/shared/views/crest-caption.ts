import type { CrestCurvature } from '@barwright/engine';

/**
 * The profile caption's words for the tightest crest of the bar edge (exact geometry): a sharp
 * corner said as such, never as a small radius. `length` writes a length in mm in the design's units.
 * Given the window drawn (its start and the bar's period, mm), the place is the crest's first repeat
 * inside it, "and every P along the bar", as the warnings are placed.
 */
export function crestCaption(crest: CrestCurvature | undefined, length: (mm: number) => string, window?: { from: number; period: number }): string {
  if (!crest) return '';
  if (crest.x === null || !Number.isFinite(crest.radius)) return 'the bar edge has no crest (a straight bar)';
  const period = window?.period ?? 0;
  const x = period > 0 ? crest.x + Math.ceil((window!.from - crest.x) / period) * period : crest.x;
  const where = `at x ${length(x)}${period > 0 ? ` and every ${length(period)} along the bar` : ''}`;
  if (!crest.corner) return `smallest radius of curvature of the bar's crests ${length(crest.radius)}, ${where}`;
  if (crest.pathRadius > 0) {
    return `the bar's crests come to a sharp corner, first ${where}: the cutter path's tightest crest (radius ${length(crest.pathRadius)}) is tighter than the cutter`;
  }
  return `the bar's crests come to a sharp corner, first ${where} (a corner of the cutter path)`;
}
