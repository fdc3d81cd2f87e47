import * as z from 'zod';
import { checkDesignComplexity } from './design-complexity';
import { MM_PER_INCH } from './length-units';

/**
 * The bar design file, format `barwright.design/1`.
 *
 * Every length is in the file's `units` (mm, or inch = 25.4 mm exactly). Amplitudes are
 * peak-to-valley. Angles are degrees. `phase` is a fraction of one lobe. Limits on lengths are
 * stated in millimetres and checked after conversion, so an inch file meets the same bounds.
 */

export { COMPLEXITY_LIMITS, designComplexity, type DesignComplexity } from './design-complexity';

export const DESIGN_FORMAT = 'barwright.design/1';
export { MM_PER_INCH };

export const unitsSchema = z.enum(['mm', 'in']);
export type Units = z.infer<typeof unitsSchema>;

const finite = z.number({ error: 'must be a number' }).finite('must be a finite number');
const positive = finite.positive('must be greater than 0');
const nonNegative = finite.min(0, 'must not be negative');
/** A phase, a fraction of a lobe or of the bar's period, taken modulo 1: ±1 000 000 is more turns than any shop means. */
const phaseValue = finite.min(-1e6, 'must be between -1000000 and 1000000').max(1e6, 'must be between -1000000 and 1000000');
/** A Fourier coefficient: a relative weight, so ±1 000 000 leaves room for any ratio a shop means (and no overflow). */
const coefficient = finite.min(-1e6, 'must be between -1000000 and 1000000').max(1e6, 'must be between -1000000 and 1000000');

const waveSchema = z.discriminatedUnion('shape', [
  z.strictObject({ shape: z.literal('sine') }),
  z.strictObject({ shape: z.literal('pointed') }),
  z.strictObject({ shape: z.literal('scallop') }),
  z.strictObject({ shape: z.literal('flat'), clip: finite.gt(0, 'must be greater than 0').max(1, 'must be at most 1') }),
  z.strictObject({ shape: z.literal('eccentric') }),
  z.strictObject({
    shape: z.literal('fourier'),
    terms: z
      .array(z.strictObject({ k: finite.int('must be a whole number').min(1, 'must be at least 1').max(64, 'must be at most 64'), a: coefficient, b: coefficient }))
      .min(1, 'needs at least 1 term')
      .max(32, 'takes at most 32 terms'),
  }),
  z.strictObject({
    shape: z.literal('measured'),
    points: z
      .array(z.tuple([finite.min(0, 'angle must be at least 0°').lt(360, 'angle must be below 360°'), positive]))
      .min(8, 'needs at least 8 readings')
      .max(3600, 'takes at most 3600 readings'),
    /**
     * `as-read`: the readings' own rise and fall about their middle, the layer's amplitude unused;
     * `to-amplitude` (the default, and the behaviour of files without the field): stretched to the amplitude.
     */
    scale: z.enum(['as-read', 'to-amplitude'], { error: 'must be "as-read" or "to-amplitude"' }).optional(),
  }),
]);
export type Wave = z.infer<typeof waveSchema>;
export type WaveShape = Wave['shape'];
export const WAVE_SHAPES: readonly WaveShape[] = ['sine', 'pointed', 'scallop', 'flat', 'eccentric', 'fourier', 'measured'];

const layerSchema = z.strictObject({
  lobes: finite.int('must be a whole number').min(1, 'must be at least 1').max(360, 'must be at most 360'),
  /** Peak-to-valley, a length. */
  amplitude: nonNegative,
  /** Fraction of one lobe, taken modulo 1; within ±1 000 000. */
  phase: phaseValue,
  wave: waveSchema,
});
export type RosetteLayer = z.infer<typeof layerSchema>;

const rubberSchema = z.discriminatedUnion('shape', [
  z.strictObject({ shape: z.literal('round'), radius: nonNegative }),
  z.strictObject({ shape: z.literal('flat'), width: positive }),
]);
export type Rubber = z.infer<typeof rubberSchema>;

export const MATERIALS = ['acrylic', 'brass', 'a2', 'custom'] as const;
export type MaterialId = (typeof MATERIALS)[number];

const scheduleSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('none') }),
  z.strictObject({ kind: z.literal('alternate') }),
  z.strictObject({ kind: z.literal('ramp'), steps: finite.int('must be a whole number').min(2, 'must be at least 2').max(1000, 'must be at most 1000') }),
  z.strictObject({
    kind: z.literal('sine'),
    period: positive.max(10000, 'must be at most 10000 lines'),
    depth: finite.min(0, 'must not be negative').max(1, 'must be at most 1'),
  }),
  z.strictObject({ kind: z.literal('twist'), step: finite.min(-1, 'must be at least -1').max(1, 'must be at most 1') }),
  z.strictObject({ kind: z.literal('list'), phases: z.array(phaseValue).min(1, 'needs at least 1 phase').max(1000, 'takes at most 1000 phases') }),
]);
export type PhaseSchedule = z.infer<typeof scheduleSchema>;
export type ScheduleKind = PhaseSchedule['kind'];

/** How the engraved line relates to the bar: its mirror (the default) or the same way round. */
export const STUDY_DIRECTIONS = ['mirrored', 'as-bar'] as const;
export type StudyDirection = (typeof STUDY_DIRECTIONS)[number];

const pivotSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('linear') }),
  /** `distance`: from the rocking axis to the spindle centre line, a length. */
  z.strictObject({ kind: z.literal('rocking'), distance: positive }),
]);
export type MotionPivot = z.infer<typeof pivotSchema>;

export const designSchema = z
  .strictObject({
    format: z.literal(DESIGN_FORMAT, { error: `must be "${DESIGN_FORMAT}"` }),
    units: unitsSchema,
    rosette: z.strictObject({
      baseRadius: positive,
      layers: z.array(layerSchema).min(1, 'needs at least 1 layer').max(8, 'takes at most 8 layers'),
    }),
    rubber: rubberSchema,
    motion: z.strictObject({
      /** Bar travel for one revolution of the rosette, a length. */
      travelPerRev: positive,
      /** Cutter displacement per rubber displacement. */
      leverRatio: positive.min(0.01, 'must be at least 0.01').max(10, 'must be at most 10'),
      /** How the headstock carries the motion: a straight line (the default) or an arc about a rocking axis. */
      pivot: pivotSchema.optional(),
    }),
    cutter: z.strictObject({
      diameter: positive,
      flutes: finite.int('must be a whole number').min(1, 'must be at least 1').max(8, 'must be at most 8'),
      /** Distance of the cutter's contact from the spindle centre line, along the bar, a length (default 0). */
      offset: finite.optional(),
    }),
    bar: z.strictObject({
      length: positive,
      thickness: positive,
      material: z.enum(MATERIALS, { error: `must be one of ${MATERIALS.join(', ')}` }),
    }),
    follower: z.strictObject({ radius: nonNegative }),
    study: z.strictObject({
      lineSpacing: positive,
      lines: finite.int('must be a whole number').min(1, 'must be at least 1').max(1000, 'must be at most 1000'),
      schedule: scheduleSchema,
      /** Included angle of the V-cutter, degrees. */
      vAngle: finite.gt(0, 'must be greater than 0°').lt(180, 'must be less than 180°'),
      depth: nonNegative,
      /**
       * Which way the engraved line runs against the bar: `mirrored` (the default, and what files without
       * the field mean), Y_j(x) = j·p + F(Δ_j − x), the work moving against the bar; `as-bar`,
       * Y_j(x) = j·p + F(x + Δ_j), for a machine that runs the other way.
       */
      direction: z.enum(STUDY_DIRECTIONS, { error: 'must be "mirrored" or "as-bar"' }).optional(),
    }),
    plan: z.strictObject({
      /** Depth taken in one pass, a length. */
      stepOver: positive,
      /** Extra depth below the profile's lowest point, a length. */
      cleanup: nonNegative,
      /** Feed of the slide along the bar, length per minute. */
      travelSpeed: positive,
      /** Overrides for the material preset (required for `custom`). */
      surfaceSpeed: positive.min(0.1, 'must be at least 0.1 m/min').max(2000, 'must be at most 2000 m/min').optional(),
      chipLoad: positive.optional(),
    }),
  })
  .superRefine((d, ctx) => checkDesignLimits(d, ctx));

export type Design = z.infer<typeof designSchema>;

