import type { CrestCurvature, EngineWarning } from '@barwright/engine';

/*
 * What the drawing views draw, as typed arrays in mm: cheap to hand from a worker to the page, and the
 * same whether the studio's live document or a published revision was computed.
 */

/** The bar profile: the three paths sampled on one x grid (mm). */
export interface ProfileData {
  period: number;
  step: number;
  x: Float64Array;
  cutter: Float64Array;
  bar: Float64Array;
  follower: Float64Array;
  minRadiusOfCurvature: number;
  /** The tightest crest, exact geometry: radius, sharp corner or not, where. */
  crest?: CrestCurvature;
  warnings: EngineWarning[];
  /** Cutter and follower radii and the bar's length the profile was computed for, mm. */
  cutterRadius: number;
  followerRadius: number;
  barLength: number;
}

/** The line study (mm): each line as interleaved x, y pairs. */
export interface StudyData {
  spacing: number;
  width: number;
  length: number;
  /** The V-groove's depth (mm) and included angle (degrees). */
  depth: number;
  vAngle: number;
  lines: Float64Array[];
}
