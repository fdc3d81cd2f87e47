import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';

const terms = Array.from({ length: 8 }, (_, i) => ({ k: i + 1, a: 1 / (i + 1), b: 0.5 / (i + 1) }));

/**
 * A valid design at the contracts' complexity bounds (rosette detail 4 096, 20 000 crests along a
 * 1 000 mm bar, 12 lines): about 1–2 s per export on one core. For the compute tests and benchmark.
 */
export const HEAVY_DESIGN: Design = {
  ...EXAMPLE_DESIGN,
  rosette: { baseRadius: 50, layers: Array.from({ length: 8 }, (_, i) => ({ lobes: 64, amplitude: 1, phase: i / 8, wave: { shape: 'fourier' as const, terms } })) },
  motion: { travelPerRev: 25.6, leverRatio: 1 },
  bar: { ...EXAMPLE_DESIGN.bar, length: 1000 },
  study: { ...EXAMPLE_DESIGN.study, lines: 12, lineSpacing: 0.01 },
};
