import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { EXAMPLE_DESIGN, type Units } from '@barwright/contracts';
import { formatLength, fromMm } from '@barwright/engine';
import { beforeAll, describe, expect, it } from 'vitest';
import { computeDesignViews, type DesignViews } from '../../../features/studio/compute/design-views';
import { BarProfile } from './bar-profile';

/*
 * The bar profile as a turner sees it, drawn from the engine's own full computation of the example
 * design (24-lobe sine, 150 mm bar; the follower rounds a crest 0.66 mm deep once a period), and of
 * the same design drawn up in inches (the engine writes its warnings in the file's units).
 */
let views: DesignViews;
const inUnits: Partial<Record<Units, DesignViews>> = {};
beforeAll(() => {
  views = computeDesignViews(EXAMPLE_DESIGN, 'full', 'opposite');
  inUnits.mm = views;
  inUnits.in = computeDesignViews(fromMm(EXAMPLE_DESIGN, 'in'), 'full');
});

async function render(inputs: Record<string, unknown>): Promise<{ fixture: ComponentFixture<BarProfile>; el: HTMLElement }> {
  const fixture = TestBed.createComponent(BarProfile);
  for (const [name, value] of Object.entries({ units: 'mm', warnings: views.profile.warnings, crest: views.profile.crest, ...inputs })) {
    fixture.componentRef.setInput(name, value);
  }
  await fixture.whenStable();
  return { fixture, el: fixture.nativeElement as HTMLElement };
}

/** What the drawing holds, named by the legend swatch that explains it (grid ticks and the ground need none). */
function drawnKinds(svg: Element): Set<string> {
  const kinds = new Set<string>();
  const has = (selector: string, kind: string) => svg.querySelector(selector) && kinds.add(kind);
  has('polygon.bar:not(.opposite)', 'bar');
  has('polyline.edge', 'edge');
  has('polyline.cutter', 'cutter');
  has('polyline.follower', 'follower');
  has('circle.disc.cutter', 'ring cutter');
  has('circle.disc.follower', 'ring follower');
  has('polyline.nominal', 'nominal');
  has('polygon.opposite', 'opposite');
  has('line.blank-top', 'blank-top');
  has('g.dimension', 'dimension');
  for (const mark of svg.querySelectorAll('g.loss')) kinds.add(`mark ${mark.getAttribute('data-severity')}`);
  return kinds;
}

function legendKinds(el: HTMLElement): Set<string> {
  const swatches = el.querySelectorAll('[data-testid="profile-legend"] .swatch');
  return new Set([...swatches].map((s) => [...s.classList].filter((c) => c !== 'swatch').join(' ')));
}

function legendText(el: HTMLElement): string {
  return el.querySelector('[data-testid="profile-legend"]')!.textContent!.replace(/\s+/g, ' ');
}

/** The window the caption names, mm (the caption is written in `units`). */
function captionWindow(el: HTMLElement, units: Units): [number, number] {
  const caption = el.querySelector('p.caption')!.textContent!;
  const m = new RegExp(`From (-?[\\d.]+) ${units} to (-?[\\d.]+) ${units} along the bar`).exec(caption);
  expect(m, caption).not.toBeNull();
  const mm = units === 'in' ? 25.4 : 1;
  return [Number(m![1]) * mm, Number(m![2]) * mm];
}

function pointsOf(polygon: Element): [number, number][] {
  return polygon
    .getAttribute('points')!
    .trim()
    .split(/\s+/)
    .map((pair) => pair.split(',').map(Number) as [number, number]);
}

