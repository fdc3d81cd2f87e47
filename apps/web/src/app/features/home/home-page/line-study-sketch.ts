/** Geometry of the decorative line study on the home page, in SVG user units. */
export interface SketchSpec {
  width: number;
  lines: number;
  /** Distance between neighbouring lines (the line spacing). */
  spacing: number;
  /** Peak-to-valley height of each line's wave. */
  amplitude: number;
  /** Length of one wave along the line (bar period). */
  period: number;
  /** Phase shift of line j, as a fraction of a period. */
  phase: (j: number) => number;
}

/** Barleycorn: each line shifted half a period from its neighbour. */
export const barleycorn = (j: number): number => (j % 2) * 0.5;

/**
 * SVG path data for each line: Y_j(x) = j·spacing + (amplitude/2)·sin(2π(x/period + phase(j))).
 * Sampled every `period / 24` so the polyline reads as a smooth curve.
 */
export function lineStudyPaths(spec: SketchSpec): string[] {
  const step = spec.period / 24;
  const paths: string[] = [];
  for (let j = 0; j < spec.lines; j++) {
    const base = spec.amplitude / 2 + j * spec.spacing;
    const points: string[] = [];
    for (let x = 0; x <= spec.width + 1e-9; x += step) {
      const y = base + (spec.amplitude / 2) * Math.sin(2 * Math.PI * (x / spec.period + spec.phase(j)));
      points.push(`${x.toFixed(1)} ${y.toFixed(2)}`);
    }
    paths.push(`M${points.join('L')}`);
  }
  return paths;
}

/** Total height the lines take, for the SVG viewBox. */
export function sketchHeight(spec: SketchSpec): number {
  return spec.amplitude + (spec.lines - 1) * spec.spacing;
}
