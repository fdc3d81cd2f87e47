import { MM_PER_INCH, type Design, type MaterialId } from '@barwright/contracts';
import { cutPlanWarnings } from './cut-plan-warnings';
import { placementText } from './cutter-placement';
import { SAFETY_CAUTIONS, setUpReminders } from './cut-plan-notes';
import { formatLength } from './length-format';
import { assertFinite, assertFiniteWarnings } from './finite-output';
import { cuttingFigures } from './materials';
import { computeProfile, profileSamples } from './profile';
import { feedPerMinute, spindleRpm } from './spindle-speed';
import type { EngineWarning, Point, Profile } from './types';
import { toMm } from './units';

/** The cut plan for one bar in one material. Lengths in mm, feeds in mm/min, times in minutes. */
export interface CutPlan {
  material: MaterialId;
  /** Surface speed used, m/min. */
  surfaceSpeed: number;
  /** Total depth into the bar edge: the bar edge's peak-to-valley plus the clean-up, mm. */
  depth: number;
  passes: number;
  minutesPerPass: number;
  totalMinutes: number;
  rpm: number;
  /** Feed that gives the chip load at this rpm (rpm × flutes × chip load), mm/min. */
  feedPerMinute: number;
  /** Chip load per tooth, mm. */
  chipLoad: number;
  /** Depth taken per pass, mm. */
  stepOver: number;
  warnings: EngineWarning[];
  reminders: string[];
  cautions: string[];
  heatTreatment?: string[];
}

export interface CutPlanOptions {
  /** Speed of the return stroke with the cutter withdrawn, mm/min; default twice the travel speed. */
  returnSpeed?: number;
}

/** The cutter centre clears each end of the bar by this much beyond its radius, mm. */
export const LEAD_CLEARANCE_MM = 1;

/**
 * Our assumption for the time estimate: the slide is wound back, cutter clear, at about twice the
 * cutting travel. A CNC returns faster (the G-code return is a rapid); pass `returnSpeed` to model it.
 */
export const RETURN_SPEED_FACTOR = 2;

/** Plans the cut of a design's bar (any units in, mm out). Computes the profile unless given (in mm). */
export function planCut(design: Design, profile?: Profile, options: CutPlanOptions = {}): CutPlan {
  const mm = toMm(design);
  const path = profile ?? computeProfile(design);
  const perUnit = design.units === 'in' ? MM_PER_INCH : 1;
  const chipOverride = design.plan.chipLoad === undefined ? undefined : design.plan.chipLoad * perUnit;
  const figures = cuttingFigures(design, mm.cutter.diameter, chipOverride);
  const { stepOver, travelSpeed } = mm.plan;

  // The typed arrays behind a computed profile when there are any (the same figures, no Point arrays built).
  const typed = profileSamples(path);
  const depth = (typed ? heightSpan(typed.bar) : peakToValley(path.barEdge)) + mm.plan.cleanup;
  const passes = Math.max(1, Math.ceil(depth / stepOver - 1e-9));
  const passLength = mm.bar.length + mm.cutter.diameter + 2 * LEAD_CLEARANCE_MM;
  const returnSpeed = options.returnSpeed ?? RETURN_SPEED_FACTOR * travelSpeed;
  const minutesPerPass = passLength / travelSpeed + passLength / returnSpeed;

  const rpm = spindleRpm(figures.surfaceSpeed, mm.cutter.diameter);
  const show = (v: number) => formatLength(v, design.units);
  const placement = placementText(mm, typed ? heightSpan(typed.cutter) : peakToValley(path.cutterPath), design.units);
  const warnings = cutPlanWarnings({
    preset: figures.preset,
    stepOver,
    passes,
    rpm,
    flutes: mm.cutter.flutes,
    chipLoad: figures.chipLoad,
    travelSpeed,
    maxSlope: typed ? steepestTypedSlope(typed.x, typed.cutter) : steepestSlope(path.cutterPath),
    leverRatio: mm.motion.leverRatio,
    cutterOffset: mm.cutter.offset,
    placement,
    cutterDiameter: mm.cutter.diameter,
    barThickness: mm.bar.thickness,
    show,
  });
  const reminders = setUpReminders({
    preset: figures.preset,
    stepOver: show(stepOver),
    thickness: show(mm.bar.thickness),
    topOfEdge: show(mm.plan.cleanup),
    placement,
  });
  const plan: CutPlan = {
    material: design.bar.material,
    surfaceSpeed: figures.surfaceSpeed,
    depth,
    passes,
    minutesPerPass,
    totalMinutes: passes * minutesPerPass,
    rpm,
    feedPerMinute: feedPerMinute(rpm, mm.cutter.flutes, figures.chipLoad),
    chipLoad: figures.chipLoad,
    stepOver,
    warnings,
    reminders,
    cautions: [...SAFETY_CAUTIONS],
    ...(figures.preset.heatTreatment ? { heatTreatment: [...figures.preset.heatTreatment] } : {}),
  };
  const { surfaceSpeed, totalMinutes, feedPerMinute: feed, chipLoad } = plan;
  const figuresOut = { surfaceSpeed, depth, passes, minutesPerPass, totalMinutes, rpm, feedPerMinute: feed, chipLoad, stepOver };
  for (const [what, value] of Object.entries(figuresOut)) assertFinite(`cut plan's ${what}`, [value]);
  assertFiniteWarnings(warnings);
  return plan;
}

/** Peak-to-valley of a path's heights, mm (0 for an empty path). */
export function peakToValley(points: readonly Point[]): number {
  if (points.length === 0) return 0;
  let lo = Infinity;
  let hi = -Infinity;
  for (const [, y] of points) {
    if (y < lo) lo = y;
    if (y > hi) hi = y;
  }
  return hi - lo;
}

/** Steepest |dy/dx| between neighbouring points of a path. */
export function steepestSlope(points: readonly Point[]): number {
  let steepest = 0;
  for (let i = 1; i < points.length; i++) {
    const dx = points[i][0] - points[i - 1][0];
    if (dx > 0) steepest = Math.max(steepest, Math.abs(points[i][1] - points[i - 1][1]) / dx);
  }
  return steepest;
}

/** Peak-to-valley of typed heights, mm (0 when empty): `peakToValley` without the Point arrays. */
export function heightSpan(y: Float64Array): number {
  if (y.length === 0) return 0;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < y.length; i++) {
    if (y[i] < lo) lo = y[i];
    if (y[i] > hi) hi = y[i];
  }
  return hi - lo;
}

function steepestTypedSlope(x: Float64Array, y: Float64Array): number {
  let steepest = 0;
  for (let i = 1; i < y.length; i++) {
    const dx = x[i] - x[i - 1];
    if (dx > 0) steepest = Math.max(steepest, Math.abs(y[i] - y[i - 1]) / dx);
  }
  return steepest;
}
