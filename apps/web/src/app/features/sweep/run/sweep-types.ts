import type { PhaseSchedule, SweepCandidate } from '@barwright/contracts';
import type { CandidateFigures, MetalTint } from '@barwright/engine';

/*
 * What the sweep page and its runner share. Every length in mm (the page converts an inch sweep's
 * study before handing it to a thumbnail); times in ms unless named otherwise.
 */

/** One candidate to compute, with its place in the page's list (results come back by this index). */
export interface SweepJob {
  index: number;
  candidate: SweepCandidate;
}

/**
 * One computed candidate: its figures (computed in double precision) and one period of its engraved
 * line, bar edge and cutter path sampled every `step` mm. The period arrays are Float32Array: half
 * the memory of the engine's Float64Array (5 000 candidates keep a few MB, not tens), and a float's
 * 7 digits are far below a pixel at any scale the grid or a thumbnail draws.
 */
export type SweepItem =
  | { ok: true; figures: CandidateFigures; step: number; line: Float32Array; bar: Float32Array; cutter: Float32Array }
  | { ok: false; message: string };
export type SweepItemOk = Extract<SweepItem, { ok: true }>;

export type SweepState = 'idle' | 'running' | 'done' | 'cancelled';

export interface SweepProgress {
  state: SweepState;
  /** Candidates answered (failed ones included). */
  done: number;
  /** Of those, the ones the engine refused. */
  failed: number;
  total: number;
  /** Time left estimated from the throughput so far; null before there is enough to tell, and when not running. */
  msLeft: number | null;
}

export const IDLE_PROGRESS: SweepProgress = { state: 'idle', done: 0, failed: 0, total: 0, msLeft: null };

/** The line-study settings a thumbnail draws with (mm, degrees). */
export interface SweepStudy {
  lineSpacing: number;
  lines: number;
  schedule: PhaseSchedule;
  vAngle: number;
  depth: number;
}

/** The light of a thumbnail (degrees) and its metal. */
export interface SweepLight {
  azimuth: number;
  elevation: number;
  tint?: MetalTint;
}
