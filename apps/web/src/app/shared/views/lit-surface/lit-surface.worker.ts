/// <reference lib="webworker" />
import { computeHeightField, shadeHeightField, type HeightField, type MetalTint, type Point, type SurfaceLight } from '@barwright/engine';
import type { LitReply, LitRequest } from './lit-messages';

/*
 * The lit plate, computed and painted off the page's thread into the OffscreenCanvas it was handed.
 * A new surface computes the height field (the expensive part); a light or metal change only
 * reshades it. Messages that arrive while it works replace the waiting ones of their kind, so a
 * light dragged fast paints only its newest position.
 */
let canvas: OffscreenCanvas | null = null;
let field: HeightField | null = null;
let light: SurfaceLight = { azimuthDeg: 60, elevationDeg: 35 };
let tint: MetalTint = 'silver';
let pendingSurface: Extract<LitRequest, { kind: 'surface' }> | null = null;
let pendingLight: Extract<LitRequest, { kind: 'light' }> | null = null;
let scheduled = false;

addEventListener('message', (event: MessageEvent<LitRequest>) => {
  const request = event.data;
  if (request.kind === 'canvas') canvas = request.canvas;
  else if (request.kind === 'surface') pendingSurface = request;
  else pendingLight = request;
  if (!scheduled) {
    scheduled = true;
    setTimeout(work, 0);
  }
});

function work(): void {
  scheduled = false;
  let fieldMs = 0;
  let id = 0;
  if (pendingLight) {
    ({ light, tint, id } = pendingLight);
    pendingLight = null;
  }
  if (pendingSurface) {
    const s = pendingSurface;
    pendingSurface = null;
    const started = performance.now();
    field = computeHeightField({ lines: s.lines.map(toPoints), depth: s.depth, vAngle: s.vAngle, window: s.window, width: s.width, height: s.height });
    fieldMs = performance.now() - started;
    id = Math.max(id, s.id);
  }
  if (!field || !canvas) return;
  const started = performance.now();
  const rgba = shadeHeightField(field, light, tint);
  if (canvas.width !== field.width || canvas.height !== field.height) [canvas.width, canvas.height] = [field.width, field.height];
  canvas.getContext('2d')?.putImageData(new ImageData(rgba as Uint8ClampedArray<ArrayBuffer>, field.width, field.height), 0, 0);
  self.postMessage({ id, fieldMs, shadeMs: performance.now() - started } satisfies LitReply);
}

function toPoints(xy: Float64Array): { points: Point[] } {
  const points: Point[] = new Array(xy.length / 2);
  for (let i = 0; i < points.length; i++) points[i] = [xy[2 * i], xy[2 * i + 1]];
  return { points };
}
