import * as z from 'zod';
import { DESIGN_FORMAT, designSchema, EXAMPLE_DESIGN, MM_PER_INCH, unitsSchema, type Design, type PhaseSchedule, type Units } from './design';
import { rackShopBody, rackTagsSchema, RACK_LIMITS, rosetteInUnits, type RosetteObject, type ShopCutter, type ShopFollower, type ShopRubber, type ShopTravel } from './rack';

/**
 * The sweep: every bar the chosen rosettes × rubbers × travel settings × cutters can cut, with one
 * follower, one bar length and the line-study settings. A saved sweep keeps its choices and its
 * shortlist, never its results (they are recomputed, deterministically).
 *   GET    /api/rack/sweeps        → SweepSummary[] (newest first)
 *   POST   /api/rack/sweeps        SweepBody → 201 SavedSweep
 *   GET    /api/rack/sweeps/:id    → SavedSweep
 *   PUT    /api/rack/sweeps/:id    SweepBody → SavedSweep
 *   DELETE /api/rack/sweeps/:id    → 204
 */
export const SWEEP_MAX_CANDIDATES = 5000;
export const SWEEP_LIMITS = { nameMax: 80, saved: 100, schedules: 8, shortlist: 200, picked: RACK_LIMITS.rosettes } as const;

const finite = z.number({ error: 'must be a number' }).finite('must be a finite number');
const shopSchema = rackShopBody().shape;
const study = designSchema.shape.study.shape;

export const sweepRosettesSchema = z.discriminatedUnion(
  'by',
  [
    z.strictObject({ by: z.literal('all') }),
    z.strictObject({ by: z.literal('tags'), tags: rackTagsSchema.refine((t) => t.length > 0, 'needs at least 1 tag') }),
    z.strictObject({ by: z.literal('picked'), ids: z
        .array(z.uuid('must be rack rosette ids'))
        .min(1, 'needs at least 1 rosette')
        .max(SWEEP_LIMITS.picked, `takes at most ${SWEEP_LIMITS.picked} rosettes`)
        .refine((ids) => new Set(ids.map((id) => id.toLowerCase())).size === ids.length, 'must not repeat a rosette') }),
  ],
  { error: 'must choose rosettes by "all", "tags" or "picked"' },
);
export type SweepRosettes = z.infer<typeof sweepRosettesSchema>;

export const sweepChoicesSchema = z.strictObject({
  /** The units of every length below. */
  units: unitsSchema,
  rosettes: sweepRosettesSchema,
  rubbers: shopSchema.rubbers.min(1, 'needs at least 1'),
  travels: shopSchema.travels.min(1, 'needs at least 1'),
  cutters: shopSchema.cutters.min(1, 'needs at least 1'),
  follower: shopSchema.followers.element,
  barLength: finite.positive('must be greater than 0'),
  study: z.strictObject({
    lineSpacing: study.lineSpacing,
    lines: study.lines,
    /** One or more phase schedules: each candidate's line study is drawn with each. */
    schedules: z.array(study.schedule).min(1, 'needs at least 1 schedule').max(SWEEP_LIMITS.schedules, `takes at most ${SWEEP_LIMITS.schedules} schedules`),
    vAngle: study.vAngle,
    depth: study.depth,
  }),
});
export type SweepChoices = z.infer<typeof sweepChoicesSchema>;

/** One candidate of a sweep, by the indices of its choices and the rack rosette's id. */
export const candidateKeySchema = z.strictObject({
  rosetteId: z.uuid('must be a rack rosette id'),
  rubber: finite.int('must be a whole number').min(0, 'must not be negative'),
  travel: finite.int('must be a whole number').min(0, 'must not be negative'),
  cutter: finite.int('must be a whole number').min(0, 'must not be negative'),
});
export type CandidateKey = z.infer<typeof candidateKeySchema>;

