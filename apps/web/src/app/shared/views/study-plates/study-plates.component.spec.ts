import { TestBed } from '@angular/core/testing';
import { EXAMPLE_DESIGN } from '@barwright/contracts';
import { computeLineStudy, computeProfile, toMm } from '@barwright/engine';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { StudyData } from '../view-data';
import { StudyPlates } from './study-plates';

/*
 * The plates are painted in a worker on OffscreenCanvases; jsdom (like an old browser) has neither,
 * so the page must still show both plates' places, the light's controls and a plain sentence.
 */
let study: StudyData;
beforeAll(() => {
  const s = computeLineStudy(EXAMPLE_DESIGN, computeProfile(EXAMPLE_DESIGN));
  const mm = toMm(EXAMPLE_DESIGN);
  const lines = s.lines.map(({ points }) => Float64Array.from(points.flat()));
  study = { spacing: s.spacing, width: s.width, length: s.length, lines, depth: mm.study.depth, vAngle: mm.study.vAngle };
});

afterEach(() => {
  vi.unstubAllGlobals();
});

async function render(inputs: Record<string, unknown> = {}): Promise<HTMLElement> {
  const fixture = TestBed.createComponent(StudyPlates);
  for (const [name, value] of Object.entries({ study, window: 40, ...inputs })) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  // afterNextRender (where the worker would start) has run by now.
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

describe('StudyPlates without OffscreenCanvas', () => {
  it('keeps both plates and says it cannot paint them', async () => {
    const el = await render({ period: 100 / 24 });
    const flat = el.querySelector('[data-testid="study-flat"]')!;
    const lit = el.querySelector('[data-testid="study-lit"]')!;
    expect(flat.tagName).toBe('CANVAS');
    expect(lit.tagName).toBe('CANVAS');
    expect(flat.getAttribute('data-lines')).toBe(String(EXAMPLE_DESIGN.study.lines));
    expect(flat.getAttribute('data-period')).toBe((100 / 24).toFixed(6));
    expect(flat.getAttribute('data-drawn')).toBe('0'); // nothing was painted
    expect(lit.getAttribute('aria-label')).toContain('lit from 60°, 35° above the plate');
    expect(el.textContent).toContain('cannot draw the plates off the page (it lacks OffscreenCanvas)');
  });

  it('starts no worker where canvases cannot be handed to one', async () => {
    const started = vi.fn();
    vi.stubGlobal('Worker', class {
      constructor() {
        started();
      }
      postMessage(): void {}
      addEventListener(): void {}
      terminate(): void {}
    });
    const el = await render();
    expect(started).not.toHaveBeenCalled();
    expect(el.textContent).toContain('lacks OffscreenCanvas');
  });

  it('still offers the metal and the light, and follows them in the words', async () => {
    const el = await render({ tint: 'brass', azimuth: 120, elevation: 20 });
    expect(el.querySelector('[data-testid="study-tint"]')).not.toBeNull();
    expect(el.querySelector<HTMLInputElement>('[data-testid="light-azimuth"]')).not.toBeNull();
    expect(el.querySelector('[data-testid="study-lit"]')!.getAttribute('aria-label')).toContain('in brass, lit from 120°, 20° above the plate');
  });

  it('shows the plates alone when the light is set from outside', async () => {
    const el = await render({ controls: false, idPrefix: 'compare-' });
    expect(el.querySelector('[data-testid="compare-study-flat"]')).not.toBeNull();
    expect(el.querySelector('[data-testid="study-tint"], [data-testid="compare-study-tint"]')).toBeNull();
    expect(el.textContent).toContain('lacks OffscreenCanvas');
  });
});
