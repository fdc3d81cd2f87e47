/// <reference lib="webworker" />
import { computeHeightField, shadeHeightField, type HeightField, type MetalTint, type Point, type SurfaceLight } from '@barwright/engine';
import type { PlateReply, PlateRequest } from './plate-messages';

/*
 * One plate of the line study, drawn off the page's thread into the OffscreenCanvas handed over: the
 * flat plate (ink lines at true scale, the groove's width) or the lit one (the engine's height field
 * of the grooves, shaded as metal). The page runs a worker per plate, so the lit surface is computed
 * while the flat plate is drawn, on the machine's other core. A light or metal change only reshades
 * the lit plate. Messages that arrive while it works replace the waiting ones of their kind, so a
 * slider dragged fast paints only its newest position.
 */
type Surface = Extract<PlateRequest, { kind: 'surface' }>;
let plate: 'flat' | 'lit' = 'flat';
let canvas: OffscreenCanvas | null = null;
let field: HeightField | null = null;
/** The request the surface held is of. */
let fieldId = 0;
let light: SurfaceLight = { azimuthDeg: 60, elevationDeg: 35 };
let tint: MetalTint = 'silver';
let pendingSurface: Surface | null = null;
let pendingLight: Extract<PlateRequest, { kind: 'light' }> | null = null;
let scheduled = false;

addEventListener('message', (event: MessageEvent<PlateRequest>) => {
  const request = event.data;
  if (request.kind === 'canvas') ({ plate, canvas } = request);
  else if (request.kind === 'surface') pendingSurface = request;
  else pendingLight = request;
  schedule();
});

function schedule(): void {
  if (scheduled) return;
  scheduled = true;
  setTimeout(work, 0);
}

/** One step: the newest study drawn on this worker's plate; on the lit plate, a new light reshades the surface held. */
function work(): void {
  scheduled = false;
  const surface = pendingSurface;
  pendingSurface = null;
  if (!canvas) return;
  if (plate === 'flat') {
    if (surface) drawFlat(surface, canvas);
    return;
  }
  const relit = pendingLight !== null;
  if (pendingLight) {
    ({ light, tint } = pendingLight);
    pendingLight = null;
  }
  let fieldMs = 0;
  // A draft leaves the lit plate alone: its surface would be computed only to be replaced by the final one.
  if (surface && !surface.flatOnly) {
    const started = performance.now();
    field = computeHeightField({ lines: surface.lines.map(toPoints), depth: surface.depth, vAngle: surface.vAngle, window: surface.window, width: surface.widthPx, height: surface.heightPx, reuse: field });
    fieldMs = performance.now() - started;
    fieldId = surface.id;
  } else if (!relit) return;
  if (!field) return;
  const started = performance.now();
  const rgba = shadeHeightField(field, light, tint);
  if (canvas.width !== field.width || canvas.height !== field.height) [canvas.width, canvas.height] = [field.width, field.height];
  canvas.getContext('2d')?.putImageData(new ImageData(rgba as Uint8ClampedArray<ArrayBuffer>, field.width, field.height), 0, 0);
  self.postMessage({ id: fieldId, plate: 'lit', fieldMs, paintMs: performance.now() - started } satisfies PlateReply);
}

/** The flat plate: each engraved line in ink, as wide as its groove (at least a hairline), at true scale. */
function drawFlat(s: Surface, flat: OffscreenCanvas): void {
  const started = performance.now();
  if (flat.width !== s.widthPx || flat.height !== s.heightPx) [flat.width, flat.height] = [s.widthPx, s.heightPx];
  const ctx = flat.getContext('2d');
  if (!ctx) return;
  const sx = s.widthPx / (s.window.x1 - s.window.x0);
  const sy = s.heightPx / (s.window.y1 - s.window.y0);
  ctx.fillStyle = s.ground;
  ctx.fillRect(0, 0, s.widthPx, s.heightPx);
  ctx.strokeStyle = s.ink;
  ctx.lineWidth = Math.max(s.width * sx, s.hairlinePx);
  ctx.lineJoin = 'round';
  ctx.beginPath();
  for (const xy of s.lines) {
    for (let i = 0; i < xy.length; i += 2) {
      const px = (xy[i] - s.window.x0) * sx;
      const py = (s.window.y1 - xy[i + 1]) * sy;
      if (i === 0) ctx.moveTo(px, py);
      else ctx.lineTo(px, py);
    }
  }
  ctx.stroke();
  self.postMessage({ id: s.id, plate: 'flat', fieldMs: 0, paintMs: performance.now() - started } satisfies PlateReply);
}

function toPoints(xy: Float64Array): { points: Point[] } {
  const points: Point[] = new Array(xy.length / 2);
  for (let i = 0; i < points.length; i++) points[i] = [xy[2 * i], xy[2 * i + 1]];
  return { points };
}
