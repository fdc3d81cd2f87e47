import { MM_PER_INCH, type Design, type Units } from '@barwright/contracts';

/** A length in `units` converted to millimetres (inch = 25.4 mm exactly). */
export function toMmValue(value: number, units: Units): number {
  return units === 'in' ? value * MM_PER_INCH : value;
}

/** Converts one length from millimetres to `units`; or, given a millimetre design, the whole design. */
export function fromMm(mm: number, units: Units): number;
export function fromMm(mm: Design, units: Units): Design;
export function fromMm(mm: number | Design, units: Units): number | Design {
  if (typeof mm === 'number') return units === 'in' ? mm / MM_PER_INCH : mm;
  const design = scaleLengths(mm, mm.units === 'in' ? MM_PER_INCH : 1);
  return units === 'in' ? { ...scaleLengths(design, 1 / MM_PER_INCH), units: 'in' } : { ...design, units: 'mm' };
}

/** A copy of the design with every length in millimetres and `units: 'mm'`. */
export function toMm(design: Design): Design {
  const copy = scaleLengths(design, design.units === 'in' ? MM_PER_INCH : 1);
  return { ...copy, units: 'mm' };
}

/**
 * Multiplies every length of the design by `factor`. Angles, counts, ratios, phases and the surface
 * speed (m/min whatever the file units) are left alone; travel speed and chip load are lengths.
 */
function scaleLengths(d: Design, factor: number): Design {
  const len = (v: number) => v * factor;
  return {
    ...d,
    rosette: {
      baseRadius: len(d.rosette.baseRadius),
      layers: d.rosette.layers.map((layer) => ({
        ...layer,
        amplitude: len(layer.amplitude),
        wave:
          layer.wave.shape === 'measured'
            ? { ...layer.wave, points: layer.wave.points.map(([deg, radius]) => [deg, len(radius)] as [number, number]) }
            : structuredClone(layer.wave),
      })),
    },
    rubber: d.rubber.shape === 'round' ? { shape: 'round', radius: len(d.rubber.radius) } : { shape: 'flat', width: len(d.rubber.width) },
    motion: {
      ...d.motion,
      travelPerRev: len(d.motion.travelPerRev),
      ...(d.motion.pivot?.kind === 'rocking' ? { pivot: { kind: 'rocking', distance: len(d.motion.pivot.distance) } } : {}),
    },
    cutter: { ...d.cutter, diameter: len(d.cutter.diameter), ...(d.cutter.offset === undefined ? {} : { offset: len(d.cutter.offset) }) },
    bar: { ...d.bar, length: len(d.bar.length), thickness: len(d.bar.thickness) },
    follower: { radius: len(d.follower.radius) },
    study: {
      ...d.study,
      schedule: structuredClone(d.study.schedule),
      lineSpacing: len(d.study.lineSpacing),
      depth: len(d.study.depth),
    },
    plan: {
      ...d.plan,
      stepOver: len(d.plan.stepOver),
      cleanup: len(d.plan.cleanup),
      travelSpeed: len(d.plan.travelSpeed),
      ...(d.plan.chipLoad === undefined ? {} : { chipLoad: len(d.plan.chipLoad) }),
    },
  };
}
