import { MM_PER_INCH, type Design, type MaterialId } from '@barwright/contracts';

/**
 * Material presets for the cut plan. Lengths in mm, surface speed in m/min.
 *
 * The figures are starting points for a small carbide end mill of about 3/16 in (4.7625 mm)
 * on a rose engine's cutting frame, where the pass is a light side cut along the bar edge.
 * Each figure names where it comes from. Always defer to the cutter maker's and the material
 * supplier's data.
 */
export interface MaterialPreset {
  id: MaterialId;
  name: string;
  /** Surface speed Vc, m/min. */
  surfaceSpeed: number;
  /** Chip load per tooth for a 3/16 in (4.7625 mm) end mill, mm. */
  chipLoad: number;
  /** Largest depth to take in one pass (the step-over into the bar edge), mm; unknown for custom. */
  maxStepOver?: number;
  /** Plan values that suit the material for a 3/16 in cutter: step-over (mm) and travel (mm/min). */
  defaults: { stepOver: number; travelSpeed: number };
  hardness: string;
  /** What to cut it with and how to cool it; shown as a set-up reminder. */
  cutting: string;
  heatTreatment?: string[];
}

/** The cutter diameter the presets' chip loads are stated for, mm (3/16 in). */
export const PRESET_CUTTER_DIAMETER_MM = 4.7625;

/** The last heat-treatment note of every steel: the figures are typical, the supplier's sheet for the very bar rules. */
export const HEAT_TREATMENT_DEFERRAL = 'Typical values: follow your steel supplier\'s data sheet.';

export const MATERIAL_PRESETS: Readonly<Record<MaterialId, MaterialPreset>> = {
  acrylic: {
    id: 'acrylic',
    name: 'cast acrylic',
    // ~300 SFM, the low end of the usual range for plastics with carbide (common practice: plastics
    // tolerate a wide speed range; the limit is heat). Kept low so the chip stays thick at
    // rose-engine travel speeds and the acrylic cuts instead of melting (from memory).
    surfaceSpeed: 90,
    // 0.002 in per tooth for a 3/16 in cutter: low end of plastic chip-load charts (from memory).
    chipLoad: 0.05,
    // About a third of the cutter diameter in a side cut (common practice for plastics, from memory).
    maxStepOver: 1.5,
    // Full depth of a demo bar in one or two passes at a brisk travel (common practice for a trial cut).
    defaults: { stepOver: 1.0, travelSpeed: 500 },
    // Rockwell M 90–100 for cast acrylic sheet (suppliers' data sheets, from memory).
    hardness: 'about Rockwell M 90–100',
    cutting: 'Cast acrylic: sharp carbide end mill, air blast to clear chips; no solvent-based coolant (it crazes acrylic).',
  },
  brass: {
    id: 'brass',
    name: 'free-machining brass (C36000)',
    // ~300 SFM: conservative for C36000, whose machinability rating is the 100 % reference
    // of the copper alloys (copper-alloy supplier data; the figure itself from memory).
    surfaceSpeed: 90,
    // 0.001 in per tooth for a 3/16 in cutter (from memory; end-mill makers' tables for brass).
    chipLoad: 0.0254,
    // 0.010 in per pass for a clean edge on a light machine (common practice, from memory).
    maxStepOver: 0.254,
    defaults: { stepOver: 0.254, travelSpeed: 300 },
    // About Rockwell B 78 for half-hard rod (copper-alloy supplier data, from memory).
    hardness: 'about HRB 78 (half-hard rod)',
    cutting: 'Brass: cut dry with a sharp cutter; a zero-rake or well-honed edge keeps it from grabbing.',
  },
  a2: {
    id: 'a2',
    name: 'A2 tool steel, annealed',
    // ~200 SFM with carbide in annealed A2 (from memory; end-mill makers' tables give
    // roughly 150–250 SFM for annealed tool steels).
    surfaceSpeed: 61,
    // 0.0005 in per tooth for a 3/16 in cutter (from memory; same tables).
    chipLoad: 0.0127,
    // No more than 0.003 in per pass in A2 (common practice).
    maxStepOver: 0.0762,
    // 100 mm/min matches rpm × flutes × chip load for a 2-flute 3/16 in cutter at 61 m/min.
    defaults: { stepOver: 0.0762, travelSpeed: 100 },
    // Annealed A2 is about 200–250 HB (steel makers' data sheets give at most about 235–250 HB annealed;
    // ASTM A681 sets each grade's maximum annealed hardness; from memory).
    hardness: 'about 200–250 HB annealed',
    cutting: 'A2: carbide end mill, cutting oil or mist, light passes; keep a real chip, never let the cutter rub.',
    // Provenance of the heat-treatment notes, line by line (the screen and the PDF name the handbook, not these details):
    // - Air hardening, preheat about 790 °C (1450 °F), austenitize 925–980 °C (1700–1800 °F), soak 20–45 min
    //   once through-heated, cool in still air to 50–65 °C (125–150 °F), temper at once: the A2 entry of the
    //   ASM Heat Treater's Guide (ASM International; the same figures recur in ASM Handbook Vol. 4 and in
    //   steel makers' A2 data sheets). The handbook itself was not at hand: the figures are from memory,
    //   checked against public copies of that entry's procedure (preheat 788 °C / 1450 °F, austenitize
    //   about 960 °C / 1760 °F, cool to 66–51 °C / 150–125 °F, temper 177 °C / 350 °F for about HRC 62).
    // - Double temper about 2 h each, 175–205 °C (350–400 °F) for about HRC 60–62: the handbook's tempering
    //   curve for A2 as above (HRC 62 at 177 °C, falling to about HRC 56 at 540 °C).
    // - Foil wrap against decarburisation, and HRC 57–62 as a pattern bar's aim: common practice.
    // The last line is the one the turner must act on: these are typical values, the supplier's sheet rules.
    heatTreatment: [
      'A2 is air-hardening: harden only after the bar is cut and the trial cut is approved.',
      'Wrap the bar in stainless foil (or use a controlled atmosphere) against decarburisation and scale (common practice).',
      'Preheat to about 790 °C (1450 °F), then austenitize at 925–980 °C (1700–1800 °F); soak about 20–45 minutes once through-heated (ASM Heat Treater\'s Guide, A2).',
      'Cool in still air to hand-warm, about 50–65 °C (125–150 °F) (same source).',
      'Temper at once, twice, about 2 hours each: 175–205 °C (350–400 °F) gives about HRC 60–62, hotter gives less (same source\'s tempering curve).',
      'Aim for about HRC 57–62 for a pattern bar (common practice).',
      HEAT_TREATMENT_DEFERRAL,
    ],
  },
  custom: {
    id: 'custom',
    name: 'custom material',
    // Placeholders only: a custom material takes plan.surfaceSpeed and plan.chipLoad from the file.
    surfaceSpeed: 0,
    chipLoad: 0,
    defaults: { stepOver: 0.1, travelSpeed: 100 },
    hardness: 'not known',
    cutting: 'Custom material: the depth per pass is not checked; start light and follow the supplier\'s data.',
  },
};

