import type { RosetteObject } from '@barwright/contracts';
import { rosetteRadius } from '@barwright/engine/rosette';

/** Samples of one revolution: 0.5°, fine enough that the sampled curve reads as the smooth curve it is. */
export const OUTLINE_SAMPLES = 720;

export interface RosetteOutline {
  /** SVG path of the rosette's edge in a 100 × 100 box centred on (50, 50). */
  path: string;
  /** Measured readings as points in the same box (the curve passes through them). */
  readings: { x: number; y: number }[];
  /** Smallest and largest radius, in the rosette's units. */
  min: number;
  max: number;
  /** How many times the rise is drawn larger than true (1 when drawn to scale). */
  exaggeration: number;
}

/**
 * The rosette's edge as a closed curve (pure). r(θ) comes from the engine, so a measured table is the
 * engine's periodic interpolation through the readings, not straight segments between them. A rise
 * of a millimetre on a 50 mm rosette would not show at thumbnail size, so the rise is drawn to fill
 * a ring between 62 % and 96 % of the box's half-width when the true rise is smaller than that.
 */
export function rosetteOutline(rosette: RosetteObject, samples = OUTLINE_SAMPLES): RosetteOutline {
  const radius = rosetteRadius(rosette);
  const rs = Float64Array.from({ length: samples }, (_, i) => radius((2 * Math.PI * i) / samples));
  const readingAngles = measuredAngles(rosette);
  const readingRs = readingAngles.map((a) => radius(a));
  let min = Infinity;
  let max = -Infinity;
  for (const r of [...rs, ...readingRs]) {
    min = Math.min(min, r);
    max = Math.max(max, r);
  }
  const outer = 48;
  const trueInner = (min / max) * outer;
  const ringInner = 0.62 * outer;
  const spread = max - min;
  // To scale when the true shape already shows its rise; otherwise the rise fills the ring.
  const toScale = trueInner <= ringInner || spread === 0;
  const scale = (r: number) => (toScale ? (r / max) * outer : ringInner + ((r - min) / spread) * (outer - ringInner));
  const exaggeration = toScale ? 1 : (outer - ringInner) / spread / (outer / max);
  const point = (angle: number, r: number) => ({ x: round(50 + scale(r) * Math.cos(angle)), y: round(50 - scale(r) * Math.sin(angle)) });
  const path = Array.from(rs, (r, i) => {
    const p = point((2 * Math.PI * i) / samples, r);
    return `${i === 0 ? 'M' : 'L'}${p.x} ${p.y}`;
  }).join('') + 'Z';
  return { path, readings: readingAngles.map((a, i) => point(a, readingRs[i])), min, max, exaggeration };
}

/** Angles (radians) of a measured layer's readings on the rosette: each lobe repeats the table. */
function measuredAngles(rosette: RosetteObject): number[] {
  const layer = rosette.layers.find((l) => l.wave.shape === 'measured');
  if (!layer || layer.wave.shape !== 'measured') return [];
  const lobeAngle = (2 * Math.PI) / layer.lobes;
  const offset = -layer.phase * lobeAngle;
  const angles: number[] = [];
  // Every lobe repeats the table; dots stop at OUTLINE_SAMPLES so a many-lobed table stays a drawing.
  for (let k = 0; k < layer.lobes && angles.length + layer.wave.points.length <= OUTLINE_SAMPLES; k++) {
    for (const [deg] of layer.wave.points) angles.push(offset + k * lobeAngle + ((deg * Math.PI) / 180) * (lobeAngle / (2 * Math.PI)));
  }
  return angles;
}

const round = (v: number) => Math.round(v * 100) / 100;
