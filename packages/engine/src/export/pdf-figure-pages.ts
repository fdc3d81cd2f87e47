import type { Units } from '@barwright/contracts';
import type { PDFDocument, PDFPage } from 'pdf-lib';
import { formatLength } from '../length-format';
import type { LineStudy } from '../line-study';
import type { PdfFonts } from './pdf-cover-page';
import { drawPeriod, drawStudy, type PeriodFigure } from './pdf-figures';
import { winAnsiText, wrapText } from './pdf-text';
import { PAGE_MARGIN_MM, PT_PER_MM } from './pdf-tiles';

export interface FigureContent {
  name: string;
  units: Units;
  period: PeriodFigure;
  study: LineStudy;
}

/** Times life size, written plainly: `12.5:1`, `1.8:1`. */
function scaleText(scale: number): string {
  return `${+scale.toPrecision(scale >= 10 ? 3 : 2)}:1`;
}

/** Page 2, one period enlarged, and page 3, the line study: not to print at 1:1, so each says its scale. */
export function addFigurePages(doc: PDFDocument, size: readonly [number, number], fonts: PdfFonts, content: FigureContent): void {
  const margin = PAGE_MARGIN_MM * PT_PER_MM;
  const len = (mm: number) => formatLength(mm, content.units);
  const { period, study } = content;

  const periodPage = doc.addPage([size[0], size[1]]);
  const periodBox = { x: margin, y: margin + 30, width: size[0] - 2 * margin, height: size[1] - 2 * margin - 90 };
  const text = textOn(periodPage, fonts);
  const shown = drawPeriod(periodPage, period, periodBox, content.units, text);
  heading(periodPage, fonts, size, `${content.name} - one period enlarged`, [
    `x ${len(shown.from)} to ${len(shown.to)} along the bar, drawn ${scaleText(shown.scale)} (lengths and heights to the same scale; not for measuring). The dimension marks one period.`,
    `Grey: the bar, cut edge on top${period.upper ? '; darker grey above: the opposite blank of the same cut (its edge is the upper envelope of the cutter)' : ''}. Dashed red: the cutter-centre path. Blue: the follower centre on the straight-line machine.`,
  ]);

  const studyPage = doc.addPage([size[0], size[1]]);
  const width = size[0] - 2 * margin;
  const room = size[1] - 2 * margin - 70;
  const whole = drawStudy(studyPage, study, { x: margin, y: margin + room * 0.62, width, height: room * 0.38 - 14 });
  const textAt = textOn(studyPage, fonts);
  const below = margin + room * 0.62 + room * 0.38 - 14 - whole.height;
  // The middle stretch as long as fills the box's width at the height the lines take.
  const heightMm = whole.height / (whole.scale * PT_PER_MM);
  const window = middleWindow(study.length, Math.max(MIN_WINDOW_MM, (heightMm * width) / (below - 24 - margin)));
  textAt(`Above: the whole bar, ${scaleText(whole.scale)}. Below: the middle ${len(window.to - window.from)} (x ${len(window.from)} to ${len(window.to)}), enlarged.`, margin, below - 14, 9);
  const middle = drawStudy(studyPage, study, { x: margin, y: margin, width, height: below - 24 - margin }, window.from, window.to);
  heading(studyPage, fonts, size, `${content.name} - line study`, [
    `${study.lines.length} lines ${len(study.spacing)} apart, grooves ${len(study.width)} wide; the middle drawn ${scaleText(middle.scale)} (not for measuring).`,
    'The engraving the bar makes on the straight-line machine, each line drawn at the width of its groove.',
  ]);
}

/** Shortest enlarged middle of the line study, mm. */
const MIN_WINDOW_MM = 5;

function middleWindow(length: number, window: number): { from: number; to: number } {
  if (length <= window) return { from: 0, to: length };
  return { from: (length - window) / 2, to: (length + window) / 2 };
}

function textOn(page: PDFPage, fonts: PdfFonts) {
  return (s: string, x: number, y: number, size = 9) => page.drawText(winAnsiText(s), { x, y, size, font: fonts.regular });
}

function heading(page: PDFPage, fonts: PdfFonts, size: readonly [number, number], title: string, lines: readonly string[]): void {
  const margin = PAGE_MARGIN_MM * PT_PER_MM;
  let y = size[1] - margin - 14;
  page.drawText(winAnsiText(title), { x: margin, y, size: 13, font: fonts.bold });
  for (const line of lines) {
    for (const part of wrapText(line, fonts.regular, 9, size[0] - 2 * margin)) {
      y -= 12;
      page.drawText(part, { x: margin, y, size: 9, font: fonts.regular });
    }
  }
}
