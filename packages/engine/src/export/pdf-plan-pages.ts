import type { Units } from '@barwright/contracts';
import type { PDFDocument, PDFFont, PDFPage } from 'pdf-lib';
import type { CutPlan } from '../cut-plan';
import { formatLength } from '../length-format';
import type { EngineWarning } from '../types';
import { SUPPLIER_NOTE } from './pdf-cover-page';
import { PAGE_MARGIN_MM, PT_PER_MM } from './pdf-tiles';
import { winAnsiText, wrapText } from './pdf-text';

export interface PlanPageFonts {
  regular: PDFFont;
  bold: PDFFont;
}

/** The cut plan's figures as lines of text, lengths in the design's units. */
export function planFigureLines(plan: CutPlan, materialName: string, units: Units): string[] {
  const len = (mm: number) => formatLength(mm, units);
  return [
    `Material: ${materialName}`,
    `Depth: ${len(plan.depth)} (bar edge peak-to-valley plus clean-up)`,
    `Passes: ${plan.passes} at ${len(plan.stepOver)} step-over`,
    `Time: ${plan.minutesPerPass.toFixed(2)} min per pass, ${plan.totalMinutes.toFixed(1)} min in all`,
    `Spindle: ${Math.round(plan.rpm)} rpm (surface speed ${plan.surfaceSpeed} m/min)`,
    `Feed: ${len(plan.feedPerMinute)}/min at a chip load of ${len(plan.chipLoad)} per tooth`,
  ];
}

/** Adds the pages with the cut plan, warnings, reminders, heat treatment and cautions. */
export function addPlanPages(
  doc: PDFDocument,
  size: readonly [number, number],
  fonts: PlanPageFonts,
  content: { name: string; title: string; plan: CutPlan; materialName: string; units: Units; warnings: readonly EngineWarning[] },
): void {
  const margin = PAGE_MARGIN_MM * PT_PER_MM;
  const width = size[0] - 2 * margin;
  let page: PDFPage = doc.addPage([size[0], size[1]]);
  let y = size[1] - margin;

  const write = (text: string, fontSize: number, font: PDFFont, indent = 0) => {
    for (const line of wrapText(text, font, fontSize, width - indent)) {
      if (y - fontSize < margin) {
        page = doc.addPage([size[0], size[1]]);
        y = size[1] - margin;
      }
      y -= fontSize * 1.3;
      page.drawText(line, { x: margin + indent, y, size: fontSize, font });
    }
  };
  const section = (heading: string, items: readonly string[]) => {
    y -= 6;
    write(heading, 12, fonts.bold);
    for (const item of items) write(`- ${item}`, 9.5, fonts.regular, 8);
  };

  write(winAnsiText(`${content.name} - cut plan`), 15, fonts.bold);
  write(content.title, 9.5, fonts.regular);
  section('Cut plan', planFigureLines(content.plan, content.materialName, content.units));
  section('Warnings', content.warnings.length ? content.warnings.map((w) => w.message) : ['none: the studio shows no warning for this design.']);
  section('Set-up reminders', content.plan.reminders);
  if (content.plan.heatTreatment) section('Heat treatment', content.plan.heatTreatment);
  section('Cautions', [...content.plan.cautions, SUPPLIER_NOTE]);
}
