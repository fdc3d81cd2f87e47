import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeProfile } from './profile';
import { summarizeWarnings } from './warning-summary';

const input = { height: 1, period: 10, periodic: true, length: 100, units: 'mm' as const };

describe('one warning per kind', () => {
  it('keeps the worst place, counts the places and names the first', () => {
    const places = [3, 1, 7].map((x, i) => ({ code: 'valley-bridged' as const, message: `misses ${[0.1, 0.2, 0.05][i]} mm at x ${x} mm`, at: { xFrom: x, xTo: x + 0.5 }, amount: [0.1, 0.2, 0.05][i] }));
    const [w] = summarizeWarnings(places, input);
    expect(w).toMatchObject({ code: 'valley-bridged', amount: 0.2, at: { xFrom: 1, xTo: 1.5 }, first: { xFrom: 1, xTo: 1.5 }, count: 3 });
    expect(w.message).toMatch(/^misses 0\.2 mm at x 1 mm This happens at 3 places in each period of 10 mm \(about 30 along the bar\), the first at x 1–1\.5 mm/);
    expect(w.zones).toHaveLength(3);
  });

  it('bounds an amount by the path height and lets no Infinity or NaN through', () => {
    const [tall, odd] = summarizeWarnings(
      [
        { code: 'cusp-rounded', message: 'stands 10.41 mm below the corner', at: { xFrom: 0, xTo: 1 }, amount: 10.41 },
        { code: 'detail-lost-follower', message: 'the crest (radius of curvature Infinity mm) loses NaN mm', at: { xFrom: 0, xTo: 1 }, amount: Infinity },
      ],
      input,
    );
    expect(tall.amount).toBe(1);
    expect(tall.message).toContain('1 mm (the whole height of the path)');
    expect(odd.message).not.toMatch(/Infinity|NaN/);
    expect(odd.amount).toBeLessThanOrEqual(1);
  });

  it('gives at most one warning of each code for a design that loses detail everywhere', () => {
    const busy: Design = {
      ...EXAMPLE_DESIGN,
      rosette: { baseRadius: 40, layers: [{ lobes: 24, amplitude: 2, phase: 0, wave: { shape: 'pointed' } }, { lobes: 7, amplitude: 1, phase: 0.3, wave: { shape: 'scallop' } }] },
      rubber: { shape: 'round', radius: 3 },
      follower: { radius: 0.3 },
      bar: { ...EXAMPLE_DESIGN.bar, length: 40 },
    };
    const { warnings, cutterPath } = computeProfile(busy);
    const codes = warnings.filter((w) => w.at).map((w) => w.code);
    expect(new Set(codes).size).toBe(codes.length);
    let [low, high] = [Infinity, -Infinity];
    for (const [, y] of cutterPath) [low, high] = [Math.min(low, y), Math.max(high, y)];
    for (const w of warnings) {
      expect(w.message).not.toMatch(/Infinity|NaN/);
      if (w.amount !== undefined) expect(w.amount).toBeLessThanOrEqual(high - low + 1e-12);
    }
  });
});