describe('BarProfile', () => {
  it('says it is working while there is no profile yet', async () => {
    const { el } = await render({ profile: null });
    expect(el.querySelector('[role="status"]')?.textContent).toContain('Working out the bar');
    expect(el.querySelector('svg.drawing')).toBeNull();
  });

  it('draws the bar as a closed polygon inside the drawing, its edge waving once a period', async () => {
    const { el } = await render({ profile: views.profile });
    const svg = el.querySelector('[data-testid="profile-svg"]')!;
    const [, , width, height] = svg.getAttribute('viewBox')!.split(' ').map(Number);
    const bar = svg.querySelector('polygon.bar')!;
    const points = pointsOf(bar);
    expect(points.length).toBeGreaterThan(100);
    for (const [x, y] of points) {
      expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true);
      expect(y).toBeGreaterThanOrEqual(0);
      expect(y).toBeLessThanOrEqual(height);
    }
    // Closed along the bottom of the drawing: the material below the edge.
    expect(points.at(-2)).toEqual([width, height]);
    expect(points.at(-1)).toEqual([0, height]);
    // Three periods at true scale: the edge has three crests and valleys, so it spans a real height.
    const ys = points.slice(0, -2).map(([, y]) => y);
    expect(Math.max(...ys) - Math.min(...ys)).toBeGreaterThan(50);
    expect(el.querySelector('p.caption')!.textContent).toContain('lengths and heights to the same scale');
  });

  it('lists in the legend every kind of mark it draws, and nothing it does not draw', async () => {
    const { el } = await render({ profile: views.profile, depth: views.plan!.depth });
    const drawn = drawnKinds(el.querySelector('svg.drawing')!);
    // The example loses detail at each crest, and the detail view draws the cutter and follower circles.
    expect([...drawn]).toEqual(expect.arrayContaining(['bar', 'edge', 'cutter', 'follower', 'ring cutter', 'ring follower', 'blank-top', 'dimension']));
    expect([...drawn].some((k) => k.startsWith('mark '))).toBe(true);
    expect(legendKinds(el)).toEqual(drawn);
    const text = legendText(el);
    expect(text).toContain(`Cutter, ⌀ ${formatLength(EXAMPLE_DESIGN.cutter.diameter, 'mm')}`);
    expect(text).toContain(`Follower, radius ${formatLength(EXAMPLE_DESIGN.follower.radius, 'mm')}`);
    expect(text).not.toContain('opposite blank');
  });

  it('draws each place of lost detail once, not stacked', async () => {
    const { el } = await render({ profile: views.profile });
    const marks = [...el.querySelectorAll('g.loss rect.mark')].map((r) => [Number(r.getAttribute('x')), Number(r.getAttribute('width'))]);
    expect(marks.length).toBeGreaterThanOrEqual(2); // 3 periods, one rounded crest each
    expect(marks.length).toBeLessThanOrEqual(4);
    marks.sort((a, b) => a[0] - b[0]);
    for (let i = 1; i < marks.length; i++) expect(marks[i][0]).toBeGreaterThanOrEqual(marks[i - 1][0] + marks[i - 1][1]);
  });

  it('keeps the legend complete over the whole bar (no circles there)', async () => {
    const { fixture, el } = await render({ profile: views.profile });
    const whole = el.querySelector<HTMLButtonElement>('[data-testid="profile-mode-whole"] button')!;
    whole.click();
    await fixture.whenStable();
    expect(captionWindow(el, 'mm')).toEqual([0, 150]);
    const drawn = drawnKinds(el.querySelector('svg.drawing')!);
    expect(drawn.has('ring cutter')).toBe(false);
    expect(el.querySelectorAll('g.loss').length).toBeGreaterThan(20); // once a period along 150 mm
    expect(legendKinds(el)).toEqual(drawn);
  });

  it('draws the opposite blank and names it in the legend only when asked', async () => {
    const companion = views.companion!;
    expect(companion.kind).toBe('opposite');
    const { fixture, el } = await render({ profile: views.profile, other: companion, companion: 'none' });
    expect(el.querySelector('polygon.opposite')).toBeNull();
    expect(legendText(el)).not.toContain('The opposite blank');

    fixture.componentRef.setInput('companion', 'opposite');
    await fixture.whenStable();
    const upper = el.querySelector('[data-testid="profile-opposite"]');
    expect(upper).not.toBeNull();
    expect(pointsOf(upper!).length).toBeGreaterThan(100);
    expect(legendText(el)).toContain('The opposite blank');
    expect(legendKinds(el)).toEqual(drawnKinds(el.querySelector('svg.drawing')!));
    expect(el.querySelector('[data-testid="companion-note"]')!.textContent).toContain('upper envelope');
  });

  it('shows the same drawing from the studio worker’s ready-made strings as it draws itself, and tells its mode', async () => {
    expect(views.drawings.companion).toBe('opposite');
    const inputs = { profile: views.profile, other: views.companion, companion: 'opposite' };
    for (const mode of ['detail', 'whole'] as const) {
      const made = computeDesignViews(EXAMPLE_DESIGN, 'full', 'opposite', undefined, undefined, undefined, mode).drawings;
      const own = await render(inputs);
      const ready = await render({ ...inputs, drawn: made });
      const told: string[] = [];
      ready.fixture.componentInstance.mode.subscribe((m) => told.push(m));
      for (const { fixture, el } of [own, ready]) {
        el.querySelector<HTMLButtonElement>(`[data-testid="profile-mode-${mode}"] button`)!.click();
        await fixture.whenStable();
      }
      expect(ready.el.querySelector('svg.drawing')!.outerHTML).toBe(own.el.querySelector('svg.drawing')!.outerHTML);
      expect(legendText(ready.el)).toBe(legendText(own.el));
      expect(told).toEqual(mode === 'whole' ? ['whole'] : []);
    }
  });

  it('binds the ready-made drawing it is given when its companion and mode are the ones shown, and only then', async () => {
    // A marked drawing (its bar polygon a sentinel), so that the test sees which drawing was bound.
    const marked = { ...views.drawings, drawing: { ...views.drawings.drawing, bar: '0,0 1,1 2,0' } };
    const barPoints = (el: HTMLElement) => el.querySelector('svg.drawing polygon.bar:not(.opposite)')!.getAttribute('points');
    const inputs = { profile: views.profile, other: views.companion, companion: 'opposite' };
    const matching = await render({ ...inputs, drawn: marked });
    expect(barPoints(matching.el)).toBe('0,0 1,1 2,0');
    const otherCompanion = await render({ ...inputs, companion: 'none', other: null, drawn: marked });
    expect(barPoints(otherCompanion.el)).not.toBe('0,0 1,1 2,0');
    const otherMode = await render({ ...inputs, drawn: { ...marked, mode: 'whole' } });
    expect(barPoints(otherMode.el)).not.toBe('0,0 1,1 2,0');
  });

  it('draws a mode itself when the drawing it was given is of the other mode', async () => {
    const inputs = { profile: views.profile, other: views.companion, companion: 'opposite' };
    const own = await render(inputs);
    const ready = await render({ ...inputs, drawn: views.drawings }); // detail
    for (const { fixture, el } of [own, ready]) {
      el.querySelector<HTMLButtonElement>('[data-testid="profile-mode-whole"] button')!.click();
      await fixture.whenStable();
    }
    expect(ready.el.querySelector('svg.drawing')!.outerHTML).toBe(own.el.querySelector('svg.drawing')!.outerHTML);
  });

  for (const units of ['mm', 'in'] as const) {
    it(`dimensions the height, the period and the depth with the length formatter's text (${units})`, async () => {
      const depth = views.plan!.depth;
      const { el } = await render({ profile: views.profile, depth, units });
      const figure = (kind: string) => {
        const g = el.querySelector(`[data-testid="profile-dimension-${kind}"]`);
        expect(g, kind).not.toBeNull();
        const line = g!.querySelector('line')!;
        expect(line.getAttribute('marker-start')).toBe('url(#dim-arrow)');
        expect(line.getAttribute('marker-end')).toBe('url(#dim-arrow)');
        return g!.querySelector('text')!.textContent!.trim();
      };
      expect(figure('period')).toBe(formatLength(100 / 24, units)); // travel per revolution over the lobes
      expect(figure('depth')).toBe(formatLength(depth, units));
      // The height of the bar edge over the window: the engine's samples there, to the formatter's reading.
      const [from, to] = captionWindow(el, units);
      const { x, bar } = views.profile;
      let [lo, hi] = [Infinity, -Infinity];
      for (let i = 0; i < x.length; i++) if (x[i] >= from && x[i] <= to) [lo, hi] = [Math.min(lo, bar[i]), Math.max(hi, bar[i])];
      const height = figure('height');
      expect(height).toMatch(new RegExp(`^[\\d.]+ ${units}$`));
      expect(Number.parseFloat(height)).toBeCloseTo((hi - lo) / (units === 'in' ? 25.4 : 1), units === 'in' ? 2 : 1);
      expect(legendText(el)).toContain(`Dimensions: height ${height}, period ${figure('period')}, depth ${figure('depth')}`);
    });

    it(`gives each warning's place inside the window the caption names (${units})`, async () => {
      const own = inUnits[units]!;
      const { el } = await render({ profile: own.profile, warnings: own.profile.warnings, crest: own.profile.crest, units });
      const [from, to] = captionWindow(el, units);
      const items = [...el.querySelectorAll('[data-testid="profile-warnings"] li')];
      expect(items.length).toBe(own.profile.warnings.length);
      const text = items[0].textContent!;
      const place = new RegExp(`at x ([\\d.]+)–([\\d.]+) ${units}`).exec(text);
      expect(place, text).not.toBeNull();
      const mm = units === 'in' ? 25.4 : 1;
      const [a, b] = [Number(place![1]) * mm, Number(place![2]) * mm];
      expect(a).toBeGreaterThanOrEqual(from - 0.01);
      expect(b).toBeLessThanOrEqual(to + 0.01);
      expect(b).toBeGreaterThan(a);
      expect(text).toContain(`every ${formatLength(100 / 24, units)} along the bar`);
      expect(text).not.toContain(units === 'in' ? ' mm' : ' in ');
      // The list's severity is the one the drawing marks.
      const severity = items[0].getAttribute('data-severity');
      expect(['trifle', 'notable', 'severe']).toContain(severity);
      expect(el.querySelector(`g.loss[data-severity="${severity}"]`)).not.toBeNull();
    });
  }
});
