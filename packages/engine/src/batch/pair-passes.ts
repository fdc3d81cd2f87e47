import type { Units } from '@barwright/contracts';
import { heightSpan } from '../cut-plan';
import { formatLength } from '../length-format';

/**
 * The cut plan's word on "shown and opposite": the one cutter path cuts both blanks, the one below
 * it to the lower envelope, the one above to the upper. Each blank's depth is its own edge's
 * peak-to-valley plus the clean-up, in passes of the step-over as the cut plan counts them; when
 * both counts agree both blanks are finished by the same passes, each fed toward the cutter by a
 * step-over a pass (the lower one up, the upper one down).
 */
export interface PairPasses {
  /** Depth into each blank's edge, mm. */
  shownDepth: number;
  oppositeDepth: number;
  shownPasses: number;
  oppositePasses: number;
  samePasses: boolean;
  /**
   * Finished, the lowest point of the opposite edge above the highest crest of the shown one (mm);
   * negative when the two edges interlock.
   */
  clearance: number;
  /** The sentence for the cut plan. */
  text: string;
}

/** Passes for a depth, as the cut plan counts them: ⌈depth / step-over⌉, at least one. */
export function passesFor(depth: number, stepOver: number): number {
  return Math.max(1, Math.ceil(depth / stepOver - 1e-9));
}

/**
 * Both blanks of one cut in passes. `shownEdge` and `oppositeEdge` are the two edges on one x grid in
 * one frame (mm, as the profile and its `opposite` companion give them); `cleanup` and `stepOver` mm.
 */
export function pairPasses(args: { shownEdge: Float64Array; oppositeEdge: Float64Array; cleanup: number; stepOver: number; units: Units }): PairPasses {
  const { shownEdge, oppositeEdge, cleanup, stepOver, units } = args;
  const show = (mm: number) => formatLength(mm, units);
  const shownDepth = heightSpan(shownEdge) + cleanup;
  const oppositeDepth = heightSpan(oppositeEdge) + cleanup;
  const shownPasses = passesFor(shownDepth, stepOver);
  const oppositePasses = passesFor(oppositeDepth, stepOver);
  let top = -Infinity;
  for (const y of shownEdge) top = Math.max(top, y);
  let bottom = Infinity;
  for (const y of oppositeEdge) bottom = Math.min(bottom, y);
  const clearance = bottom - top;
  const samePasses = shownPasses === oppositePasses;
  const depths = `the shown blank ${show(shownDepth)} deep, the opposite ${show(oppositeDepth)}, at ${show(stepOver)} a pass`;
  const passes = (n: number) => `${n} ${n === 1 ? 'pass' : 'passes'}`;
  const first = samePasses
    ? `Both blanks are cut in the same ${passes(shownPasses)} (${depths}): set them on either side of the cutter, edges facing, and feed each toward it by ${show(stepOver)} a pass, the lower one up and the upper one down; the one cutter path finishes both.`
    : `Not in the same passes: the shown blank needs ${passes(shownPasses)}, the opposite ${passes(oppositePasses)} (${depths}). Cut both together for the first ${passes(Math.min(shownPasses, oppositePasses))}, then withdraw the ${shownPasses < oppositePasses ? 'shown' : 'opposite'} blank and take the last ${passes(Math.abs(shownPasses - oppositePasses))} on the other alone.`;
  const gap =
    clearance >= 0
      ? `Finished, the two edges are ${show(clearance)} apart at their nearest.`
      : `Finished, the two edges interlock by ${show(-clearance)}, so each blank needs a slide of its own and must be clamped clear of the other before the first pass.`;
  return { shownDepth, oppositeDepth, shownPasses, oppositePasses, samePasses, clearance, text: `${first} ${gap}` };
}
