import type { Design } from '@barwright/contracts';
import { computeHeightField, computeLineStudy, computeProfile, shadeHeightField, toMm, type LineStudy, type SurfaceLight, type SurfaceWindow } from '@barwright/engine';
import sharp from 'sharp';

/** Size the thumbnail is drawn at, in pixels: a card's proportions (4:3). */
export const THUMBNAIL_WIDTH_PX = 480;
export const THUMBNAIL_HEIGHT_PX = 360;
/** The window shows at least this many periods of the bar, so the wave reads as a pattern. */
const MIN_PERIODS = 4;
/** The light the studio opens with: from the upper left, 40° above the plate. */
export const THUMBNAIL_LIGHT: SurfaceLight = { azimuthDeg: 135, elevationDeg: 40 };
/** Samples per pixel along each axis: a thumbnail is drawn once, so it can afford more than a live view. */
const SUPERSAMPLE = 3;

/**
 * The card thumbnail of a design: the engraved surface of its line study (the engine's height field,
 * Blinn–Phong shaded as the web draws it) over a card-shaped window near the start of the bar, as a
 * palette PNG (sharp) inside an SVG whose viewBox is the window in millimetres. The study repeats along the
 * bar, so a few periods show the pattern.
 */
export async function entryThumbnailSvg(design: Design): Promise<string> {
  const profile = computeProfile(design);
  const study = computeLineStudy(design, profile);
  const { depth, vAngle } = toMm(design).study;
  const window = thumbnailWindow(study, profile.period, depth * Math.tan((vAngle * Math.PI) / 360));
  const maxReach = 2 * (study.spacing + lineHeight(study)); // a very wide V still costs a few lines' strips per sample
  const field = computeHeightField({ lines: study.lines, depth, vAngle, window, width: THUMBNAIL_WIDTH_PX, height: THUMBNAIL_HEIGHT_PX, supersample: SUPERSAMPLE, maxReach });
  const rgba = shadeHeightField(field, THUMBNAIL_LIGHT, 'silver');
  const png = await sharp(Buffer.from(rgba.buffer, rgba.byteOffset, rgba.byteLength), { raw: { width: THUMBNAIL_WIDTH_PX, height: THUMBNAIL_HEIGHT_PX, channels: 4 } })
    .removeAlpha()
    .png({ palette: true, quality: 90, compressionLevel: 9 }) // 256 colours: a third of the full PNG's size, no visible banding on metal greys
    .toBuffer();
  const w = window.x1 - window.x0;
  const h = window.y1 - window.y0;
  const mm = (v: number) => +v.toFixed(4);
  return (
    `<?xml version="1.0" encoding="UTF-8"?>\n` +
    `<svg xmlns="http://www.w3.org/2000/svg" width="${THUMBNAIL_WIDTH_PX}" height="${THUMBNAIL_HEIGHT_PX}" viewBox="0 0 ${mm(w)} ${mm(h)}">` +
    `<title>Line study, engraved (${mm(w)} × ${mm(h)} mm)</title>` +
    `<image width="${mm(w)}" height="${mm(h)}" preserveAspectRatio="none" href="data:image/png;base64,${png.toString('base64')}"/>` +
    `</svg>\n`
  );
}

/**
 * A 4:3 window (mm) over the study: at least MIN_PERIODS periods, or the lines' height, wide; starting
 * a period into the bar (past the grooves' run-in) when the bar is long enough, with the lowest line
 * at the bottom. `reach` is the groove's half width at the surface.
 */
function thumbnailWindow(study: LineStudy, period: number, reach: number): SurfaceWindow {
  let low = Infinity;
  let high = -Infinity;
  for (const line of study.lines) for (const [, y] of line.points) [low, high] = [Math.min(low, y), Math.max(high, y)];
  if (!Number.isFinite(low)) [low, high] = [0, 0];
  const aspect = THUMBNAIL_WIDTH_PX / THUMBNAIL_HEIGHT_PX;
  const width = Math.min(study.length, Math.max((high - low + 2 * reach) * aspect, MIN_PERIODS * period));
  const x0 = Math.max(0, Math.min(period, study.length - width));
  const y0 = low - 2 * reach;
  return { x0, x1: x0 + width, y0, y1: y0 + width / aspect };
}

/** Peak-to-valley of the first line (mm): every line is the same wave shifted. */
function lineHeight(study: LineStudy): number {
  let [low, high] = [Infinity, -Infinity];
  for (const [, y] of study.lines[0]?.points ?? []) [low, high] = [Math.min(low, y), Math.max(high, y)];
  return Number.isFinite(low) ? high - low : 0;
}
