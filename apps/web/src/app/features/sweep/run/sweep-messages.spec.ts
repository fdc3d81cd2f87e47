import { EXAMPLE_DESIGN, type SweepCandidate } from '@barwright/contracts';
import { computeBatch, type BatchItem } from '@barwright/engine';
import { describe, expect, it } from 'vitest';
import { packItem, resultTransferables, SWEEP_STEP_MM, unpackResult } from './sweep-messages';

function candidate(): SweepCandidate {
  const d = EXAMPLE_DESIGN;
  return {
    units: 'mm',
    rosette: { name: 'Example', units: 'mm', rosette: d.rosette },
    rubber: d.rubber.shape === 'round' ? { shape: 'round', radius: d.rubber.radius } : { shape: 'flat', width: d.rubber.width },
    travel: { travelPerRev: d.motion.travelPerRev, leverRatio: d.motion.leverRatio },
    cutter: { diameter: d.cutter.diameter, flutes: d.cutter.flutes },
    follower: { radius: d.follower.radius },
    barLength: 150,
    study: { lineSpacing: d.study.lineSpacing, lines: d.study.lines, schedule: d.study.schedule, vAngle: d.study.vAngle, depth: d.study.depth },
  } as SweepCandidate;
}

describe('sweep messages', () => {
  it('packs a computed candidate: the same figures, the period arrays as Float32 within float precision', () => {
    const [item] = computeBatch([candidate()], { step: SWEEP_STEP_MM });
    expect(item.ok).toBe(true);
    if (!item.ok) return;
    const packed = packItem(7, item);
    expect(packed.index).toBe(7);
    expect(packed.ok).toBe(true);
    if (!packed.ok) return;
    const { cutter, bar, line, step, ...figures } = item.result;
    expect(packed.figures).toEqual(figures);
    expect(packed.step).toBe(step);
    for (const [a, b] of [[packed.line, line], [packed.bar, bar], [packed.cutter, cutter]] as const) {
      expect(a).toBeInstanceOf(Float32Array);
      expect(a.length).toBe(b.length);
      for (let i = 0; i < a.length; i++) expect(Math.abs(a[i] - b[i])).toBeLessThanOrEqual(1e-6 * Math.max(1, Math.abs(b[i])));
    }
    // Each array its own buffer: all three transfer, nothing else does.
    const buffers = resultTransferables([packed, { index: 8, ok: false, message: 'no' }]);
    expect(buffers).toEqual([packed.line.buffer, packed.bar.buffer, packed.cutter.buffer]);
    expect(new Set(buffers).size).toBe(3);
    const unpacked = unpackResult(packed);
    expect(unpacked).toEqual({ ok: true, figures: packed.figures, step, line: packed.line, bar: packed.bar, cutter: packed.cutter });
  });

  it('packs a refused candidate as its message', () => {
    const refused: BatchItem = { ok: false, message: 'rubber.radius must be at most the rosette' };
    expect(packItem(3, refused)).toEqual({ index: 3, ok: false, message: 'rubber.radius must be at most the rosette' });
    expect(resultTransferables([packItem(3, refused)])).toEqual([]);
    expect(unpackResult(packItem(3, refused))).toEqual({ ok: false, message: 'rubber.radius must be at most the rosette' });
  });
});
