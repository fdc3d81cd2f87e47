import { candidateDesign, parseDesign, type Design, type SweepCandidate } from '@barwright/contracts';
import { heightSpan, planCut, peakToValley } from '../cut-plan';
import { periodProfile } from '../period-profile';
import { computeProfile, profileSamples } from '../profile';
import type { EngineWarning, Profile } from '../types';

/**
 * What the sweep keeps of one candidate: one period of the cutter path, bar edge and engraved line as
 * typed arrays (their buffers transferable between workers), and the figures the grid shows. Every
 * length in mm, times in minutes.
 */
export interface CandidateFigures {
  /** The bar's period, mm. */
  period: number;
  /** Peak-to-valley of the bar edge, mm. */
  barHeight: number;
  /** Smallest radius of curvature of the bar edge's crests, mm (Infinity: straight). */
  crestRadius: number;
  cutterRadius: number;
  /** A crest sharper than the cutter's radius. */
  crestBelowCutter: boolean;
  /** The follower or cutter loses detail; `detailLost` the largest amount, mm (0 when none). */
  detailLoss: boolean;
  detailLost: number;
  /** Cutting time of the keeper bar (A2) by the cut plan, minutes. */
  keeperMinutes: number;
}

export interface CandidateResult extends CandidateFigures {
  /** Sampling interval of the period arrays, mm. */
  step: number;
  cutter: Float64Array;
  bar: Float64Array;
  line: Float64Array;
}

export type BatchItem = { ok: true; result: CandidateResult } | { ok: false; message: string };

const DETAIL_CODES: readonly EngineWarning['code'][] = ['detail-lost-cutter', 'detail-lost-follower'];

/** The figures of a design from its profile and cut plan: the single-design results, gathered. */
export function designFigures(design: Design, profile: Profile): CandidateFigures {
  const plan = planCut(design, profile);
  const cutterRadius = (design.units === 'in' ? 25.4 : 1) * (design.cutter.diameter / 2);
  const losses = profile.warnings.filter((w) => DETAIL_CODES.includes(w.code));
  const typed = profileSamples(profile);
  return {
    period: profile.period,
    // The typed bar edge when the profile has it: the same numbers without building its Point array.
    barHeight: typed ? heightSpan(typed.bar) : peakToValley(profile.barEdge),
    crestRadius: profile.minRadiusOfCurvature,
    cutterRadius,
    crestBelowCutter: profile.minRadiusOfCurvature < cutterRadius,
    detailLoss: losses.length > 0,
    detailLost: losses.reduce((m, w) => Math.max(m, w.amount ?? 0), 0),
    keeperMinutes: plan.totalMinutes,
  };
}

export interface BatchOptions {
  /** Sampling interval along the bar (mm), as a single design's `step`; omitted: each design's default. */
  step?: number;
}

/** One candidate: its design file computed exactly as a single design is (profile, cut plan, one period). */
export function computeCandidate(candidate: SweepCandidate, options: BatchOptions = {}): CandidateResult {
  const design = candidateDesign(candidate);
  const figures = designFigures(design, computeProfile(design, { step: options.step }));
  const period = periodProfile(design, options.step);
  return { ...figures, step: period.grid.step, cutter: period.cutter, bar: period.bar, line: period.line };
}

/**
 * The sweep's batch entry point: each candidate's design file checked as a file is (a rubber larger
 * than the rosette, a bar past the complexity bounds: refused with the fields named, not computed),
 * then computed in turn; one the engine refuses comes back with its message instead of stopping the batch.
 */
export function computeBatch(candidates: readonly SweepCandidate[], options: BatchOptions = {}): BatchItem[] {
  return candidates.map((candidate): BatchItem => {
    const checked = parseDesign(candidateDesign(candidate));
    if (!checked.ok) return { ok: false, message: checked.errors.map((e) => `${e.path} ${e.message}`).join('; ') };
    try {
      return { ok: true, result: computeCandidate(candidate, options) };
    } catch (error) {
      return { ok: false, message: error instanceof Error ? error.message : String(error) };
    }
  });
}

/** The buffers of a batch's typed arrays, for postMessage's transfer list. */
export function batchTransferables(items: readonly BatchItem[]): ArrayBuffer[] {
  return items.flatMap((item) => (item.ok ? [item.result.cutter.buffer, item.result.bar.buffer, item.result.line.buffer] : [])) as ArrayBuffer[];
}