/** The cutting figures a plan uses for a design: the preset, with plan overrides applied (mm, m/min). */
export interface CuttingFigures {
  preset: MaterialPreset;
  surfaceSpeed: number;
  /** Chip load per tooth for this design's cutter, mm. */
  chipLoad: number;
}

/**
 * Picks the figures for a design. `chipLoadMm` is the file's override already in mm.
 * A preset's chip load is scaled in proportion to the cutter diameter (from memory: makers'
 * tables grow roughly in proportion for small end mills), within 0.25×–3× of the 3/16 in figure.
 */
export function cuttingFigures(design: Design, cutterDiameterMm: number, chipLoadMm?: number): CuttingFigures {
  const preset = MATERIAL_PRESETS[design.bar.material];
  const scale = Math.min(3, Math.max(0.25, cutterDiameterMm / PRESET_CUTTER_DIAMETER_MM));
  return {
    preset,
    surfaceSpeed: design.plan.surfaceSpeed ?? preset.surfaceSpeed,
    chipLoad: chipLoadMm ?? preset.chipLoad * scale,
  };
}

/** A copy of the design with the plan's step-over and travel set to the material's defaults (in the file's units). */
export function withMaterialDefaults(design: Design, material: MaterialId): Design {
  const { stepOver, travelSpeed } = MATERIAL_PRESETS[material].defaults;
  const perMm = design.units === 'in' ? 1 / MM_PER_INCH : 1;
  return {
    ...design,
    bar: { ...design.bar, material },
    plan: { ...design.plan, stepOver: stepOver * perMm, travelSpeed: travelSpeed * perMm },
  };
}