/** Limits on lengths in millimetres; checked after conversion from the file's units. */
export const LENGTH_LIMITS_MM = {
  'rosette.baseRadius': [1, 500],
  'motion.travelPerRev': [1, 2000],
  'cutter.diameter': [0.1, 50],
  'bar.length': [1, 1000],
  'bar.thickness': [0.5, 100],
  'follower.radius': [0, 50],
  'study.lineSpacing': [0.01, 50],
  'study.depth': [0, 5],
  'plan.stepOver': [0.001, 5],
  'plan.cleanup': [0, 20],
  'plan.travelSpeed': [1, 20000],
  'plan.chipLoad': [0.0001, 2],
  'rubber.width': [0.01, 1000],
  'cutter.offset': [-50, 50],
  'motion.pivot.distance': [10, 2000],
} as const satisfies Record<string, readonly [number, number]>;

/** Limits on a layer's lengths in millimetres (the base radius's own bound), checked after conversion. */
export const LAYER_LIMITS_MM = { amplitude: 500, measuredRadius: 1000, measuredSpread: 0.001 } as const;

function checkDesignLimits(d: Omit<Design, never>, ctx: z.RefinementCtx): void {
  const toMm = d.units === 'in' ? MM_PER_INCH : 1;
  const unit = d.units;
  // Inches to four decimals, or two significant figures below 0.001 in (0.0001 mm is 0.0000039 in, not 0 in).
  const inches = (mm: number) => (mm === 0 || mm / MM_PER_INCH >= 0.001 ? +(mm / MM_PER_INCH).toFixed(4) : +(mm / MM_PER_INCH).toPrecision(2));
  const show = (mm: number) => (unit === 'in' ? `${inches(mm)} in` : `${mm} mm`);
  const read = (path: string): number => path.split('.').reduce<any>((o, k) => o?.[k], d);
  for (const [path, [lo, hi]] of Object.entries(LENGTH_LIMITS_MM)) {
    const value = read(path);
    if (value === undefined) continue; // an optional field left out
    const mm = value * toMm;
    if (mm < lo || mm > hi) {
      ctx.addIssue({ code: 'custom', path: path.split('.'), message: `must be between ${show(lo)} and ${show(hi)}` });
    }
  }
  const R0 = d.rosette.baseRadius;
  if (d.rubber.shape === 'round' && d.rubber.radius > R0) {
    ctx.addIssue({ code: 'custom', path: ['rubber', 'radius'], message: `must not be larger than the rosette's base radius (${R0} ${unit})` });
  }
  const swing = d.rosette.layers.reduce((s, l) => s + layerPeakToValley(l) / 2, 0);
  if (swing >= R0) {
    ctx.addIssue({ code: 'custom', path: ['rosette', 'layers'], message: `half the summed amplitudes must stay below the base radius (${R0} ${unit})` });
  }
  d.rosette.layers.forEach((layer, i) => {
    const wave = layer.wave;
    if (wave.shape === 'eccentric' && layer.lobes !== 1) {
      ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'lobes'], message: 'must be 1 for an eccentric layer' });
    }
    if (wave.shape === 'measured') {
      for (let j = 1; j < wave.points.length; j++) {
        if (wave.points[j][0] <= wave.points[j - 1][0]) {
          ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'wave', 'points', j, 0], message: 'angles must be strictly increasing' });
          break;
        }
      }
    }
    if (wave.shape === 'fourier' && wave.terms.every((t) => t.a === 0 && t.b === 0)) {
      ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'wave', 'terms'], message: 'needs at least one non-zero coefficient' });
    } else if (wave.shape === 'fourier' && wave.terms.every((t) => Math.abs(t.a) < 1e-9 && Math.abs(t.b) < 1e-9)) {
      ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'wave', 'terms'], message: 'needs a coefficient of at least 1e-9 in size (they are relative weights: scale them all up)' });
    }
    if (layer.amplitude * toMm > LAYER_LIMITS_MM.amplitude) {
      ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'amplitude'], message: `must be at most ${show(LAYER_LIMITS_MM.amplitude)}` });
    }
    if (wave.shape === 'measured' && wave.scale !== 'as-read' && layer.amplitude > 0) {
      const radii = wave.points.map((p) => p[1]);
      const spread = (Math.max(...radii) - Math.min(...radii)) * toMm;
      if (!(spread >= LAYER_LIMITS_MM.measuredSpread)) {
        const message = `readings must rise and fall by at least ${show(LAYER_LIMITS_MM.measuredSpread)} (a dial indicator's resolution) to be stretched to the amplitude`;
        ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'wave', 'points'], message });
      }
    }
    if (wave.shape === 'measured') {
      const j = wave.points.findIndex((p) => p[1] * toMm > LAYER_LIMITS_MM.measuredRadius);
      if (j >= 0) ctx.addIssue({ code: 'custom', path: ['rosette', 'layers', i, 'wave', 'points', j, 1], message: `radius must be at most ${show(LAYER_LIMITS_MM.measuredRadius)}` });
    }
  });
  const pivot = d.motion.pivot;
  if (pivot?.kind === 'rocking') {
    const reach = d.motion.leverRatio * swing + Math.abs(d.cutter.offset ?? 0);
    if (pivot.distance <= reach) {
      ctx.addIssue({ code: 'custom', path: ['motion', 'pivot', 'distance'], message: `must be more than the cutter's half swing plus its offset (${+reach.toPrecision(4)} ${unit})` });
    }
  }
  if (d.bar.material === 'custom' && (d.plan.surfaceSpeed === undefined || d.plan.chipLoad === undefined)) {
    ctx.addIssue({ code: 'custom', path: ['plan', 'surfaceSpeed'], message: 'a custom material needs plan.surfaceSpeed and plan.chipLoad' });
  }
  checkDesignComplexity(d, ctx);
}

