import { DESIGN_PRESET_FILES, type DesignPreset } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { designSketchDrawing } from './design-sketch-drawing';

describe('designSketchDrawing', () => {
  it('draws a few periods of every preset, at most 24 lines', () => {
    for (const preset of Object.keys(DESIGN_PRESET_FILES) as DesignPreset[]) {
      const d = designSketchDrawing(DESIGN_PRESET_FILES[preset]);
      expect(d, preset).not.toBeNull();
      expect(d!.lines.length).toBeGreaterThan(1);
      expect(d!.lines.length).toBeLessThanOrEqual(24);
      expect(d!.height).toBeGreaterThan(0);
    }
  });

  it('gives nothing for a design the engine cannot compute', () => {
    const broken = structuredClone(DESIGN_PRESET_FILES.example);
    broken.motion.travelPerRev = Number.NaN;
    expect(designSketchDrawing(broken)).toBeNull();
  });
});
