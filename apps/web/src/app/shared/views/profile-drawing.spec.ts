import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { computeDesignViews } from '../../features/studio/compute/design-views';
import { detailWindow, profileDrawing } from './profile-drawing';

const views = computeDesignViews(EXAMPLE_DESIGN, 'preview');

describe('profileDrawing', () => {
  it('shows three periods about the middle of the bar at true scale in detail', () => {
    const d = profileDrawing(views.profile, 'detail');
    const period = 100 / 24; // travel per revolution over the lobes
    expect(d.to - d.from).toBeCloseTo(3 * period);
    expect((d.from + d.to) / 2).toBeCloseTo(75);
    expect(d.exaggeration).toBe(1);
    expect(d.discs.map((c) => c.kind)).toEqual(['cutter', 'follower']);
    expect(d.discs[0].r).toBeCloseTo((4.7625 / 2) * (1000 / (3 * period)), 1);
  });

  it('draws the whole bar with heights exaggerated by a round factor', () => {
    const d = profileDrawing(views.profile, 'whole');
    expect([d.from, d.to]).toEqual([0, 150]);
    expect([1, 2, 5, 10, 20, 50, 100]).toContain(d.exaggeration);
    expect(d.height).toBeGreaterThan(100);
    expect(d.ticks[0]).toEqual({ x: 0, mm: 0 });
  });

  it('marks where detail is lost, once a period along the bar', () => {
    const d = profileDrawing(views.profile, 'whole', [{ code: 'detail-lost-follower', message: 'crest rounded', at: { xFrom: 1, xTo: 1.5 } }]);
    expect(d.marks).toHaveLength(36); // 150 mm of bar at a period of 100/24 mm
    expect(d.marks[0].x).toBeGreaterThan(6);
    expect(d.marks[1].x - d.marks[0].x).toBeCloseTo((100 / 24) * (1000 / 150), 1);
    expect(d.marks[0].title).toBe('crest rounded');
    expect(profileDrawing(views.profile, 'whole', [{ code: 'rubbing', message: 'thin chip' }]).marks).toEqual([]);
  });

  it('keeps a short bar whole in detail', () => {
    expect(detailWindow({ period: 50, barLength: 60 })).toEqual([0, 60]);
  });
});

describe('profileDrawing marks and dimensions', () => {
  it('leaves out a period dimension too narrow for its label (the whole bar of a 24-lobe rosette), keeping the height and the depth', () => {
    const d = profileDrawing(views.profile, 'whole', [], { depth: 2 });
    // 100/24 mm of a 150 mm bar is ~28 of the drawing's 1000 units: the label, ~80 wide, ran over the edge and the curves.
    expect(d.dimensions.map((x) => x.kind)).toEqual(['height', 'depth']);
    for (const dim of profileDrawing(views.profile, 'detail', [], { depth: 2 }).dimensions.filter((x) => x.kind === 'period')) {
      expect(dim.x2 - dim.x1).toBeGreaterThanOrEqual(100);
    }
  });

  it('draws overlapping losses once and dimensions the height, a period and the depth', () => {
    const warnings = [
      { code: 'detail-lost-follower' as const, message: 'a', at: { xFrom: 1, xTo: 2 }, amount: 0.05 },
      { code: 'detail-lost-cutter' as const, message: 'b', at: { xFrom: 1.5, xTo: 2.5 }, amount: 1 },
    ];
    const d = profileDrawing(views.profile, 'detail', warnings, { depth: 2 });
    // one merged place per period: three periods, and a fourth cut by the window's edge
    expect(d.marks.length).toBeGreaterThanOrEqual(3);
    expect(d.marks.length).toBeLessThanOrEqual(4);
    expect(new Set(d.marks.map((m) => m.severity))).toEqual(new Set(['severe']));
    expect(d.dimensions.map((x) => x.kind)).toEqual(['height', 'period', 'depth']);
    expect(d.dimensions.find((x) => x.kind === 'period')!.mm).toBeCloseTo(100 / 24);
    expect(d.dimensions.find((x) => x.kind === 'depth')!.mm).toBeCloseTo(2);
    expect(d.blankTop).not.toBeNull();
    expect(d.amplitude).toBeCloseTo(1.5, 1); // the example rosette's 1.5 mm wave, lever ratio 1
  });
});
