import type { MaterialId, ScheduleKind, WaveShape } from './design';

/**
 * The one place the app names wave shapes, materials and phase schedules for people: cards,
 * tables, the design page, "What changed" and the studio's menus (which add a few words of
 * explanation after these names) all read these.
 */
export const WAVE_NAMES: Readonly<Record<WaveShape, string>> = {
  sine: 'Sine',
  pointed: 'Pointed',
  scallop: 'Scalloped',
  flat: 'Flat-topped',
  eccentric: 'Eccentric circle',
  fourier: 'Fourier series',
  measured: 'Measured',
};

export const MATERIAL_NAMES: Readonly<Record<MaterialId, string>> = {
  acrylic: 'Acrylic',
  brass: 'Brass',
  a2: 'A2 tool steel',
  custom: 'Custom material',
};

/** Phase schedules, in the order Explore sorts them: plain first, then the patterns, a list last. */
export const SCHEDULE_KINDS = ['none', 'alternate', 'ramp', 'sine', 'twist', 'list'] as const satisfies readonly ScheduleKind[];

/** A phase schedule by the pattern it engraves, the trade's name. */
export const SCHEDULE_NAMES: Readonly<Record<ScheduleKind, string>> = {
  none: 'Plain',
  alternate: 'Barleycorn',
  ramp: 'Basket weave',
  sine: 'Moiré',
  twist: 'Twist',
  list: 'Phase list',
};