export const sweepBody = z
  .strictObject({
    name: z.string({ error: 'is required' }).trim().min(1, 'is required').max(SWEEP_LIMITS.nameMax, `must be at most ${SWEEP_LIMITS.nameMax} characters`),
    choices: sweepChoicesSchema,
    shortlist: z.array(candidateKeySchema).max(SWEEP_LIMITS.shortlist, `takes at most ${SWEEP_LIMITS.shortlist} candidates`).default([]),
  })
  .superRefine((body, ctx) => {
    const { rubbers, travels, cutters } = body.choices;
    body.shortlist.forEach((key, i) => {
      for (const [field, count] of [['rubber', rubbers.length], ['travel', travels.length], ['cutter', cutters.length]] as const) {
        if (key[field] >= count) ctx.addIssue({ code: 'custom', path: ['shortlist', i, field], message: `must be below ${count} (the number of ${field}s chosen)` });
      }
    });
    const bound = sweepCountProblem(body.choices, body.choices.rosettes.by === 'picked' ? body.choices.rosettes.ids.length : 1);
    if (bound) ctx.addIssue({ code: 'custom', path: ['choices'], message: bound });
  });
export type SweepBody = z.input<typeof sweepBody>;

export interface SweepSummary {
  id: string;
  name: string;
  candidates: number;
  shortlisted: number;
  updatedAt: string;
}
export interface SavedSweep {
  id: string;
  name: string;
  choices: SweepChoices;
  shortlist: CandidateKey[];
  createdAt: string;
  updatedAt: string;
}

/** How many bars the choices make with `rosettes` rosettes. */
export function sweepCount(choices: Pick<SweepChoices, 'rubbers' | 'travels' | 'cutters'>, rosettes: number): number {
  return rosettes * choices.rubbers.length * choices.travels.length * choices.cutters.length;
}

/** The count as a sentence: "36 rosettes × 2 rubbers × 3 travels × 1 cutter = 216 bars". */
export function sweepCountText(choices: Pick<SweepChoices, 'rubbers' | 'travels' | 'cutters'>, rosettes: number): string {
  const part = (n: number, one: string) => `${n} ${n === 1 ? one : `${one}s`}`;
  const total = sweepCount(choices, rosettes);
  return `${part(rosettes, 'rosette')} × ${part(choices.rubbers.length, 'rubber')} × ${part(choices.travels.length, 'travel')} × ${part(choices.cutters.length, 'cutter')} = ${part(total, 'bar')}`;
}

/** Undefined when the sweep is within SWEEP_MAX_CANDIDATES, else the message saying how to narrow it. */
export function sweepCountProblem(choices: Pick<SweepChoices, 'rubbers' | 'travels' | 'cutters'>, rosettes: number): string | undefined {
  if (sweepCount(choices, rosettes) <= SWEEP_MAX_CANDIDATES) return undefined;
  return `${sweepCountText(choices, rosettes)}: a sweep takes at most ${SWEEP_MAX_CANDIDATES.toLocaleString('en-GB').replace(',', ' ')}; narrow it by choosing rosettes by tag or by hand, or fewer rubbers, travel settings or cutters`;
}

/** Everything one candidate needs, lengths in `units` (the rosette in its own). */
export interface SweepCandidate {
  units: Units;
  rosette: { name: string; units: Units; rosette: RosetteObject };
  rubber: ShopRubber;
  travel: ShopTravel;
  cutter: ShopCutter;
  follower: ShopFollower;
  barLength: number;
  study: { lineSpacing: number; lines: number; schedule: PhaseSchedule; vAngle: number; depth: number };
}

/**
 * The bar design file of a candidate: the keeper bar (A2, the example's thickness and plan) cut with
 * the candidate's rosette, rubber, travel, cutter and follower. Pure; the same candidate gives the same file.
 */
export function candidateDesign(c: SweepCandidate): Design {
  const inUnits = (mm: number) => (c.units === 'in' ? mm / MM_PER_INCH : mm);
  const { rubber, travel, cutter } = c;
  return {
    format: DESIGN_FORMAT,
    units: c.units,
    rosette: rosetteInUnits(c.rosette.rosette, c.rosette.units, c.units),
    rubber: rubber.shape === 'round' ? { shape: 'round', radius: rubber.radius } : { shape: 'flat', width: rubber.width },
    motion: { travelPerRev: travel.travelPerRev, leverRatio: travel.leverRatio },
    cutter: { diameter: cutter.diameter, flutes: cutter.flutes },
    bar: { length: c.barLength, thickness: inUnits(EXAMPLE_DESIGN.bar.thickness), material: 'a2' },
    follower: { radius: c.follower.radius },
    study: { lineSpacing: c.study.lineSpacing, lines: c.study.lines, schedule: c.study.schedule, vAngle: c.study.vAngle, depth: c.study.depth },
    plan: { stepOver: inUnits(EXAMPLE_DESIGN.plan.stepOver), cleanup: inUnits(EXAMPLE_DESIGN.plan.cleanup), travelSpeed: inUnits(EXAMPLE_DESIGN.plan.travelSpeed) },
  };
}

