import type { BatchItem, CandidateFigures, SurfaceLight, MetalTint, SurfaceWindow } from '@barwright/engine';
import type { SweepItem, SweepJob, SweepStudy } from './sweep-types';

/*
 * The messages between the sweep runner (page thread) and its pool workers, and the pure packing
 * both sides use. A worker answers the candidates of a run as they are done, a few at a time, with
 * the period arrays' buffers transferred (not copied).
 */

/**
 * Sampling interval of a sweep (mm). The engine's default step for a 150 mm bar is several times
 * finer and costs ~32 ms a candidate; at 0.033 mm (about 30 samples a mm: a tenth of the thinnest
 * groove, and finer than any thumbnail's pixel) a candidate takes ~2.5 ms, so 5 000 fit in well under
 * 15 s on two cores. The grid's figures are at this resolution; the studio refines the one opened.
 */
export const SWEEP_STEP_MM = 0.033;

/** Longest a worker computes before posting what it has (ms): results stream at about a frame's pace. */
export const POST_EVERY_MS = 16;

/** One answer on the wire: the page's index and the item. */
export type WireResult = { index: number } & SweepItem;

export type ThumbRequest = {
  kind: 'thumb';
  id: number;
  /** One period of the engraved line (mm above its lowest point), every `step` mm. */
  line: Float32Array;
  step: number;
  study: SweepStudy;
  window: SurfaceWindow;
  widthPx: number;
  heightPx: number;
  light: SurfaceLight;
  tint: MetalTint;
};

/** Page → pool worker. `run` numbers the runs: a worker drops whatever it holds of an older one. */
export type SweepRequest =
  | { kind: 'jobs'; run: number; jobs: SweepJob[] }
  | { kind: 'cancel'; run: number }
  | ThumbRequest
  /** The thumbnail left the page before its picture came: drop it if it has not been drawn. */
  | { kind: 'drop-thumb'; id: number };

/** Pool worker → page. `pending`: the jobs of `run` still queued in that worker (the runner refills below a mark). */
export type SweepReply =
  | { kind: 'results'; run: number; results: WireResult[]; pending: number }
  | { kind: 'thumb'; id: number; bitmap: ImageBitmap | null; ms: number };

/** An engine batch item as the wire carries it: the arrays as Float32Array, the figures as they are. */
export function packItem(index: number, item: BatchItem): WireResult {
  if (!item.ok) return { index, ok: false, message: item.message };
  const r = item.result;
  const figures: CandidateFigures = {
    period: r.period,
    barHeight: r.barHeight,
    crestRadius: r.crestRadius,
    cutterRadius: r.cutterRadius,
    crestBelowCutter: r.crestBelowCutter,
    detailLoss: r.detailLoss,
    detailLost: r.detailLost,
    keeperMinutes: r.keeperMinutes,
  };
  return { index, ok: true, figures, step: r.step, line: Float32Array.from(r.line), bar: Float32Array.from(r.bar), cutter: Float32Array.from(r.cutter) };
}

/** The buffers of packed results, for postMessage's transfer list. */
export function resultTransferables(results: readonly WireResult[]): ArrayBuffer[] {
  const buffers: ArrayBuffer[] = [];
  for (const r of results) if (r.ok) buffers.push(r.line.buffer as ArrayBuffer, r.bar.buffer as ArrayBuffer, r.cutter.buffer as ArrayBuffer);
  return buffers;
}

/** The page's item of a wire result (drops the index; the arrays are the ones transferred). */
export function unpackResult(r: WireResult): SweepItem {
  if (!r.ok) return { ok: false, message: r.message };
  return { ok: true, figures: r.figures, step: r.step, line: r.line, bar: r.bar, cutter: r.cutter };
}
