import { TestBed } from '@angular/core/testing';
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { formatLength, fromMm } from '@barwright/engine';
import { beforeAll, describe, expect, it } from 'vitest';
import { computeDesignViews, type DesignViews } from '../../../features/studio/compute/design-views';
import { LineStudy } from './line-study';

let views: DesignViews;
beforeAll(() => {
  views = computeDesignViews(EXAMPLE_DESIGN, 'full');
});

async function render(inputs: Record<string, unknown>) {
  const fixture = TestBed.createComponent(LineStudy);
  for (const [name, value] of Object.entries({ units: 'mm', ...inputs })) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  return { fixture, el: fixture.nativeElement as HTMLElement };
}

const summary = (el: HTMLElement) => el.querySelector('[data-testid="study-summary"]')!.textContent!.replace(/\s+/g, ' ').trim();

describe('LineStudy', () => {
  it('says it is working while there is no study yet', async () => {
    const { el } = await render({ study: null });
    expect(el.querySelector('[role="status"]')!.textContent).toContain('Working out the line study');
  });

  it('names the lines, the groove and the stretch shown, in the one length format', async () => {
    const { el } = await render({ study: views.study, period: views.profile.period });
    const s = summary(el);
    expect(s).toContain(`40 lines ${formatLength(0.45, 'mm')} apart`);
    expect(s).toContain(`a 120° V-cutter ${formatLength(0.1, 'mm')} deep`);
    expect(s).toContain('True scale, from 55 mm to 95 mm along the bar'); // the middle 40 mm of 150
    expect(el.querySelector('[data-testid="study-flat"]')!.getAttribute('data-lines')).toBe('40');
  });

  it('changes the stretch when another window is chosen', async () => {
    const { fixture, el } = await render({ study: views.study });
    const toggles = [...el.querySelectorAll<HTMLButtonElement>('[data-testid="study-window"] button')];
    toggles.find((b) => b.textContent!.includes('Middle 15 mm'))!.click();
    await fixture.whenStable();
    expect(summary(el)).toContain('from 67.5 mm to 82.5 mm along the bar');
    el.querySelector<HTMLButtonElement>('[data-testid="study-window-whole"] button')!.click();
    await fixture.whenStable();
    expect(summary(el)).toContain('from 0 mm to 150 mm along the bar');
  });

  it('writes an inch design’s study in inches only', async () => {
    const inch = computeDesignViews(fromMm(EXAMPLE_DESIGN, 'in'), 'preview');
    const { el } = await render({ study: inch.study, units: 'in' });
    const s = summary(el);
    expect(s).toContain(`apart, grooves ${formatLength(inch.study.width, 'in')} wide`);
    // The middle 1½ in (38.1 mm) of a 150 mm bar.
    expect(s).toContain(`from ${formatLength(75 - 19.05, 'in')} to ${formatLength(75 + 19.05, 'in')} along the bar`);
    expect(s).toContain('from 2.203 in to 3.703 in');
    expect(s).not.toMatch(/\d mm/);
  });
});
