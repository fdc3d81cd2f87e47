import { PDFParse } from 'pdf-parse';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { planCut } from '../cut-plan';
import { formatLength } from '../length-format';
import { computeProfile } from '../profile';
import { demoDesign, demoInInches, demoProfile } from '../testing/export-fixtures';
import { handMadeProfile } from '../testing/hand-made-profile';
import { exportDesign } from './index';
import { winAnsiText } from './pdf-text';
import { PAGE_MARGIN_MM } from './pdf-tiles';

/** PDF user space: 1 unit = 1/72 in (ISO 32000-1 §8.3.2.3); inch = 25.4 mm (NIST). */
const PT_PER_MM = 72 / 25.4;

async function pdfOf(design = demoDesign, profile = demoProfile, format: 'pdf' | 'pdf-pair' = 'pdf'): Promise<Uint8Array> {
  const file = await exportDesign(design, format, { profile, title: 'Guild reference bar' });
  expect(file).toMatchObject({ filename: format === 'pdf' ? 'bar.pdf' : 'bar-shown-and-opposite.pdf', mime: 'application/pdf' });
  return file.content as Uint8Array;
}

/** Text and page count read back with pdf-parse (an independent PDF text extractor from npm). */
async function textOf(bytes: Uint8Array) {
  const parser = new PDFParse({ data: bytes.slice() });
  try {
    const text = await parser.getText();
    return { text: text.text, pages: text.total, pageTexts: text.pages.map((p) => p.text) };
  } finally {
    await parser.destroy();
  }
}

/** The page number (from 1) of the first page whose text holds `words`. */
async function pageWith(bytes: Uint8Array, words: string): Promise<number> {
  const { pageTexts } = await textOf(bytes);
  const index = pageTexts.findIndex((t) => t.includes(words));
  expect(index).toBeGreaterThanOrEqual(0);
  return index + 1;
}

/** Words as pdf-parse reads them back: lines wrapped and typographic marks written plainly (WinAnsi). */
const flat = (text: string) => winAnsiText(text.replace(/\s+/g, ' '));

/**
 * Bounding boxes of the stroked paths on a page, in points, read with pdfjs-dist (Mozilla's PDF
 * engine, on which pdf-parse is built; independent of pdf-lib, which wrote the file).
 */
async function pathBoxes(bytes: Uint8Array, pageNumber: number) {
  const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await pdfjs.getDocument({ data: bytes.slice(), verbosity: 0 }).promise;
  const page = await doc.getPage(pageNumber);
  const ops = await page.getOperatorList();
  const boxes = ops.fnArray.flatMap((fn: number, i: number) => {
    if (fn !== pdfjs.OPS.constructPath) return [];
    const [x0, y0, x1, y1] = Array.from(ops.argsArray[i][2] as ArrayLike<number>);
    return [{ width: x1 - x0, height: y1 - y0, x0, y0 }];
  });
  const view = page.view;
  await doc.destroy();
  return { boxes, size: [view[2] - view[0], view[3] - view[1]] };
}

/** A bar whose profile warns (the rubber bridges valleys, the follower rounds crests), as a scalloped rosette does. */
function scallopedBar(): Design {
  return {
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 50, layers: [{ lobes: 48, amplitude: 0.6, phase: 0, wave: { shape: 'scallop' } }] },
    rubber: { shape: 'round', radius: 0.8 },
  };
}

