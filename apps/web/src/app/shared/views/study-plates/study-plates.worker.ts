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
 *
 * Where the last anti-aliased surface was slow (over COARSE_WORTH_MS), a new study is shown first from
 * one sample a pixel (about two fifths of the work) and the anti-aliased surface follows once that frame
 * is out, unless a newer study has come by then.
 */
type Surface = Extract<PlateRequest, { kind: 'surface' }>;
/**
 * When the last anti-aliased surface took longer than this (ms), the next study shows one sample a pixel
 * first: for a plate that takes several frames (a large plate on a dense screen). At 20 ms it served the
 * studio's own plate (13–22 ms alone, up to ~50 ms while the compute worker shares the two cores) and
 * cost more than it showed: in the studio bench, taken in turns, with it off the edit showed as soon
 * (p50 103–106 ms off, 104–112 ms on), and without the extra pass and the frame the refinement waits
 * for the last view came sooner (p95 139–190 ms off, 156–249 ms on) with no long task (1–2 a run on).
 */
const COARSE_WORTH_MS = 60;
let plate: 'flat' | 'lit' = 'flat';
let canvas: OffscreenCanvas | null = null;
/** The anti-aliased surface and the quick one: each kept so the next of its kind writes over its memory. */
let fine: HeightField | null = null;
let coarse: HeightField | null = null;
/** The surface on the plate (a light change reshades it), the request it is of, and whether it is the anti-aliased one. */
let shown: { field: HeightField; id: number; fine: boolean } | null = null;
/** The study whose anti-aliased surface is still to come after its quick one, and whether its frame is out. */
let refine: Surface | null = null;
let refineDue = false;
let lastFineMs = 0;
/** The picture's bytes, written over by each shading of the same size (fresh memory is slow to fault in). */
let picture: ImageData | null = null;
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
  // The page sends this plate no draft (platesDue): its surface would be replaced by the final one at once.
  if (surface) {
    refine = null;
    if (lastFineMs > COARSE_WORTH_MS) {
      const started = performance.now();
      shown = null; // its memory may be written over below
      coarse = surfaceOf(surface, 1, coarse);
      shown = { field: coarse, id: surface.id, fine: false };
      paint(canvas, performance.now() - started);
      refine = surface;
      refineDue = false;
      // The anti-aliased surface once this frame is out (a task started at once would hold the quick
      // picture back until it ends), unless a newer study comes first.
      afterFrame(() => {
        if (refine !== surface) return;
        refineDue = true;
        schedule();
      });
      return;
    }
    drawFine(surface, canvas);
  } else if (refine && refineDue && !relit) {
    const study = refine;
    refine = null;
    drawFine(study, canvas);
  } else if (relit && shown) {
    paint(canvas, 0);
    if (refine && refineDue) afterFrame(schedule);
  }
}

function drawFine(study: Surface, lit: OffscreenCanvas): void {
  const started = performance.now();
  shown = null; // its memory may be written over below
  fine = surfaceOf(study, 2, fine);
  lastFineMs = performance.now() - started;
  shown = { field: fine, id: study.id, fine: true };
  paint(lit, lastFineMs);
}

function surfaceOf(s: Surface, supersample: number, reuse: HeightField | null): HeightField {
  return computeHeightField({ lines: s.lines.map(toPoints), depth: s.depth, vAngle: s.vAngle, window: s.window, width: s.widthPx, height: s.heightPx, supersample, reuse });
}

/** Shades the surface shown under the current light and puts it on the plate. */
function paint(lit: OffscreenCanvas, fieldMs: number): void {
  if (!shown) return;
  const { field, id } = shown;
  const started = performance.now();
  if (picture?.width !== field.width || picture.height !== field.height) picture = pictureOf(field.width, field.height, picture);
  const rgba = shadeHeightField(field, light, tint, picture.data);
  if (rgba !== picture.data) picture = new ImageData(rgba as Uint8ClampedArray<ArrayBuffer>, field.width, field.height);
  if (lit.width !== field.width || lit.height !== field.height) [lit.width, lit.height] = [field.width, field.height];
  lit.getContext('2d')?.putImageData(picture, 0, 0);
  reply({ id, plate: 'lit', fine: shown.fine, fieldMs, paintMs: performance.now() - started });
}

/** A picture of w × h over the last one's memory when it has room (the plate's height changes a little from study to study). */
function pictureOf(w: number, h: number, last: ImageData | null): ImageData {
  const bytes = w * h * 4;
  const buffer = last && last.data.buffer.byteLength >= bytes ? last.data.buffer : new ArrayBuffer(4 * Math.ceil(w * h * 1.125));
  return new ImageData(new Uint8ClampedArray(buffer as ArrayBuffer, 0, bytes), w, h);
}

/**
 * Tells the page once the picture is out: a worker's canvas sends its frame when the worker's task
 * ends, so the reply waits for the next animation frame (the page's "drawn" then means on screen).
 */
function reply(message: PlateReply): void {
  afterFrame(() => self.postMessage(message));
}

/** Frames may stop (a hidden page): no reply or refinement waits longer than this for one (ms). */
const FRAME_WAIT_MS = 100;

/** Runs `then` once, at the worker's next animation frame (OffscreenCanvas workers have one) or after FRAME_WAIT_MS, whichever is first. */
function afterFrame(then: () => void): void {
  if (typeof self.requestAnimationFrame !== 'function') {
    setTimeout(then, 0);
    return;
  }
  let done = false;
  const once = () => {
    if (done) return;
    done = true;
    then();
  };
  self.requestAnimationFrame(once);
  setTimeout(once, FRAME_WAIT_MS);
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
  // A stroke per line: one path of every line, stroked at once, took 4× as long in Chromium's software
  // canvas here (26 against 7 ms for the studio's plate, its outline being filled as one shape).
  // The ink is opaque (a theme colour without alpha): where separate strokes cross, a translucent ink
  // would darken the crossing, which one path did not.
  for (const xy of s.lines) {
    ctx.beginPath();
    for (let i = 0; i < xy.length; i += 2) {
      const px = (xy[i] - s.window.x0) * sx;
      const py = (s.window.y1 - xy[i + 1]) * sy;
      if (i === 0) ctx.moveTo(px, py);
      else ctx.lineTo(px, py);
    }
    ctx.stroke();
  }
  reply({ id: s.id, plate: 'flat', fine: true, fieldMs: 0, paintMs: performance.now() - started });
}

function toPoints(xy: Float64Array): { points: Point[] } {
  const points: Point[] = new Array(xy.length / 2);
  for (let i = 0; i < points.length; i++) points[i] = [xy[2 * i], xy[2 * i + 1]];
  return { points };
}
