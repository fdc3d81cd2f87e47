import type { EngineWarning } from '@barwright/engine';
import { describe, expect, it } from 'vitest';
import { lossStretches, severityOf, shownWarnings } from './profile-marks';

const crest = (xFrom: number, xTo: number, amount: number, message = 'crest rounded'): EngineWarning => ({ code: 'detail-lost-follower', message, at: { xFrom, xTo }, amount });

describe('severity of a loss against the wave', () => {
  it('is a trifle under 10 %, notable to 50 %, severe above', () => {
    expect(severityOf(0.1, 1.5)).toBe('trifle');
    expect(severityOf(0.2, 1.5)).toBe('notable');
    expect(severityOf(1.26, 1.5)).toBe('severe'); // 84 % of a 1.5 mm wave
  });
});

describe('lossStretches', () => {
  it('draws overlapping places once, with the worst severity of what overlaps', () => {
    const stretches = lossStretches([crest(1, 2, 0.05), crest(1.5, 2.5, 1.2), crest(1.8, 2.2, 0.3)], 0, 4, 4, 1.5);
    expect(stretches).toHaveLength(1);
    expect(stretches[0]).toMatchObject({ from: 1, to: 2.5, severity: 'severe' });
    expect(stretches[0].titles).toEqual(['crest rounded']);
  });

  it('repeats each place every period inside the window only', () => {
    const stretches = lossStretches([crest(1, 1.5, 0.3)], 68.75, 81.25, 100 / 24, 1.5);
    expect(stretches).toHaveLength(3);
    for (const s of stretches) {
      expect(s.from).toBeGreaterThanOrEqual(68.75);
      expect(s.to).toBeLessThanOrEqual(81.25);
    }
  });

  it('leaves out warnings that name no place of lost detail', () => {
    expect(lossStretches([{ code: 'rubbing', message: 'thin chip' }], 0, 10, 2, 1)).toEqual([]);
  });
});

describe('shownWarnings', () => {
  it('gives positions in the window shown, every period, and the loss against the wave, in one unit', () => {
    const w = crest(6.65, 10.02, 1.26, 'The follower rounds a crest of the bar at x 6.65–10.02 mm: the line loses 1.26 mm there.');
    const [shown] = shownWarnings([w], { from: 68.75, to: 81.25 }, 12.5, 1.5, 'mm');
    expect(shown.severity).toBe('severe');
    expect(shown.message).toContain('at x 69.15–72.52 mm, and every 12.5 mm along the bar');
    expect(shown.message).toContain('(84 % of the 1.5 mm wave)');
    expect(shown.message).not.toContain('6.65');
  });

  it('moves inch positions the same way and keeps other warnings as they are', () => {
    const w = crest(25.4, 27.94, 0.1, 'A valley at x 1–1.1 in is narrower.');
    const [shown, other] = shownWarnings([w, { code: 'rubbing', message: 'thin chip' }], { from: 127, to: 177.8 }, 25.4, 1.5, 'in');
    expect(shown.message).toContain('at x 5–5.1 in, and every 1 in along the bar');
    expect(shown.severity).toBe('trifle');
    expect(other).toEqual({ severity: null, message: 'thin chip' });
  });

  it('reads a place in the unit its message is written in, whatever unit the view shows', () => {
    const w = crest(6.65, 10.02, 1.26, 'The follower rounds a crest of the bar at x 6.65–10.02 mm: the line loses 1.26 mm there.');
    const [shown] = shownWarnings([w], { from: 68.58, to: 81.28 }, 12.7, 1.5, 'in');
    expect(shown.message).toContain('at x 2.762–2.894 in, and every 0.5 in along the bar') // 70.15–73.52 mm;
  });
});
