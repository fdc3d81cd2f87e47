import type { Design } from '@barwright/contracts';
import type { Point, Profile } from '../types';
import { simplifyPolyline } from './polyline-simplify';

/** The bar as the drawing exports show it, in mm, in the bar's own frame (x along, y up). */
export interface BarDrawing {
  length: number;
  /** The cut edge of the bar, x from 0 to the length. */
  edge: Point[];
  /** The cutter-centre path over the same x range. */
  cutterPath: Point[];
  /** Height of the blank's straight edge before cutting: top of the edge plus the clean-up. */
  blankEdgeY: number;
  /** Height of the drawn back of the bar. The design fixes only the cut edge, so this is a drawing band. */
  backY: number;
  /** Highest point drawn: the blank's edge or the cutter path, whichever is higher. */
  topY: number;
  /** Closed outline: the edge left to right, then the back right to left. */
  outline: Point[];
}

/** Chord tolerance when thinning the sampled paths for drawings, mm: far below any print or plot. */
export const DRAWING_TOLERANCE_MM = 0.0005;
/** Depth of bar body drawn below the deepest valley, mm. */
export const BODY_BELOW_MM = 10;

/** Builds the drawing from a design already in mm and its profile. */
export function barDrawing(designMm: Design, profile: Profile): BarDrawing {
  const length = designMm.bar.length;
  const within = (p: Point) => p[0] >= -1e-9 && p[0] <= length + 1e-9;
  const edge = simplifyPolyline(profile.barEdge.filter(within), DRAWING_TOLERANCE_MM);
  const cutterPath = simplifyPolyline(profile.cutterPath.filter(within), DRAWING_TOLERANCE_MM);
  const top = edge.reduce((m, p) => Math.max(m, p[1]), -Infinity);
  const backY = edge.reduce((m, p) => Math.min(m, p[1]), Infinity) - BODY_BELOW_MM;
  return {
    length,
    edge,
    cutterPath,
    blankEdgeY: top + designMm.plan.cleanup,
    backY,
    topY: cutterPath.reduce((m, p) => Math.max(m, p[1]), top + designMm.plan.cleanup),
    outline: [...edge, [length, backY], [0, backY]],
  };
}

/** A one-line title: `24-lobe sine rosette, A2 tool steel, annealed, bar 150 mm`. */
export function designTitle(design: Design, materialName: string): string {
  const layers = design.rosette.layers.map((l) => `${l.lobes}-lobe ${l.wave.shape}`).join(' + ');
  return `${layers} rosette, ${materialName}, bar ${design.bar.length} ${design.units}`;
}
