import { MM_PER_INCH, type PhaseSchedule, type RosetteLayer, type ScheduleKind, type Units, type Wave, type WaveShape } from '@barwright/contracts';
import { cleanNumber } from '../units/field-units';

/** A length given in mm, in the design's units. */
const inUnits = (mm: number, units: Units) => cleanNumber(units === 'in' ? mm / MM_PER_INCH : mm);

/**
 * The wave a layer gets when its shape is changed: the new shape's own fields with workable values.
 * A measured table starts as twelve readings of a sine of the layer's amplitude around the base radius,
 * kept as read (a new table is a dial indicator's, not a shape to stretch).
 */
export function waveFor(shape: WaveShape, layer: { amplitude?: unknown }, baseRadius: unknown): Wave {
  switch (shape) {
    case 'flat':
      return { shape, clip: 0.8 };
    case 'fourier':
      return { shape, terms: [{ k: 1, a: 0, b: 1 }, { k: 3, a: 0, b: 0.2 }] };
    case 'measured': {
      const r0 = typeof baseRadius === 'number' && baseRadius > 0 ? baseRadius : 50;
      const half = typeof layer.amplitude === 'number' && layer.amplitude > 0 ? layer.amplitude / 2 : 0.5;
      const points = Array.from({ length: 12 }, (_, i): [number, number] => [i * 30, cleanNumber(Number((r0 + half * Math.cos((i * Math.PI) / 6)).toFixed(5)))]);
      return { shape, points, scale: 'as-read' };
    }
    default:
      return { shape };
  }
}

/** The schedule's own fields with workable values when the kind is changed. */
export function scheduleFor(kind: ScheduleKind): PhaseSchedule {
  switch (kind) {
    case 'ramp':
      return { kind, steps: 6 };
    case 'sine':
      return { kind, period: 24, depth: 0.5 };
    case 'twist':
      return { kind, step: 0.05 };
    case 'list':
      return { kind, phases: [0, 0.25, 0.5, 0.25] };
    default:
      return { kind };
  }
}

/** A round rubber of 1 mm or a flat one 5 mm wide, in the design's units. */
export function rubberFor(shape: 'round' | 'flat', units: Units): { shape: 'round'; radius: number } | { shape: 'flat'; width: number } {
  return shape === 'round' ? { shape, radius: inUnits(1, units) } : { shape, width: inUnits(5, units) };
}

/** A small second layer to add: 3 lobes, 0.2 mm peak to valley, sine. */
export function newLayer(units: Units): RosetteLayer {
  return { lobes: 3, amplitude: inUnits(0.2, units), phase: 0, wave: { shape: 'sine' } };
}
