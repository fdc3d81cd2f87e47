import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { formatLength } from '@barwright/engine';
import { describe, expect, it, vi } from 'vitest';
import type { CompareSide } from './compare-side';
import { SideBySide } from './side-by-side';

/*
 * Each column computes its design with the engine itself (jsdom has no Worker, so DesignCompute
 * runs the engine on the page, as an old browser would) and hands its figures up to the table.
 */
function withLobes(lobes: number, design: Design = EXAMPLE_DESIGN): Design {
  const layer = design.rosette.layers[0];
  return { ...design, rosette: { ...design.rosette, layers: [{ ...layer, lobes }] } };
}

/** A 30 mm bar: the engine's work grows with the length, and nothing compared here needs a long one. */
const SHORT_BAR: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 30 } };

async function render(sides: CompareSide[]): Promise<{ fixture: ComponentFixture<SideBySide>; el: HTMLElement }> {
  const fixture = TestBed.createComponent(SideBySide);
  fixture.componentRef.setInput('sides', sides);
  await fixture.whenStable();
  return { fixture, el: fixture.nativeElement as HTMLElement };
}

/** The table's rows by their heading: each cell's text and whether it is marked as changed. */
function table(el: HTMLElement): Map<string, { text: string; changed: boolean }[]> {
  const rows = el.querySelectorAll('[data-testid="compare-table"] tbody tr');
  return new Map(
    [...rows].map((tr) => [
      tr.querySelector('th')?.textContent!.trim() ?? '',
      [...tr.querySelectorAll('td')].map((td) => ({ text: td.textContent!.replace(/\(differs\)/, '').trim(), changed: td.classList.contains('changed') })),
    ]),
  );
}

/** Waits until every column's engine figures have reached the table. */
async function figuresIn(fixture: ComponentFixture<SideBySide>, el: HTMLElement, columns: number): Promise<void> {
  await vi.waitFor(
    async () => {
      await fixture.whenStable();
      const period = table(el).get('Period on the bar');
      expect(period?.map((c) => c.text).filter((t) => t !== '…')).toHaveLength(columns);
    },
    { timeout: 45_000, interval: 50 },
  );
}

describe('SideBySide', () => {
  for (const n of [2, 3, 4]) {
    it(`draws ${n} designs in ${n} equal columns`, async () => {
      const sides = Array.from({ length: n }, (_, i) => ({ label: `Bar ${i + 1}`, design: withLobes(24 + 6 * i, SHORT_BAR) }));
      const { el } = await render(sides);
      const grid = el.querySelector<HTMLElement>('[data-testid="compare-columns"]')!;
      expect(grid.querySelectorAll('bw-compare-column')).toHaveLength(n);
      expect(grid.style.gridTemplateColumns).toBe(`repeat(${n}, minmax(0, 1fr))`);
      expect([...el.querySelectorAll('[data-testid="compare-label"]')].map((l) => l.textContent!.trim())).toEqual(sides.map((s) => s.label));
      expect([...el.querySelectorAll('thead th')].map((th) => th.textContent!.trim())).toEqual(['Field', ...sides.map((s) => s.label)]);
    });
  }

  it('highlights the fields and figures that differ from the first column', async () => {
    const { fixture, el } = await render([
      { label: 'Then', design: SHORT_BAR },
      { label: 'Now', design: withLobes(30, SHORT_BAR) },
    ]);
    expect(el.querySelector('[data-testid="compare-summary"]')!.textContent).toContain('1 field differs');
    await figuresIn(fixture, el, 2);
    const rows = table(el);
    const period = rows.get('Period on the bar')!;
    // The engine's periods, written by the one length formatter: 100 mm of travel over 24 and 30 lobes.
    expect(period.map((c) => c.text)).toEqual([formatLength(100 / 24, 'mm'), formatLength(100 / 30, 'mm')]);
    expect(period.map((c) => c.changed)).toEqual([false, true]);
    const lobes = [...rows.entries()].find(([label]) => /lobes/i.test(label));
    expect(lobes, [...rows.keys()].join(' | ')).toBeDefined();
    expect(lobes![1].map((c) => c.changed)).toEqual([false, true]);
    // Only what differs is listed: every row shown has a marked cell.
    for (const [label, cells] of rows) expect(cells.some((c) => c.changed), label).toBe(true);
    expect(el.querySelectorAll('td.changed').length).toBeGreaterThanOrEqual(2);
  });

  it('marks nothing when the designs are the same', async () => {
    const { fixture, el } = await render([
      { label: 'Then', design: SHORT_BAR },
      { label: 'Now', design: structuredClone(SHORT_BAR) },
    ]);
    expect(el.querySelector('[data-testid="compare-summary"]')!.textContent).toContain('The same design fields');
    expect(el.textContent).toContain('Nothing differs.');
    // Every row, once both columns' figures are in: the same figures, nothing marked.
    el.querySelector<HTMLButtonElement>('[data-testid="compare-rows-all"] button')!.click();
    await figuresIn(fixture, el, 2);
    const period = table(el).get('Period on the bar')!;
    expect(period[0].text).toBe(period[1].text);
    expect(table(el).size).toBeGreaterThan(10);
    expect(el.querySelectorAll('td.changed')).toHaveLength(0);
  });
});
