import type { PDFDocument, PDFFont } from 'pdf-lib';
import { SHORT_CAUTION } from '../cut-plan-notes';
import type { EngineWarning } from '../types';
import { PAGE_MARGIN_MM, PT_PER_MM } from './pdf-tiles';
import { winAnsiText, wrapText } from './pdf-text';
import type { SetUpLine } from './set-up-lines';

export interface PdfFonts {
  regular: PDFFont;
  bold: PDFFont;
}

/** Words printed wherever the template speaks of scale. */
export const PRINT_NOTE = 'Print at 100 % (actual size), not "fit to page", then check the calibration square with a rule.';
/** The supplier note the studio prints under its cautions. */
export const SUPPLIER_NOTE = "Follow the steel supplier's data and local rules: these figures are starting points, not instructions.";

export interface CoverContent {
  name: string;
  title: string;
  setUp: readonly SetUpLine[];
  warnings: readonly EngineWarning[];
  /** How the pages that follow are laid out, one line each. */
  contents: readonly string[];
}

/**
 * The first page: the design's name, what it is, the set-up block, the warnings the studio shows,
 * what the following pages hold and how to print them (a longer text runs onto a second page).
 */
export function addCoverPage(doc: PDFDocument, size: readonly [number, number], fonts: PdfFonts, content: CoverContent): void {
  const margin = PAGE_MARGIN_MM * PT_PER_MM;
  const width = size[0] - 2 * margin;
  let page = doc.addPage([size[0], size[1]]);
  let y = size[1] - margin;
  const write = (text: string, fontSize: number, font: PDFFont, indent = 0) => {
    for (const line of wrapText(text, font, fontSize, width - indent)) {
      if (y - fontSize * 1.3 < margin) {
        page = doc.addPage([size[0], size[1]]);
        y = size[1] - margin;
      }
      y -= fontSize * 1.3;
      page.drawText(line, { x: margin + indent, y, size: fontSize, font });
    }
  };
  write(winAnsiText(content.name), 18, fonts.bold);
  write(content.title, 10.5, fonts.regular);
  y -= 8;
  write('Set-up', 12, fonts.bold);
  for (const line of content.setUp) {
    const label = winAnsiText(`${line.label}:`);
    if (y - 9.5 * 1.3 < margin) {
      page = doc.addPage([size[0], size[1]]);
      y = size[1] - margin;
    }
    page.drawText(label, { x: margin + 8, y: y - 9.5 * 1.3, size: 9.5, font: fonts.bold });
    write(line.value, 9.5, fonts.regular, 80);
  }
  y -= 6;
  write('Warnings', 12, fonts.bold);
  if (content.warnings.length === 0) write('- none: the studio shows no warning for this design.', 9.5, fonts.regular, 8);
  for (const w of content.warnings) write(`- ${w.message}`, 9.5, fonts.regular, 8);
  y -= 6;
  write('This file', 12, fonts.bold);
  for (const line of content.contents) write(`- ${line}`, 9.5, fonts.regular, 8);
  write(`- ${PRINT_NOTE}`, 9.5, fonts.bold, 8);
  y -= 6;
  write(`CAUTION: ${SHORT_CAUTION}`, 9, fonts.regular);
  write(SUPPLIER_NOTE, 9, fonts.regular);
}
