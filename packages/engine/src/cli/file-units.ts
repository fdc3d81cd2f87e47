import { MM_PER_INCH, type Units } from '@barwright/contracts';
import { crestText, type CrestCurvature } from '../crest-curvature';
import type { CutPlan } from '../cut-plan';
import type { EngineWarning, Point, Profile } from '../types';

/** Printed decimals for lengths: 10 nm in mm, 0.000001 in in inches (finer than any machine). */
const DECIMALS: Readonly<Record<Units, number>> = { mm: 5, in: 6 };

/** Converts results in mm to the design file's units, rounded for printing. */
export interface FileUnits {
  units: Units;
  length(mm: number): number;
  points(points: readonly Point[]): Point[];
  warnings(warnings: readonly EngineWarning[]): EngineWarning[];
}

export function fileUnits(units: Units): FileUnits {
  const scale = units === 'in' ? 1 / MM_PER_INCH : 1;
  const factor = 10 ** DECIMALS[units];
  const length = (mm: number) => (Number.isFinite(mm) ? Math.round(mm * scale * factor) / factor + 0 : mm);
  return {
    units,
    length,
    points: (points) => points.map(([x, y]) => [length(x), length(y)]),
    warnings: (warnings) =>
      warnings.map((w) => ({
        ...w,
        ...(w.at ? { at: { xFrom: length(w.at.xFrom), xTo: length(w.at.xTo) } } : {}),
        ...(w.amount !== undefined ? { amount: length(w.amount) } : {}),
        ...(w.first ? { first: { xFrom: length(w.first.xFrom), xTo: length(w.first.xTo) } } : {}),
        ...(w.zones ? { zones: w.zones.map((z) => ({ xFrom: length(z.xFrom), xTo: length(z.xTo) })) } : {}),
      })),
  };
}

/**
 * The `profile` command's output. `minRadiusOfCurvature` is null when the edge has no crest (a straight bar)
 * and 0 at a sharp corner; `crest` says which, where, and the cutter path's own figure, in words too.
 */
export function profileInFileUnits(profile: Profile, u: FileUnits) {
  return {
    units: u.units,
    period: u.length(profile.period),
    cutterPath: u.points(profile.cutterPath),
    barEdge: u.points(profile.barEdge),
    followerPath: u.points(profile.followerPath),
    minRadiusOfCurvature: Number.isFinite(profile.minRadiusOfCurvature) ? u.length(profile.minRadiusOfCurvature) : null,
    ...(profile.crest ? { crest: crestInFileUnits(profile.crest, u) } : {}),
    warnings: u.warnings(profile.warnings),
  };
}

/** The `plan` command's output: lengths and feeds in the file's units, rpm whole, minutes to 0.01. */
export function planInFileUnits(plan: CutPlan, u: FileUnits) {
  const { heatTreatment, ...rest } = plan;
  return {
    units: u.units,
    ...rest,
    depth: u.length(plan.depth),
    minutesPerPass: round(plan.minutesPerPass, 2),
    totalMinutes: round(plan.totalMinutes, 2),
    rpm: Math.round(plan.rpm),
    feedPerMinute: u.length(plan.feedPerMinute),
    chipLoad: u.length(plan.chipLoad),
    stepOver: u.length(plan.stepOver),
    warnings: u.warnings(plan.warnings),
    ...(heatTreatment ? { heatTreatment } : {}),
  };
}

function crestInFileUnits(crest: CrestCurvature, u: FileUnits) {
  const finite = (mm: number) => (Number.isFinite(mm) ? u.length(mm) : null);
  return {
    radius: finite(crest.radius),
    corner: crest.corner,
    x: crest.x === null ? null : u.length(crest.x),
    pathRadius: finite(crest.pathRadius),
    text: crestText(crest, u.units),
  };
}

function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}