/**
 * The peak-to-valley a layer adds to the radius, in the file's units: the amplitude, or for a
 * measured wave read `as-read` the readings' own rise (largest minus smallest radius).
 */
export function layerPeakToValley(layer: RosetteLayer): number {
  const wave = layer.wave;
  if (wave.shape !== 'measured' || wave.scale !== 'as-read') return layer.amplitude;
  let lo = Infinity;
  let hi = -Infinity;
  for (const [, r] of wave.points) {
    if (r < lo) lo = r;
    if (r > hi) hi = r;
  }
  return hi - lo;
}

/** A field error: a dotted path (`rosette.layers[0].lobes`) and a message naming the limit. */
export interface FieldError {
  path: string;
  message: string;
}

/** Turns a zod issue path into the dotted form used in messages and forms. */
export function formatPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((s, key) => (typeof key === 'number' ? `${s}[${key}]` : s ? `${s}.${String(key)}` : String(key)), '');
}

export function toFieldErrors(error: z.ZodError): FieldError[] {
  return error.issues.flatMap((issue) =>
    issue.code === 'unrecognized_keys'
      ? issue.keys.map((key) => ({ path: formatPath([...issue.path, key]), message: 'is not a known field' }))
      : [{ path: formatPath(issue.path), message: issue.message }],
  );
}

export type DesignParseResult = { ok: true; design: Design } | { ok: false; errors: FieldError[] };

/** Validates an unknown value (parsed JSON) as a design file. Never throws. */
export function parseDesign(value: unknown): DesignParseResult {
  const result = designSchema.safeParse(value);
  return result.success ? { ok: true, design: result.data } : { ok: false, errors: toFieldErrors(result.error) };
}

/** The example from the format's description: a 24-lobe sine rosette and an A2 keeper bar. */
export const EXAMPLE_DESIGN: Design = {
  format: DESIGN_FORMAT,
  units: 'mm',
  rosette: { baseRadius: 50, layers: [{ lobes: 24, amplitude: 1.5, phase: 0, wave: { shape: 'sine' } }] },
  rubber: { shape: 'round', radius: 1.0 },
  motion: { travelPerRev: 100, leverRatio: 1 },
  cutter: { diameter: 4.7625, flutes: 2 },
  bar: { length: 150, thickness: 7.9375, material: 'a2' },
  follower: { radius: 2.38125 },
  study: { lineSpacing: 0.45, lines: 40, schedule: { kind: 'alternate' }, vAngle: 120, depth: 0.1 },
  plan: { stepOver: 0.0762, cleanup: 0.25, travelSpeed: 100 },
};
