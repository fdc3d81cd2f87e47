import { MM_PER_INCH, type Units } from '@barwright/contracts';
import {
  PDFDocument,
  StandardFonts,
  clip,
  endPath,
  lineTo,
  moveTo,
  popGraphicsState,
  pushGraphicsState,
  rectangle,
  setDashPattern,
  setFillingGrayscaleColor,
  setLineWidth,
  setStrokingGrayscaleColor,
  setStrokingRgbColor,
  fillAndStroke,
  stroke,
  type PDFFont,
  type PDFOperator,
  type PDFPage,
} from 'pdf-lib';
import type { CutPlan } from '../cut-plan';
import { SHORT_CAUTION } from '../cut-plan-notes';
import { formatLength } from '../length-format';
import type { Point } from '../types';
import type { BarDrawing } from './bar-drawing';
import type { LineStudy } from '../line-study';
import type { EngineWarning } from '../types';
import { addCoverPage, type PdfFonts } from './pdf-cover-page';
import { addFigurePages } from './pdf-figure-pages';
import type { PeriodFigure } from './pdf-figures';
import { path, pushAll } from './pdf-paths';
import { addPlanPages } from './pdf-plan-pages';
import type { SetUpLine } from './set-up-lines';
import { winAnsiText } from './pdf-text';
import { PAGE_MARGIN_MM, PAPER_POINTS, PT_PER_MM, TILE_OVERLAP_MM, tileRanges, type Paper, type Tile } from './pdf-tiles';

export interface PdfJob {
  /** The design's own name, as its board or entry calls it. */
  name: string;
  /** What the design is, in one line (rosette, material, bar). */
  title: string;
  units: Units;
  drawing: BarDrawing;
  plan: CutPlan;
  materialName: string;
  setUp: readonly SetUpLine[];
  /** The warnings the studio shows: the profile's (one per kind, summarised) then the cut plan's. */
  warnings: readonly EngineWarning[];
  period: PeriodFigure;
  study: LineStudy;
  /** The opposite blank, turned over so its cut edge is on top, when the pair is asked for. */
  opposite?: BarDrawing;
  /** Default: A4 for a mm design, Letter for an inch design. */
  paper?: Paper;
}

/** Side of the calibration square: 10 mm, or 1 in for an inch design. */
export function calibrationSideMm(units: Units): number {
  return units === 'in' ? MM_PER_INCH : 10;
}

/**
 * A printable template: a first page with the name, set-up and warnings; one period enlarged; the
 * line study; one landscape page per tile of the bar at 1:1 (with a calibration square, x marks and
 * seam marks), the opposite blank's tiles when asked; then the cut plan. Deterministic: no dates are written.
 */
export async function barPdf(job: PdfJob): Promise<Uint8Array> {
  const doc = await PDFDocument.create({ updateMetadata: false });
  doc.setTitle(winAnsiText(`${job.name}: ${job.title}`));
  doc.setCreator('Barwright');
  const fonts = { regular: await doc.embedFont(StandardFonts.Helvetica), bold: await doc.embedFont(StandardFonts.HelveticaBold) };
  const size = PAPER_POINTS[job.paper ?? (job.units === 'in' ? 'letter' : 'a4')];
  addCoverPage(doc, size, fonts, { name: job.name, title: job.title, setUp: job.setUp, warnings: job.warnings, contents: contentsOf(job) });
  addFigurePages(doc, size, fonts, job);
  addTilePages(doc, size, fonts, job, job.drawing, '');
  if (job.opposite) addTilePages(doc, size, fonts, job, job.opposite, 'Opposite blank, turned over (cut edge on top). ');
  addPlanPages(doc, size, fonts, job);
  return doc.save();
}

function contentsOf(job: PdfJob): string[] {
  return [
    `Page 2: one period enlarged${job.opposite ? ', with the opposite blank of the same cut above it' : ''}; page 3: the line study.`,
    `Then the bar at 1:1 (actual size) over one or more tiles with a calibration square${job.opposite ? ', then the opposite blank at 1:1' : ''}.`,
    'Last: the cut plan, warnings, set-up reminders, heat treatment and safety cautions.',
  ];
}

function addTilePages(doc: PDFDocument, size: readonly [number, number], fonts: PdfFonts, job: PdfJob, drawing: BarDrawing, what: string): void {
  const usableMm = size[0] / PT_PER_MM - 2 * PAGE_MARGIN_MM;
  const tiles = tileRanges(drawing.length, usableMm);
  const band = drawingBand(size[1], job.units);
  const content = contentSpan(drawing);
  const rows = tileRanges(content.top - content.bottom, band.heightMm).map((r) => ({ ...r, count: 0 }));
  rows.forEach((r) => (r.count = rows.length));
  for (const row of rows) for (const tile of tiles) drawTilePage(doc.addPage([size[0], size[1]]), { job, drawing, what, tile, tiles, row, band, content }, fonts);
}