describe('PDF template', () => {
  it('holds the name, the set-up, the title, the calibration note, the cut plan and the cautions as text', async () => {
    const { text, pages, pageTexts } = await textOf(await pdfOf());
    const plan = planCut(demoDesign, demoProfile);
    expect(pages).toBe(5); // first page, period, line study, one tile, cut plan
    expect(pageTexts[0]).toMatch(/^Guild reference bar/);
    expect(text).toContain('24-lobe sine rosette, A2 tool steel, annealed, bar 150 mm');
    for (const label of ['Rosette:', 'Rubber:', 'Travel:', 'Lever:', 'Cutter:', 'Follower:', 'Material:']) expect(pageTexts[0]).toContain(label);
    expect(pageTexts[0]).toContain('24 lobes, sine');
    expect(pageTexts[0]).toContain('Print at 100 % (actual size)');
    expect(pageTexts[1]).toContain('one period enlarged');
    expect(pageTexts[2]).toContain('line study');
    expect(text).toContain('Calibration square: it must measure 10 mm x 10 mm on paper.');
    expect(text).toContain(`Passes: ${plan.passes} at ${formatLength(plan.stepOver, 'mm')} step-over`);
    expect(text).toContain(`${plan.totalMinutes.toFixed(1)} min in all`);
    expect(text).toContain(`${Math.round(plan.rpm)} rpm`);
    expect(text).toContain('Wear eye protection');
    expect(text).toContain('No gloves, loose clothing');
    expect(text).toMatch(/Heat treatment[\s\S]*HRC 57-62/);
  });

  it('lists the warnings the studio shows: the profile\'s summarised warnings, then the plan\'s', async () => {
    const design = scallopedBar();
    const profile = computeProfile(design);
    const plan = planCut(design, profile);
    expect(profile.warnings.length).toBeGreaterThan(0);
    const { pageTexts } = await textOf(await pdfOf(design, profile));
    const first = flat(pageTexts[0]);
    const last = flat(pageTexts.at(-1)! + pageTexts.at(-2)!);
    for (const w of [...profile.warnings, ...plan.warnings]) {
      expect(first).toContain(flat(w.message));
      expect(last).toContain(flat(w.message));
    }
    expect(first).not.toContain('- none');
  });

  it('adds the opposite blank at 1:1 and in the enlarged period as the shown-and-opposite PDF', async () => {
    const without = await textOf(await pdfOf());
    const bytes = await pdfOf(demoDesign, computeProfile(demoDesign), 'pdf-pair');
    const { text, pages } = await textOf(bytes);
    expect(pages).toBe(without.pages + 1);
    expect(text).toContain('Opposite blank, turned over (cut edge on top). Tile 1 of 1');
    expect(text).toContain('the opposite blank of the same cut');
    expect(without.text).not.toContain('Opposite blank');
  });

  it('is A4 landscape with a 10 mm calibration square and the bar drawn at 1:1', async () => {
    const bytes = await pdfOf();
    const { boxes, size } = await pathBoxes(bytes, await pageWith(bytes, 'Tile 1 of 1'));
    expect(size[0]).toBeCloseTo(297 * PT_PER_MM, 2);
    expect(size[1]).toBeCloseTo(210 * PT_PER_MM, 2);
    const square = boxes.find((b) => Math.abs(b.width - b.height) < 1e-3 && b.width < 40);
    expect(square?.width).toBeCloseTo(10 * PT_PER_MM, 2);
    const bar = boxes.find((b) => Math.abs(b.width - 150 * PT_PER_MM) < 0.05 && b.height > 10 * PT_PER_MM);
    expect(bar?.x0).toBeCloseTo(PAGE_MARGIN_MM * PT_PER_MM, 2);
  });

  it('uses Letter and a 1 in square for an inch design', async () => {
    const bytes = await pdfOf(demoInInches());
    const { boxes, size } = await pathBoxes(bytes, await pageWith(bytes, 'Tile 1 of 1'));
    expect(size).toEqual([792, 612]);
    expect(boxes.some((b) => Math.abs(b.width - 72) < 1e-3 && Math.abs(b.height - 72) < 1e-3)).toBe(true);
    expect((await textOf(bytes)).text).toContain('1 in x 1 in');
  });

  it('tiles a bar longer than the page over several overlapping pages', async () => {
    const long = structuredClone(demoDesign);
    long.bar.length = 600;
    const { text, pages } = await textOf(await pdfOf(long, handMadeProfile(long, 0.1)));
    expect(text).toContain('Tile 1 of 3');
    expect(text).toContain('Tile 3 of 3');
    expect(text).toContain('tile 2 starts here');
    expect(pages).toBeGreaterThanOrEqual(4);
  });

  // A lever of 10 on a 10 mm rosette: an edge about 82 mm deep, a drawing about 115 mm high on a 210 mm page.
  const deep = (amplitude: number): Design => ({
    ...EXAMPLE_DESIGN,
    rosette: { baseRadius: 60, layers: [{ lobes: 6, amplitude, phase: 0, wave: { shape: 'sine' } }] },
    motion: { travelPerRev: 100, leverRatio: 10 },
  });
  /** Below the heading's four lines, above the calibration square and its note (points). */
  const heading = 210 * PT_PER_MM - PAGE_MARGIN_MM * PT_PER_MM - 54;
  const foot = PAGE_MARGIN_MM * PT_PER_MM + 4 + 10 * PT_PER_MM;

  it('keeps a deep bar on the page, clear of the heading and the calibration square', async () => {
    const design = deep(10);
    const bytes = await pdfOf(design, computeProfile(design));
    const { boxes } = await pathBoxes(bytes, await pageWith(bytes, 'Tile 1 of 1'));
    const bar = boxes.filter((b) => Math.abs(b.width - 150 * PT_PER_MM) < 0.5 && b.height < 200 * PT_PER_MM);
    expect(bar.length).toBeGreaterThan(0);
    for (const b of bar) {
      expect(b.y0).toBeGreaterThan(foot);
      expect(b.y0 + b.height).toBeLessThan(heading);
    }
  });

  it('tiles a bar deeper than the page into overlapping rows at 1:1 instead of clipping it', async () => {
    const design = deep(30);
    const bytes = await pdfOf(design, computeProfile(design));
    const { text, pages } = await textOf(bytes);
    expect(text).toContain('Tile 1 of 1, row 1 of 3');
    expect(text).toContain('row 3 of 3');
    expect(text).toContain('row 2 starts here');
    expect(pages).toBeGreaterThanOrEqual(4);
    const firstTile = await pageWith(bytes, 'Tile 1 of 1');
    for (let page = firstTile; page < firstTile + 3; page++) {
      // The band each row is clipped to (the full-width rectangle) lies between the square and the heading.
      const band = (await pathBoxes(bytes, page)).boxes.find((b) => b.width > 290 * PT_PER_MM)!;
      expect(band.y0).toBeGreaterThan(foot);
      expect(band.y0 + band.height).toBeLessThan(heading);
    }
  });
});
