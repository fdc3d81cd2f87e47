/** A measured rosette drawn as a polar plot in a square viewBox of side `size`, centre in the middle. */
export interface PolarPlot {
  size: number;
  /** The closed outline through the readings, in reading order. */
  outline: string;
  /** Each reading as a dot. */
  dots: { x: number; y: number }[];
  /** Rings for the smallest and largest radius, viewBox units. */
  inner: number;
  outer: number;
  /** Radius readings, in the table's units. */
  min: number;
  max: number;
}

const INNER = 0.5;
const OUTER = 0.92;

/**
 * The readings `[degrees, radius]` on a polar plot (pure). The difference between radii is tiny
 * beside the radius itself, so the plot spreads the smallest to largest radius over the outer half
 * of the disc: the wave shows, the true proportions do not (the caption says so). 0° points right,
 * angles turn counter-clockwise.
 */
export function polarPlot(points: readonly (readonly [number, number])[], size = 240): PolarPlot {
  const half = size / 2;
  const radii = points.map((p) => p[1]);
  const min = radii.length ? Math.min(...radii) : 0;
  const max = radii.length ? Math.max(...radii) : 0;
  const span = max - min;
  const inner = INNER * half;
  const outer = OUTER * half;
  const plotRadius = (r: number) => (span > 0 ? inner + ((r - min) / span) * (outer - inner) : (inner + outer) / 2);
  const dots = points.map(([deg, r]) => {
    const a = (deg * Math.PI) / 180;
    const rho = plotRadius(r);
    return { x: round(half + rho * Math.cos(a)), y: round(half - rho * Math.sin(a)) };
  });
  const outline = dots.length ? `M${dots.map((d) => `${d.x},${d.y}`).join('L')}Z` : '';
  return { size, outline, dots, inner: round(inner), outer: round(outer), min, max };
}

const round = (v: number) => Math.round(v * 100) / 100;
