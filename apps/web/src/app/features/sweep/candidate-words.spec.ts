import { describe, expect, it } from 'vitest';
import type { SweepCandidate } from '@barwright/contracts';
import { cardWords, minutesText, rubberWords, travelWords } from './candidate-words';

const candidate: SweepCandidate = {
  units: 'in',
  rosette: { name: 'Sine 24', units: 'mm', rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1, phase: 0, wave: { shape: 'sine' } }] } },
  rubber: { shape: 'round', radius: 0.04 },
  travel: { name: 'Four inches', travelPerRev: 4, leverRatio: 1 },
  cutter: { diameter: 0.1875, flutes: 2 },
  follower: { radius: 0.09375 },
  barLength: 6,
  study: { lineSpacing: 0.018, lines: 40, schedule: { kind: 'alternate' }, vAngle: 120, depth: 0.004 },
};

describe('candidate words', () => {
  it('names shop items in the sweep units through the length formatter', () => {
    expect(rubberWords(candidate.rubber, 'in')).toBe('round, radius 0.04 in');
    expect(travelWords({ travelPerRev: 100, leverRatio: 1.5 }, 'mm')).toBe('100 mm a revolution, lever ×1.5');
  });

  it('gives a card its figures, mm shown in the sweep units', () => {
    const w = cardWords(candidate, { period: 25.4 / 6, barHeight: 0.5, crestRadius: 1, cutterRadius: 2.38125, crestBelowCutter: true, detailLoss: true, detailLost: 0.0254, keeperMinutes: 65.4 });
    expect(w.travel).toBe('Four inches');
    expect(w.period).toBe('0.167 in');
    expect(w.loss).toBe('yes, 0.001 in');
    expect(w.crest).toBe("0.0394 in under the cutter's 0.094 in");
    expect(cardWords(candidate, { period: 1, barHeight: 1, crestRadius: 0, cutterRadius: 1, crestBelowCutter: true, detailLoss: false, detailLost: 0, keeperMinutes: 1 }).crest).toBe("sharp corner, under the cutter's 0.0394 in");
    expect(w.keeper).toBe('1 h 05 min');
  });

  it('writes minutes', () => {
    expect(minutesText(42.2)).toBe('42 min');
  });
});
