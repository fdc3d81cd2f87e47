import { EXAMPLE_DESIGN, MATERIALS, MM_PER_INCH } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { cuttingFigures, MATERIAL_PRESETS, withMaterialDefaults } from './materials';

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

  it('give A2 heat-treatment notes from memory that defer to the steel supplier', () => {
    const notes = MATERIAL_PRESETS.a2.heatTreatment!.join(' ');
    expect(notes).toMatch(/air-hardening/i);
    expect(notes).toMatch(/austenitize/i);
    expect(notes).toMatch(/temper/i);
    expect(notes).toMatch(/HRC 57–62/);
    expect(notes).toMatch(/from memory: follow the steel supplier's data sheet/);
    expect(MATERIAL_PRESETS.acrylic.heatTreatment).toBeUndefined();
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
