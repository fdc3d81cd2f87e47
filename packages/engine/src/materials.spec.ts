import { EXAMPLE_DESIGN, MATERIALS, MM_PER_INCH } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { cuttingFigures, HEAT_TREATMENT_DEFERRAL, MATERIAL_PRESETS, withMaterialDefaults } from './materials';

describe('material presets', () => {
  it('cover every material of the design format', () => {
    expect(Object.keys(MATERIAL_PRESETS).sort()).toEqual([...MATERIALS].sort());
  });

  it('take no more than 0.003 in per pass in A2 tool steel (common practice)', () => {
    expect(MATERIAL_PRESETS.a2.maxStepOver).toBeLessThanOrEqual(0.003 * MM_PER_INCH + 1e-12);
    expect(MATERIAL_PRESETS.a2.defaults.stepOver).toBeLessThanOrEqual(0.003 * MM_PER_INCH + 1e-12);
  });

  it('order the cutting figures as the trade does: acrylic fastest, A2 slowest and lightest', () => {
    const { acrylic, brass, a2 } = MATERIAL_PRESETS;
    expect(a2.surfaceSpeed).toBeLessThan(brass.surfaceSpeed + 1e-9);
    expect(a2.chipLoad).toBeLessThan(brass.chipLoad);
    expect(brass.chipLoad).toBeLessThan(acrylic.chipLoad);
    expect(a2.maxStepOver!).toBeLessThan(brass.maxStepOver!);
    expect(brass.maxStepOver!).toBeLessThan(acrylic.maxStepOver!);
  });

  it('give A2 heat-treatment notes that cite their handbook and end deferring to the steel supplier', () => {
    const lines = MATERIAL_PRESETS.a2.heatTreatment!;
    const notes = lines.join(' ');
    expect(notes).toMatch(/air-hardening/i);
    expect(notes).toMatch(/austenitize/i);
    expect(notes).toMatch(/temper/i);
    expect(notes).toMatch(/HRC 57–62/);
    expect(notes).not.toMatch(/from memory/i); // provenance lives in the code, the user reads a source
    expect(notes).toMatch(/ASM Heat Treater's Guide, A2/);
    expect(lines.at(-1)).toBe(HEAT_TREATMENT_DEFERRAL);
    expect(HEAT_TREATMENT_DEFERRAL).toBe("Typical values: follow your steel supplier's data sheet.");
    expect(MATERIAL_PRESETS.acrylic.heatTreatment).toBeUndefined();
    expect(MATERIAL_PRESETS.brass.heatTreatment).toBeUndefined();
  });

  it('state the A2 figures of the ASM Heat Treater\'s Guide, in °C and °F that agree', () => {
    // ASM Heat Treater's Guide, A2 (figures from memory, checked against public copies of the entry):
    // preheat 790 °C / 1450 °F; austenitize 925–980 °C / 1700–1800 °F; temper 175–205 °C / 350–400 °F for HRC 60–62.
    const notes = MATERIAL_PRESETS.a2.heatTreatment!.join(' ');
    expect(notes).toContain('790 °C (1450 °F)');
    expect(notes).toContain('925–980 °C (1700–1800 °F)');
    expect(notes).toContain('175–205 °C (350–400 °F) gives about HRC 60–62');
    // Every pair agrees by °F = °C × 9/5 + 32 (the definition of the scales), within the rounding to 5 °C.
    const pairs = [...notes.matchAll(/(\d+)(?:–(\d+))? °C \((\d+)(?:–(\d+))? °F\)/g)];
    expect(pairs.length).toBeGreaterThanOrEqual(4);
    for (const [, c1, c2, f1, f2] of pairs) {
      expect(Math.abs(Number(c1) * 1.8 + 32 - Number(f1))).toBeLessThanOrEqual(9);
      if (c2) expect(Math.abs(Number(c2) * 1.8 + 32 - Number(f2))).toBeLessThanOrEqual(9);
    }
  });

  it('scale a preset chip load with the cutter diameter and take a custom chip load as given', () => {
    expect(cuttingFigures(EXAMPLE_DESIGN, 4.7625).chipLoad).toBeCloseTo(0.0127, 12);
    expect(cuttingFigures(EXAMPLE_DESIGN, 2 * 4.7625).chipLoad).toBeCloseTo(0.0254, 12);
    expect(cuttingFigures(EXAMPLE_DESIGN, 4.7625, 0.03).chipLoad).toBe(0.03);
  });

  it('write the material defaults in the file\'s units', () => {
    const inches = withMaterialDefaults({ ...EXAMPLE_DESIGN, units: 'in' }, 'a2');
    expect(inches.plan.stepOver).toBeCloseTo(0.003, 12);
    expect(inches.plan.travelSpeed).toBeCloseTo(100 / MM_PER_INCH, 12);
    expect(withMaterialDefaults(EXAMPLE_DESIGN, 'acrylic').bar.material).toBe('acrylic');
  });
});
