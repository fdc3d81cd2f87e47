import type { Design } from '@barwright/contracts';
import { computeLineStudyXY, computeProfile, planCut, profileSamples, toMm, type ArrayAllocator, type Companion, type CutPlan, type LineStudyXY, type Profile } from '@barwright/engine';
import { profileDrawing, type ProfileDrawing, type ProfileMode } from '../../../shared/views/profile-drawing';
import type { ProfileData, StudyData } from '../../../shared/views/view-data';
import { placementViews, type PlacementViews } from './placement-views';

export type { ProfileData, StudyData };

/** How fine to compute: a quick preview (about 200 samples a period) or the engine's own default step. */
export type ComputeStage = 'preview' | 'full';

/** Samples per period of the preview: a few milliseconds for a typical bar, visually the same curve. */
export const PREVIEW_SAMPLES_PER_PERIOD = 200;

/** Everything the live views draw for one state of the design. */
export interface DesignViews {
  stage: ComputeStage;
  profile: ProfileData;
  study: StudyData;
  /** Only from the full computation (the preview's step is too coarse for depths and warnings). */
  plan: CutPlan | null;
  /** The companion bar asked for (same x as `profile`), or null. */
  companion: { kind: Companion; profile: ProfileData } | null;
  /** The cutter off the centre line or on a rocking arc: the nominal path (before) and the figures, or null. */
  placement: PlacementViews | null;
  /**
   * The bar view's drawing in the mode it shows, made where the views are computed (the worker) so the
   * page only binds its strings: thinning 72 000 samples and writing thousands of SVG points is tens of
   * milliseconds a redraw. Drawn as the bar view would draw this profile with its companion. One mode
   * only: the whole bar's thinning reads every sample of four paths, the costliest part of the drawing
   * (~4 ms an edit in Chromium's worker here), for a mode the page does not show; the bar view draws a
   * mode it was not sent itself, once, when it is switched to.
   */
  drawings: ProfileDrawings;
  /** Time the engine took, ms. */
  ms: number;
}

/** The bar view's drawing in one mode, and the companion it shows (null: the bar alone). */
export interface ProfileDrawings {
  companion: Companion | null;
  mode: ProfileMode;
  drawing: ProfileDrawing;
}

/** What the bar view marks that only a full computation gives: its warnings and the plan's depth (a preview borrows the last full one's). */
export interface DrawingContext {
  warnings: ProfileData['warnings'];
  depth: number | null;
}

/** The line study of one stage, sent ahead of the rest of the views (the plates need nothing else). */
export interface StudyLead {
  stage: ComputeStage;
  study: StudyData;
  /** The period on the bar, mm (the study's windows are in periods). */
  period: number;
}

/** The line study of a stage's views with what the plates need beside it. */
export function studyLeadOf({ stage, study, profile }: Pick<DesignViews, 'stage' | 'study'> & { profile: { period: number } }): StudyLead {
  return { stage, study, period: profile.period };
}

/**
 * Runs the engine on a valid design. Pure apart from reading the clock and calling `onStudy` with the
 * line study as soon as it is known, before the bar's drawings and the plan (about half the time).
 * `allocate`: where the profiles' arrays come from (the worker's ArrayPool; new arrays by default).
 */
export function computeDesignViews(
  design: Design,
  stage: ComputeStage,
  companion?: Companion,
  context?: DrawingContext,
  onStudy?: (lead: StudyLead) => void,
  allocate?: ArrayAllocator,
  mode: ProfileMode = 'detail',
): DesignViews {
  const started = performance.now();
  const step = stage === 'preview' ? previewStep(design) : undefined;
  const profile = computeProfile(design, { ...(step === undefined ? {} : { step }), allocate });
  const mm = toMm(design);
  const study = { ...studyData(computeLineStudyXY(design, profile)), depth: mm.study.depth, vAngle: mm.study.vAngle };
  onStudy?.(studyLeadOf({ stage, study, profile }));
  const plan = stage === 'full' ? planCut(design, profile) : null;
  const sizes = { cutterRadius: mm.cutter.diameter / 2, followerRadius: mm.follower.radius, barLength: mm.bar.length };
  const other = companion ? { kind: companion, profile: { ...profileData(computeProfile(design, { ...(step === undefined ? {} : { step }), companion, allocate })), ...sizes } } : null;
  const shown = { ...profileData(profile), ...sizes };
  const placement = placementViews(design, profile);
  const marks: DrawingContext = plan ? { warnings: shown.warnings, depth: plan.depth } : (context ?? { warnings: [], depth: null });
  const drawings = profileDrawings(shown, other, placement, marks, mode);
  return {
    ...{ stage, profile: shown, study, plan },
    ...{ companion: other, placement, drawings, ms: performance.now() - started },
  };
}