/** One page: a tile along the bar, and a row of its height when the drawing is deeper than the page. */
interface PageTile {
  job: PdfJob;
  drawing: BarDrawing;
  /** Which blank, when not the bar itself. */
  what: string;
  tile: Tile;
  tiles: readonly Tile[];
  row: Tile & { count: number };
  band: Band;
  content: { bottom: number; top: number };
}

/** The strip of the page the drawing may use, between the calibration square and the heading (points and mm). */
interface Band {
  bottomPt: number;
  heightMm: number;
}

/** Room kept below the drawing for the calibration square and its note, and above it for the four heading lines (points). */
function drawingBand(pageHeight: number, units: Units): Band {
  const bottomPt = PAGE_MARGIN_MM * PT_PER_MM + 4 + calibrationSideMm(units) * PT_PER_MM + 6;
  const topPt = pageHeight - PAGE_MARGIN_MM * PT_PER_MM - 62;
  return { bottomPt, heightMm: (topPt - bottomPt) / PT_PER_MM };
}

/** Heights (mm) the drawing reaches: the seam marks and tick labels below the back, the seam labels above the top. */
function contentSpan(drawing: BarDrawing): { bottom: number; top: number } {
  return { bottom: drawing.backY - 8, top: Math.max(drawing.topY, drawing.blankEdgeY) + 10 };
}

function drawTilePage(page: PDFPage, where: PageTile, fonts: { regular: PDFFont; bold: PDFFont }): void {
  const { job, drawing, tile, tiles, row, band, content } = where;
  const k = PT_PER_MM;
  const margin = PAGE_MARGIN_MM * k;
  const { height } = page.getSize();
  const unit = job.units;
  // One row: the drawing centred in the band; several: each row's stretch of height from the band's foot.
  const spare = Math.max(0, band.heightMm - (content.top - content.bottom));
  const foot = content.bottom + row.xFrom - (row.count === 1 ? spare / 2 : 0);
  const toPt = ([x, y]: Point): Point => [margin + (x - tile.xFrom) * k, band.bottomPt + (y - foot) * k];
  const text = (s: string, x: number, y: number, size = 9, font = fonts.regular) => page.drawText(winAnsiText(s), { x, y, size, font });

  text(`${job.name} - ${job.title}`, margin, height - margin - 12, 13, fonts.bold);
  const span = `x ${fmt(tile.xFrom, unit)} to ${fmt(tile.xTo, unit)} ${unit}`;
  const rowNote = row.count > 1 ? `, row ${row.index + 1} of ${row.count} counted up from the back of the bar (rows overlap by ${fmt(TILE_OVERLAP_MM, unit)} ${unit})` : '';
  text(`${where.what}Tile ${tile.index + 1} of ${tiles.length}${rowNote}: ${span}. Print at 100 % (actual size), not "fit to page".`, margin, height - margin - 28);
  text('Grey: the bar, cut edge on top. Dashed red: the cutter-centre path. Thin line: the blank before cutting.', margin, height - margin - 41);
  const { plan } = job;
  const summary = `Cut plan: ${plan.passes} passes of ${formatLength(plan.stepOver, unit)}, about ${plan.totalMinutes.toFixed(1)} min at ${Math.round(plan.rpm)} rpm. The full plan and the cautions are on the last pages.`;
  text(summary, margin, height - margin - 54);

  const clipWidth = (tile.xTo - tile.xFrom) * k;
  const bandHeight = Math.min(band.heightMm, row.xTo - row.xFrom) * k;
  page.pushOperators(pushGraphicsState(), rectangle(0, band.bottomPt, page.getSize().width, bandHeight), clip(), endPath());
  page.pushOperators(pushGraphicsState(), rectangle(margin, 0, clipWidth, height), clip(), endPath());
  // Each page gets only the stretch of the paths it shows (the clip trims the rest): a page per tile of the whole path made long bars slow.
  const edge = onTile(drawing.edge, tile);
  const outline: Point[] = [...edge, [edge[edge.length - 1][0], drawing.backY], [edge[0][0], drawing.backY]];
  pushAll(page, [pushGraphicsState(), setLineWidth(0.6), setStrokingGrayscaleColor(0), setFillingGrayscaleColor(0.88)], path(outline.map(toPt), true), [fillAndStroke(), popGraphicsState()]);
  pushAll(page, [pushGraphicsState(), setLineWidth(0.4), setStrokingRgbColor(0.7, 0, 0.12), setDashPattern([2, 2], 0)], path(onTile(drawing.cutterPath, tile).map(toPt), false), [stroke(), popGraphicsState()]);
  const blank = [toPt([tile.xFrom, drawing.blankEdgeY]), toPt([tile.xTo, drawing.blankEdgeY])];
  page.pushOperators(pushGraphicsState(), setLineWidth(0.3), setStrokingGrayscaleColor(0.4), ...path(blank, false), stroke(), popGraphicsState());
  page.pushOperators(popGraphicsState());

  drawTicks(page, job, tile, toPt, text);
  drawSeams(page, tile, tiles, toPt, drawing, text);
  if (row.count > 1) drawRowSeams(page, row, band, margin, clipWidth, text);
  page.pushOperators(popGraphicsState());
  drawCalibrationSquare(page, unit, margin, text);
  text(`CAUTION: ${SHORT_CAUTION}`, margin, margin - 14, 7.5);
}

