import { computeHeightField, periodLineStudy, shadeHeightField, vGrooveWidth } from '@barwright/engine';
import type { ThumbRequest } from './sweep-messages';
import { thumbLineLength } from './thumb-frame';

/**
 * A thumbnail's picture, drawn in a pool worker: the candidate's line study laid from its engraved
 * line (the engine's periodLineStudy, as the studio's study), then the engine's height field of
 * those grooves shaded as metal (as the studio's lit plate), over the request's window.
 */
export function paintThumb(r: ThumbRequest): ImageBitmap {
  const reach = vGrooveWidth(r.study.depth, r.study.vAngle) / 2;
  const study = periodLineStudy(r.study, { line: r.line, step: r.step }, thumbLineLength(r.window, reach));
  // Only the lines that can reach the window: a tall study's far lines cost time and show nothing.
  let top = 0;
  for (let i = 0; i < r.line.length; i++) top = Math.max(top, r.line[i]);
  const lines = study.lines.filter((_, j) => {
    const base = j * study.spacing;
    return base + top >= r.window.y0 - reach && base <= r.window.y1 + reach;
  });
  const field = computeHeightField({
    lines,
    depth: r.study.depth,
    vAngle: r.study.vAngle,
    window: r.window,
    width: r.widthPx,
    height: r.heightPx,
    maxReach: r.study.lineSpacing + top,
  });
  const rgba = shadeHeightField(field, r.light, r.tint);
  const canvas = new OffscreenCanvas(r.widthPx, r.heightPx);
  canvas.getContext('2d')!.putImageData(new ImageData(rgba as Uint8ClampedArray<ArrayBuffer>, r.widthPx, r.heightPx), 0, 0);
  return canvas.transferToImageBitmap();
}