/** A candidate's title on a board: rosette, rubber and travel ("Sine 24 · round 1 mm · 100 mm/rev"). */
export function candidateTitle(c: Pick<SweepCandidate, 'units' | 'rosette' | 'rubber' | 'travel'>): string {
  const len = (v: number) => `${+v.toFixed(c.units === 'in' ? 3 : 2)} ${c.units}`;
  const rubber = c.rubber.name || (c.rubber.shape === 'round' ? `round ${len(c.rubber.radius)}` : `flat ${len(c.rubber.width)}`);
  const travel = c.travel.name || `${len(c.travel.travelPerRev)}/rev${c.travel.leverRatio === 1 ? '' : ` ×${c.travel.leverRatio}`}`;
  return `${c.rosette.name} · ${rubber} · ${travel}`.slice(0, 100);
}

/** POST /api/boards/:id/designs/batch: a shortlist made bar designs on a board in one request, all or nothing → 201 { ids }. */
export const DESIGNS_BATCH_MAX = 100;
export const designsBatchBody = z.strictObject({
  designs: z
    .array(
      z.strictObject({
        title: z.string({ error: 'is required' }).trim().min(1, 'is required').max(100, 'must be at most 100 characters'),
        file: designSchema,
        /** The rack rosette the design was made from (one of the caller's), recorded as its origin. */
        rackRosetteId: z.uuid('must be a rack rosette id').optional(),
      }),
      { error: 'must be a list of designs' },
    )
    .min(1, 'needs at least 1 design')
    .max(DESIGNS_BATCH_MAX, `takes at most ${DESIGNS_BATCH_MAX} designs`),
});
export type DesignsBatchBody = z.input<typeof designsBatchBody>;

/** The rack rosettes a sweep takes, in rack order: all, those with any of the tags (any case), or the picked ones. */
export function chosenRosettes<R extends { id: string; tags: string[] }>(choices: Pick<SweepChoices, 'rosettes'>, rack: readonly R[]): R[] {
  const pick = choices.rosettes;
  if (pick.by === 'all') return [...rack];
  if (pick.by === 'picked') {
    const ids = new Set(pick.ids.map((id) => id.toLowerCase()));
    return rack.filter((r) => ids.has(r.id.toLowerCase()));
  }
  const tags = new Set(pick.tags.map((t) => t.toLowerCase()));
  return rack.filter((r) => r.tags.some((t) => tags.has(t.toLowerCase())));
}

/**
 * Every candidate of a sweep with its key, rosette by rosette, then rubber, travel and cutter (the
 * grid's order); the line study uses the first schedule. Deterministic: the same choices and rack
 * give the same list, so a saved sweep's shortlist keys find their candidates again.
 */
export function sweepCandidates(
  choices: SweepChoices,
  rack: readonly { id: string; name: string; units: Units; rosette: RosetteObject; tags: string[] }[],
): { key: CandidateKey; candidate: SweepCandidate }[] {
  const out: { key: CandidateKey; candidate: SweepCandidate }[] = [];
  const { lineSpacing, lines, schedules, vAngle, depth } = choices.study;
  const study = { lineSpacing, lines, schedule: schedules[0], vAngle, depth };
  for (const r of chosenRosettes(choices, rack)) {
    const rosette = { name: r.name, units: r.units, rosette: r.rosette };
    choices.rubbers.forEach((rubber, i) =>
      choices.travels.forEach((travel, j) =>
        choices.cutters.forEach((cutter, k) =>
          out.push({
            key: { rosetteId: r.id, rubber: i, travel: j, cutter: k },
            candidate: { units: choices.units, rosette, rubber, travel, cutter, follower: choices.follower, barLength: choices.barLength, study },
          }),
        ),
      ),
    );
  }
  return out;
}
