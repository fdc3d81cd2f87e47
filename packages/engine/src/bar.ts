import type { Design } from '@barwright/contracts';
import { lowerDiscEnvelope } from './disc-envelope';
import { reducedPhase } from './phase-schedule';
import { rosetteRepeats } from './rosette';

/** Cutter-centre heights y = k·(s − sMin) (mm) from the rubber's displacements s. */
export function cutterHeights(s: Float64Array, leverRatio: number, sMin: number): Float64Array {
  const y = new Float64Array(s.length);
  for (let i = 0; i < s.length; i++) y[i] = leverRatio * (s[i] - sMin);
  return y;
}

/**
 * The bar edge under a cutter of radius rc whose centre runs through heights y sampled every
 * `step` mm: the lower envelope of the cutter disc (the bar region eroded by the disc). Never above
 * y − rc, and equal to it where the path is flat.
 */
export function barEdge(cutter: Float64Array, step: number, cutterRadius: number): Float64Array {
  return lowerDiscEnvelope(cutter, step, cutterRadius);
}

/**
 * The counter-phase companion: the same bar shifted half a period along x. Done on the rosette,
 * so it is exact for every wave: x + P/2 is θ + π/G, which moves each layer's phase by Nᵢ/(2G) of a lobe.
 */
export function counterPhaseDesign(design: Design): Design {
  const repeats = rosetteRepeats(design.rosette);
  return {
    ...design,
    rosette: {
      ...design.rosette,
      layers: design.rosette.layers.map((l) => ({ ...l, phase: reducedPhase(reducedPhase(l.phase) + l.lobes / (2 * repeats)) })),
    },
  };
}

/**
 * The inverted companion: the cutter path mirrored top to bottom (crests become valleys), y' = yMax − y.
 * It differs from counter-phase whenever crests and valleys differ in shape (flat tops, cusps,
 * rounding by the rubber); the bar edge of the inverted path is eroded afresh, not mirrored.
 */
export function invertHeights(cutter: Float64Array, yMax: number): Float64Array {
  const y = new Float64Array(cutter.length);
  for (let i = 0; i < cutter.length; i++) y[i] = yMax - cutter[i];
  return y;
}