type TextFn = (s: string, x: number, y: number, size?: number) => void;

/** Marks along the back of the bar: every 10 mm with a figure every 50 mm, or every 1/4 in with a figure every inch. */
function drawTicks(page: PDFPage, job: PdfJob, tile: Tile, toPt: (p: Point) => Point, text: TextFn): void {
  const stepMm = job.units === 'in' ? MM_PER_INCH / 4 : 10;
  const labelEvery = job.units === 'in' ? 4 : 5;
  const ops: PDFOperator[] = [pushGraphicsState(), setLineWidth(0.5), setStrokingGrayscaleColor(0)];
  for (let i = Math.ceil(tile.xFrom / stepMm - 1e-9); i * stepMm <= tile.xTo + 1e-9; i++) {
    const [x, y] = toPt([i * stepMm, job.drawing.backY]);
    const long = i % labelEvery === 0;
    ops.push(moveTo(x, y), lineTo(x, y - (long ? 8 : 4)));
    if (long) text(`${fmt(i * stepMm, job.units)} ${job.units}`, x + 1.5, y - 16, 7);
  }
  pushAll(page, ops, [stroke(), popGraphicsState()]);
}

/** Dashed lines where the neighbouring tiles start and end, for lining the sheets up. */
function drawSeams(page: PDFPage, tile: Tile, tiles: readonly Tile[], toPt: (p: Point) => Point, drawing: BarDrawing, text: TextFn): void {
  const marks: Array<[number, string]> = [];
  const next = tiles[tile.index + 1];
  const previous = tiles[tile.index - 1];
  if (next) marks.push([next.xFrom, `tile ${next.index + 1} starts here`]);
  if (previous) marks.push([previous.xTo, `tile ${previous.index + 1} ends here`]);
  for (const [xMm, label] of marks) {
    const [x, low] = toPt([xMm, drawing.backY - 6]);
    const [, high] = toPt([xMm, drawing.blankEdgeY + 6]);
    page.pushOperators(pushGraphicsState(), setLineWidth(0.4), setDashPattern([4, 2], 0), moveTo(x, low), lineTo(x, high), stroke(), popGraphicsState());
    text(label, x + 2, high + 2, 7);
  }
}

/** Dashed lines across the tile where the rows above and below end and start, for lining the sheets up. */
function drawRowSeams(page: PDFPage, row: Tile & { count: number }, band: Band, margin: number, width: number, text: TextFn): void {
  const marks: Array<[number, string]> = [];
  if (row.index + 1 < row.count) marks.push([row.xTo - TILE_OVERLAP_MM, `row ${row.index + 2} starts here`]);
  if (row.index > 0) marks.push([row.xFrom + TILE_OVERLAP_MM, `row ${row.index} ends here`]);
  for (const [mm, label] of marks) {
    const y = band.bottomPt + (mm - row.xFrom) * PT_PER_MM;
    page.pushOperators(pushGraphicsState(), setLineWidth(0.4), setDashPattern([4, 2], 0), moveTo(margin, y), lineTo(margin + width, y), stroke(), popGraphicsState());
    text(label, margin + 2, y + 2, 7);
  }
}

/** The square the printout is checked with: 10 mm, or 1 in for an inch design. */
function drawCalibrationSquare(page: PDFPage, units: Units, margin: number, text: TextFn): void {
  const side = calibrationSideMm(units) * PT_PER_MM;
  const y = margin + 4;
  page.pushOperators(pushGraphicsState(), setLineWidth(0.5), setStrokingGrayscaleColor(0), rectangle(margin, y, side, side), stroke(), popGraphicsState());
  const label = units === 'in' ? '1 in x 1 in' : '10 mm x 10 mm';
  text(`Calibration square: it must measure ${label} on paper.`, margin + side + 6, y + side / 2 - 3);
}

/** The points of a path (x ascending) on a tile, with one more each side so the lines run past its edges. */
function onTile(points: readonly Point[], tile: Tile): Point[] {
  let from = 0;
  while (from < points.length - 1 && points[from + 1][0] < tile.xFrom) from++;
  let to = points.length - 1;
  while (to > from && points[to - 1][0] > tile.xTo) to--;
  return points.slice(from, to + 1);
}

function fmt(mm: number, units: Units): string {
  return String(+(units === 'in' ? mm / MM_PER_INCH : mm).toFixed(units === 'in' ? 3 : 1));
}
