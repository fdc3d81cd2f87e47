import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { GCODE_SUMMARY } from '@barwright/engine';
import { describe, expect, it } from 'vitest';
import { DESIGN_DOWNLOADS, Downloads } from './downloads';

async function render(inputs: Record<string, unknown> = {}): Promise<{ fixture: ComponentFixture<Downloads>; el: HTMLElement }> {
  const fixture = TestBed.createComponent(Downloads);
  for (const [name, value] of Object.entries(inputs)) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  return { fixture, el: fixture.nativeElement as HTMLElement };
}

describe('Downloads', () => {
  it('lists every format with what it holds', async () => {
    const { el } = await render();
    const items = [...el.querySelectorAll('ul.downloads li')];
    expect(items.map((li) => li.querySelector('[data-testid]')!.getAttribute('data-testid'))).toEqual(DESIGN_DOWNLOADS.map((d) => `export-${d.format}`));
    const text = items.map((li) => li.textContent!.replace(/\s+/g, ' '));
    for (const label of ['PDF', 'PDF pair', 'SVG', 'Study SVG', 'DXF', 'G-code', 'CSV', 'Design file']) {
      expect(text.some((t) => t.includes(label)), label).toBe(true);
    }
    expect(text.find((t) => t.includes('G-code'))).toContain(GCODE_SUMMARY);
  });

  it('gives plain links when the server names the files', async () => {
    const { el } = await render({ hrefFor: (format: string) => `/api/designs/d1/export?format=${format}` });
    const links = [...el.querySelectorAll<HTMLAnchorElement>('a[download]')];
    expect(links).toHaveLength(DESIGN_DOWNLOADS.length);
    expect(links[0].getAttribute('href')).toBe('/api/designs/d1/export?format=pdf');
    expect(el.querySelector('button')).toBeNull();
  });

  it('says which file is being prepared, and hands up the one chosen', async () => {
    const { fixture, el } = await render({ busy: 'csv' });
    const chosen: string[] = [];
    fixture.componentInstance.chosen.subscribe((f) => chosen.push(f));
    const csv = el.querySelector<HTMLButtonElement>('[data-testid="export-csv"]')!;
    expect(csv.textContent).toContain('Preparing…');
    expect(csv.disabled).toBe(true);
    el.querySelector<HTMLButtonElement>('[data-testid="export-dxf"]')!.click();
    expect(chosen).toEqual(['dxf']);
  });

  it('says why the downloads are off', async () => {
    const { el } = await render({ disabled: true, disabledNote: 'Fix the design first.' });
    expect([...el.querySelectorAll('button')].every((b) => b.disabled)).toBe(true);
    expect(el.textContent).toContain('Fix the design first.');
  });
});