/** The bar view in `mode`, drawn as BarProfile would (its `drawing`): the opposite blank above, a companion alone, or the bar with its before and depth. */
function profileDrawings(p: ProfileData, other: DesignViews['companion'], placement: PlacementViews | null, marks: DrawingContext, mode: ProfileMode): ProfileDrawings {
  const draw = (): ProfileDrawing => {
    if (other?.kind === 'opposite') return profileDrawing(p, mode, marks.warnings, { upper: other.profile.bar });
    if (other) return profileDrawing(other.profile, mode, other.profile.warnings);
    return profileDrawing(p, mode, marks.warnings, { nominal: placement?.nominal ?? null, depth: marks.depth });
  };
  return { companion: other?.kind ?? null, mode, drawing: draw() };
}

/** The preview's step (mm): the period on the bar over PREVIEW_SAMPLES_PER_PERIOD, in the file's units converted to mm. */
export function previewStep(design: Design): number {
  const perMm = design.units === 'in' ? 25.4 : 1;
  const lobes = Math.max(1, ...design.rosette.layers.map((l) => l.lobes));
  return (design.motion.travelPerRev * perMm) / lobes / PREVIEW_SAMPLES_PER_PERIOD;
}

/**
 * The profile's paths as typed arrays: the engine's own when it kept them (no Point array is built, and
 * no copy: the worker hands them over to the page and keeps nothing of the profile; four fresh 0.6 MB
 * copies an edit cost ~10 ms in Chromium's worker here, most of it faulting new pages in); from the
 * Point arrays otherwise.
 */
function profileData(p: Profile): Omit<ProfileData, 'cutterRadius' | 'followerRadius' | 'barLength'> {
  const rest = { period: p.period, step: p.step, minRadiusOfCurvature: p.minRadiusOfCurvature, crest: p.crest, warnings: p.warnings };
  const typed = profileSamples(p);
  if (typed) return { ...rest, x: typed.x, cutter: typed.cutter, bar: typed.bar, follower: typed.follower };
  const n = p.barEdge.length;
  const x = new Float64Array(n);
  const cutter = new Float64Array(n);
  const bar = new Float64Array(n);
  const follower = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    x[i] = p.barEdge[i][0];
    bar[i] = p.barEdge[i][1];
    cutter[i] = p.cutterPath[i][1];
    follower[i] = p.followerPath[i][1];
  }
  return { ...rest, x, cutter, bar, follower };
}

/** The study's lines as the views take them: the engine's typed x, y pairs as they are. */
export function studyData(s: LineStudyXY): Omit<StudyData, 'depth' | 'vAngle'> {
  return { spacing: s.spacing, width: s.width, length: s.length, lines: s.lines.map((l) => l.xy) };
}

/** The buffers of a result but its study, handed over to the page without copying (each once: arrays may share one). */
export function transferables(views: Omit<DesignViews, 'study'>): ArrayBuffer[] {
  const p = views.profile;
  const c = views.companion?.profile;
  const extra = [...(c ? [c.x, c.cutter, c.bar, c.follower] : []), ...(views.placement ? [views.placement.nominal] : [])];
  return buffersOf([p.x, p.cutter, p.bar, p.follower, ...extra]);
}

/** The buffers of a study's lines, handed over with its lead. */
export function studyTransferables(study: StudyData): ArrayBuffer[] {
  return buffersOf(study.lines);
}

function buffersOf(arrays: Float64Array[]): ArrayBuffer[] {
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}
