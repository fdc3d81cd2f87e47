import type { DesignPreset } from './boards';
import { EXAMPLE_DESIGN, type Design } from './design';

const withStudy = (study: Partial<Design['study']>, rosette?: Design['rosette']): Design => ({
  ...structuredClone(EXAMPLE_DESIGN),
  ...(rosette ? { rosette } : {}),
  study: { ...EXAMPLE_DESIGN.study, ...study },
});

/**
 * Starting points for a new bar design. Each is a complete, valid design file; the numbers are a
 * workable starting set-up (a 3/16 in end mill on a 150 mm A2 bar), not recommendations.
 */
export const DESIGN_PRESET_FILES: Record<DesignPreset, Design> = {
  blank: withStudy({ schedule: { kind: 'none' } }, { baseRadius: 50, layers: [{ lobes: 12, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] }),
  example: structuredClone(EXAMPLE_DESIGN),
  barleycorn: withStudy({ schedule: { kind: 'alternate' } }, { baseRadius: 50, layers: [{ lobes: 30, amplitude: 1.2, phase: 0, wave: { shape: 'pointed' } }] }),
  'basket-weave': withStudy({ schedule: { kind: 'ramp', steps: 6 }, lines: 48 }, { baseRadius: 50, layers: [{ lobes: 18, amplitude: 1.6, phase: 0, wave: { shape: 'sine' } }] }),
  moire: withStudy({ schedule: { kind: 'sine', period: 24, depth: 0.5 }, lines: 60, lineSpacing: 0.35 }),
};

export const DESIGN_PRESET_LABELS: Record<DesignPreset, string> = {
  blank: 'Plain 12-lobe sine',
  example: '24-lobe sine, barleycorn study',
  barleycorn: 'Barleycorn (pointed, alternate phase)',
  'basket-weave': 'Basket weave (ramped phase)',
  moire: 'Moiré (sinusoidal phase)',
};
