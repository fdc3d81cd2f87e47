import { DESIGN_PRESET_FILES, type Design, type Units } from '@barwright/contracts';
import { convertDesignUnits } from '../studio/units/field-units';

/**
 * A one-layer rosette that passes through the readings: base radius halfway between the smallest
 * and largest reading, amplitude (peak to valley) their difference, one lobe (the table covers one
 * whole revolution, every bump of the rosette in it). The engine's measured wave spans [-1, 1] over
 * the readings, so r(θ) = R0 + (A/2)·w(θ) runs from the smallest to the largest reading (pure).
 */
export function rosetteFromReadings(points: readonly (readonly [number, number])[]): Design['rosette'] {
  const radii = points.map((p) => p[1]);
  const min = Math.min(...radii);
  const max = Math.max(...radii);
  const tidy = (v: number) => Number(v.toFixed(6));
  return {
    baseRadius: tidy((min + max) / 2),
    layers: [{ lobes: 1, amplitude: tidy(max - min), phase: 0, wave: { shape: 'measured', points: points.map(([a, r]) => [a, r] as [number, number]) } }],
  };
}

/**
 * The whole design file a new design starts from (pure): the blank preset in the readings' units,
 * its rosette replaced by the readings. The server validates it as any other design file.
 */
export function designFromReadings(points: readonly (readonly [number, number])[], units: Units): Design {
  const start = convertDesignUnits(structuredClone(DESIGN_PRESET_FILES.blank), units);
  return { ...start, rosette: rosetteFromReadings(points) };
}

/** The readings as a file the studio's measured wave takes: `{ "shape": "measured", "points": [[deg, r], …] }`. */
export function measuredWaveJson(points: readonly (readonly [number, number])[]): string {
  const lines = points.map(([a, r]) => `    [${JSON.stringify(a)}, ${JSON.stringify(r)}]`).join(',\n');
  return `{\n  "shape": "measured",\n  "points": [\n${lines}\n  ]\n}\n`;
}
