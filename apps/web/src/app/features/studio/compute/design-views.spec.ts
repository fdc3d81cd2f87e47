import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { profileDrawing } from '../../../shared/views/profile-drawing';
import { computeDesignViews, type StudyLead } from './design-views';

describe('the bar drawings made beside the views (in the worker)', () => {
  it('are the drawing the bar view would make of the full computation, in the mode asked (detail unless told)', () => {
    const views = computeDesignViews(EXAMPLE_DESIGN, 'full');
    const extras = { nominal: null, depth: views.plan!.depth };
    expect(views.drawings.companion).toBeNull();
    expect(views.drawings.mode).toBe('detail');
    expect(views.drawings.drawing).toEqual(profileDrawing(views.profile, 'detail', views.profile.warnings, extras));
    const whole = computeDesignViews(EXAMPLE_DESIGN, 'full', undefined, undefined, undefined, undefined, 'whole');
    expect(whole.drawings.mode).toBe('whole');
    expect(whole.drawings.drawing).toEqual(profileDrawing(whole.profile, 'whole', whole.profile.warnings, extras));
  });

  it('mark a preview with the last full computation\'s warnings and depth', () => {
    const full = computeDesignViews(EXAMPLE_DESIGN, 'full');
    const context = { warnings: full.profile.warnings, depth: full.plan!.depth };
    const preview = computeDesignViews(EXAMPLE_DESIGN, 'preview', undefined, context);
    expect(preview.drawings.drawing).toEqual(profileDrawing(preview.profile, 'detail', context.warnings, { depth: context.depth }));
  });

  it('draw the opposite blank above the bar when it is the companion', () => {
    const views = computeDesignViews(EXAMPLE_DESIGN, 'preview', 'opposite');
    expect(views.drawings.companion).toBe('opposite');
    expect(views.drawings.drawing.upper).not.toBe('');
  });
});

describe('the line study sent ahead of the rest of the views', () => {
  it('is given once, and is the study the views carry with their stage and period', () => {
    const leads: StudyLead[] = [];
    const views = computeDesignViews(EXAMPLE_DESIGN, 'full', undefined, undefined, (lead) => leads.push(lead));
    expect(leads).toHaveLength(1);
    expect(leads[0]).toEqual({ stage: 'full', study: views.study, period: views.profile.period });
    expect(leads[0].study).toBe(views.study);
  });
});
