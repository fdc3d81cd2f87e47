import { EXAMPLE_DESIGN, parseDesign, type Design } from '@barwright/contracts';
import fc from 'fast-check';

type Layer = Design['rosette']['layers'][number];

const wave = fc.oneof(
  fc.constant({ shape: 'sine' as const }),
  fc.constant({ shape: 'pointed' as const }),
  fc.constant({ shape: 'scallop' as const }),
  fc.double({ min: 0.05, max: 1, noNaN: true }).map((clip) => ({ shape: 'flat' as const, clip })),
  fc
    .array(fc.record({ k: fc.integer({ min: 1, max: 8 }), a: fc.double({ min: -2, max: 2, noNaN: true }), b: fc.double({ min: -2, max: 2, noNaN: true }) }), { minLength: 1, maxLength: 4 })
    .filter((terms) => terms.some((t) => Math.abs(t.a) + Math.abs(t.b) > 0.01))
    .map((terms) => ({ shape: 'fourier' as const, terms })),
  fc
    .array(fc.double({ min: 40, max: 41, noNaN: true }), { minLength: 8, maxLength: 24 })
    .map((radii) => ({ shape: 'measured' as const, points: radii.map((r, i) => [(i * 360) / radii.length, r] as [number, number]) })),
);

/** A layer; eccentric layers get one lobe, as the format requires. */
const layer = (baseRadius: number): fc.Arbitrary<Layer> =>
  fc.oneof(
    fc.record({
      lobes: fc.integer({ min: 1, max: 48 }),
      amplitude: fc.double({ min: 0, max: baseRadius / 8, noNaN: true }),
      phase: fc.double({ min: -2, max: 2, noNaN: true }),
      wave,
    }),
    fc.record({
      lobes: fc.constant(1),
      amplitude: fc.double({ min: 0, max: baseRadius / 8, noNaN: true }),
      phase: fc.double({ min: 0, max: 1, noNaN: true }),
      wave: fc.constant({ shape: 'eccentric' as const }),
    }),
  );

/** Any valid design (checked by the contract's own parser), millimetre or inch. */
export const validDesign: fc.Arbitrary<Design> = fc
  .double({ min: 10, max: 100, noNaN: true })
  .chain((baseRadius) =>
    fc.record({
      baseRadius: fc.constant(baseRadius),
      layers: fc.array(layer(baseRadius), { minLength: 1, maxLength: 3 }),
      rubber: fc.oneof(
        fc.double({ min: 0, max: Math.min(baseRadius, 8), noNaN: true }).map((radius) => ({ shape: 'round' as const, radius })),
        fc.double({ min: 0.2, max: 10, noNaN: true }).map((width) => ({ shape: 'flat' as const, width })),
      ),
      travelPerRev: fc.double({ min: 20, max: 300, noNaN: true }),
      leverRatio: fc.double({ min: 0.5, max: 3, noNaN: true }),
      cutter: fc.double({ min: 0.2, max: 10, noNaN: true }),
      length: fc.double({ min: 5, max: 160, noNaN: true }),
      follower: fc.double({ min: 0, max: 5, noNaN: true }),
      inch: fc.boolean(),
    }),
  )
  .map((p) => {
    const s = p.inch ? 1 / 25.4 : 1;
    const candidate: Design = {
      ...EXAMPLE_DESIGN,
      units: p.inch ? 'in' : 'mm',
      rosette: {
        baseRadius: p.baseRadius * s,
        layers: p.layers.map((l) => ({
          ...l,
          amplitude: l.amplitude * s,
          wave: l.wave.shape === 'measured' ? { shape: 'measured', points: l.wave.points.map(([a, r]) => [a, r * s] as [number, number]) } : l.wave,
        })),
      },
      rubber: p.rubber.shape === 'round' ? { shape: 'round', radius: p.rubber.radius * s } : { shape: 'flat', width: p.rubber.width * s },
      motion: { travelPerRev: p.travelPerRev * s, leverRatio: p.leverRatio },
      cutter: { diameter: p.cutter * s, flutes: 2 },
      bar: { ...EXAMPLE_DESIGN.bar, length: p.length * s, thickness: EXAMPLE_DESIGN.bar.thickness * s },
      follower: { radius: p.follower * s },
      study: { ...EXAMPLE_DESIGN.study, lineSpacing: 0.45 * s, depth: 0.1 * s },
      plan: { stepOver: 0.0762 * s, cleanup: 0.25 * s, travelSpeed: 100 * s },
    };
    return candidate;
  })
  .filter((d) => parseDesign(d).ok);
