import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { profileDrawing } from '../../../shared/views/profile-drawing';
import { computeDesignViews } from './design-views';

const placed: Design = {
  ...EXAMPLE_DESIGN,
  motion: { ...EXAMPLE_DESIGN.motion, pivot: { kind: 'rocking', distance: 150 } },
  cutter: { ...EXAMPLE_DESIGN.cutter, offset: 0.5 },
};

describe('the bar view\'s before and after, and the companions', () => {
  it('has no before for a cutter on the centre line with linear motion', () => {
    const views = computeDesignViews(EXAMPLE_DESIGN, 'preview');
    expect(views.placement).toBeNull();
    expect(views.companion).toBeNull();
    expect(profileDrawing(views.profile, 'detail').nominal).toBe('');
  });

  it('gives the nominal path and the figures of a placed cutter, and draws the before dotted', () => {
    const views = computeDesignViews(placed, 'preview');
    expect(views.placement?.text).toMatch(/^0\.5 mm off the centre line, rocking 150 mm from its axis: amplitude \+0\.33 %, crests and valleys lean 0\.00\d+ mm/);
    const nominal = views.placement!.nominal;
    expect(nominal.length).toBe(views.profile.cutter.length);
    // the after is 1 + e/L taller than the before
    const height = (y: Float64Array) => Math.max(...y) - Math.min(...y);
    expect(height(views.profile.cutter) / height(nominal)).toBeCloseTo(1 + 0.5 / 150, 3);
    expect(profileDrawing(views.profile, 'detail', [], { nominal }).nominal).not.toBe('');
  });

  it('computes the companion asked for, and draws the opposite blank above the cutter', () => {
    const views = computeDesignViews(EXAMPLE_DESIGN, 'preview', 'opposite');
    expect(views.companion?.kind).toBe('opposite');
    const { bar } = views.companion!.profile;
    views.profile.cutter.forEach((y, i) => expect(bar[i]).toBeGreaterThan(y));
    const drawing = profileDrawing(views.profile, 'detail', [], { upper: bar });
    expect(drawing.upper).toMatch(/ 1000,0 0,0$/);
  });
});
