/** Shared result types of the engine. All lengths are millimetres unless a name says otherwise. */
import type { CrestCurvature } from './crest-curvature';

/** A point on the bar: x along the bar from 0 to its length, y height (mm). */
export type Point = [x: number, y: number];

export type WarningCode =
  | 'valley-bridged' // the rubber cannot reach the bottom of a rosette valley
  | 'cusp-rounded' // the rubber rounds a sharp rosette crest or cusp
  | 'detail-lost-cutter' // a bar valley is narrower than the cutter can reach
  | 'detail-lost-follower' // the follower rounds a crest of the bar
  | 'follower-radius' // a follower of another radius than the cutter engraves another shape than the cutter path
  | 'pass-too-deep'
  | 'rubbing'
  | 'cutter-off-centre'
  | 'other';

/**
 * A warning with where it applies (x range on the bar, mm: the worst place) and by how much (mm). A
 * profile gives one warning per code, with how many places and the first. `at` and `amount`
 * are always mm, as every number in a result; the `message` is written in the design file's units.
 */
export interface EngineWarning {
  code: WarningCode;
  message: string;
  at?: { xFrom: number; xTo: number };
  amount?: number;
  /** How many such places: in each period when the message says "every … along the bar", else along the bar. */
  count?: number;
  /** The first such place (mm); `at` is the worst. */
  first?: { xFrom: number; xTo: number };
  /** The places (mm, at most 100), for drawing them. */
  zones?: { xFrom: number; xTo: number }[];
}

/** The result of `computeProfile`: the three paths sampled on one common x grid. */
export interface Profile {
  /**
   * Period on the bar, mm: travelPerRev / G, with G the gcd of the lobe counts of the layers that
   * move (amplitude > 0; of all layers if none moves). For one layer, travelPerRev / lobes.
   */
  period: number;
  /** Sampling interval along x, mm. */
  step: number;
  cutterPath: Point[];
  barEdge: Point[];
  followerPath: Point[];
  /** Smallest radius of curvature of the bar edge's crests (convex parts), mm: 0 at a sharp corner, Infinity when straight. */
  minRadiusOfCurvature: number;
  /** The same with where it is, whether it is a sharp corner, and the cutter path's own figure (exact geometry). */
  crest?: CrestCurvature;
  /**
   * The cutter path within one cutter radius beyond the bar's start and end (x < 0, x > length; mm):
   * the bar edge near the ends is cut by these positions too. Exports run in and out along them.
   */
  leadIn?: Point[];
  leadOut?: Point[];
  warnings: EngineWarning[];
}
