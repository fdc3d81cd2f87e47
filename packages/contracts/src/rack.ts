import * as z from 'zod';
import { designSchema, EXAMPLE_DESIGN, MM_PER_INCH, unitsSchema, type Design, type Units } from './design';

/**
 * The rosette rack: the rosettes a member owns and the rest of the shop (rubbers, travel settings,
 * end mills, followers, V-cutters). Every length is in the `units` given beside it (mm, or inch =
 * 25.4 mm exactly); a body that leaves `units` out is read in the member's units.
 *   GET    /api/rack                    → Rack
 *   POST   /api/rack/rosettes           RackRosetteBody → 201 RackRosette
 *   PATCH  /api/rack/rosettes/:id       RackRosettePatch → RackRosette
 *   DELETE /api/rack/rosettes/:id       → 204
 *   PUT    /api/rack/shop               RackShopBody → RackShop
 *   GET    /api/rack/export             → RackFile (format RACK_FORMAT)
 *   POST   /api/rack/import             RackFile → Rack (replaces the whole rack; nothing stored on any error)
 */
export const RACK_FORMAT = 'barwright.rack/1';

export const RACK_LIMITS = {
  rosettes: 200,
  nameMax: 80,
  notesMax: 2000,
  tags: 12,
  tagMax: 32,
  /** Each list of the shop (rubbers, travels, cutters, followers, V-cutters). */
  shopItems: 24,
  shopNameMax: 40,
  /**
   * Measured readings in all the rack's rosettes together. A rosette may hold 8 layers of 3 600 readings;
   * without a rack-wide bound 200 of them would make an export (≈140 MB) that no import could take back.
   * 20 000 readings (a reading every degree on 55 rosettes) keep the readings under about 0.6 MB and
   * checking a rack file well under a second on a loaded 2-core server.
   */
  readings: 20_000,
} as const;

/**
 * The largest rack file POST /api/rack/import reads. Every rack within RACK_LIMITS fits: the largest,
 * 200 rosettes of 8 Fourier layers of 32 terms with long coefficients, full notes and tags, is about 3 MB.
 * No larger, because parsing JSON holds the event loop (about a second a few MB on a loaded 2-core server).
 */
export const RACK_FILE_MAX_BYTES = 4 * 1024 * 1024;

/** The measured readings a rosette holds (0 when it has no measured layer, or is not a rosette at all). */
export function rosetteReadings(rosette: unknown): number {
  const layers = (rosette as { layers?: unknown } | null)?.layers;
  if (!Array.isArray(layers)) return 0;
  return layers.reduce((n: number, layer) => {
    const points = (layer as { wave?: { points?: unknown } } | null)?.wave?.points;
    return n + (Array.isArray(points) ? points.length : 0);
  }, 0);
}

/** The message when a rack would hold more than RACK_LIMITS.readings readings, else undefined. */
export function rackReadingsProblem(total: number): string | undefined {
  if (total <= RACK_LIMITS.readings) return undefined;
  const n = (v: number) => v.toLocaleString('en-GB').replace(/,/g, ' ');
  return `a rack holds at most ${n(RACK_LIMITS.readings)} measured readings in all its rosettes (this would make ${n(total)}); thin the readings or remove a measured rosette`;
}

const finite = z.number({ error: 'must be a number' }).finite('must be a finite number');
const text = (max: number) => z.string({ error: 'must be text' }).trim().max(max, `must be at most ${max} characters`);
const name = (max: number) => text(max).min(1, 'is required');

/** Limits of the shop's lengths in millimetres, checked after conversion (the design file's own bounds where it has one). */
export const SHOP_LIMITS_MM = {
  rubberRadius: [0, 500],
  rubberWidth: [0.01, 1000],
  travelPerRev: [1, 2000],
  cutterDiameter: [0.1, 50],
  followerRadius: [0, 50],
} as const;

export const rackTagsSchema = z
  .array(name(RACK_LIMITS.tagMax), { error: 'must be a list of tags' })
  .max(RACK_LIMITS.tags, `takes at most ${RACK_LIMITS.tags} tags`)
  .refine((tags) => new Set(tags.map((t) => t.toLowerCase())).size === tags.length, 'must not repeat a tag');

/** The design file's `rosette` object, checked by the design file's own schema and limits. */
export const rosetteObjectSchema = designSchema.shape.rosette;
export type RosetteObject = Design['rosette'];

/**
 * Checks a rosette exactly as the design file does (its schema and its length limits, in `units`), by
 * checking a design that carries it; only the rosette's own errors are kept, with their paths.
 */
export function rosetteIssues(rosette: unknown, units: Units): { path: (string | number)[]; message: string }[] {
  const probe = { ...EXAMPLE_DESIGN, units, rubber: { shape: 'round', radius: 0 }, follower: { radius: 0 }, rosette };
  const result = designSchema.safeParse(probe);
  if (result.success) return [];
  return result.error.issues
    .filter((issue) => issue.path[0] === 'rosette')
    .flatMap((issue) => {
      const path = issue.path.slice(1) as (string | number)[];
      return issue.code === 'unrecognized_keys' ? issue.keys.map((key) => ({ path: [...path, key], message: 'is not a known field' })) : [{ path, message: issue.message }];
    });
}

const rosetteFields = {
  name: name(RACK_LIMITS.nameMax),
  units: unitsSchema.optional(),
  rosette: z.unknown().optional(),
  tags: rackTagsSchema.optional(),
  notes: text(RACK_LIMITS.notesMax).optional(),
};

/** Adds the rosette's issues under `rosette` when `units` is known (the member's, when the body has none). */
const withRosetteCheck = (defaultUnits: Units) => (body: { units?: Units; rosette?: unknown }, ctx: z.RefinementCtx) => {
  if (body.rosette === undefined) return;
  for (const issue of rosetteIssues(body.rosette, body.units ?? defaultUnits)) ctx.addIssue({ code: 'custom', path: ['rosette', ...issue.path], message: issue.message });
};

/** A new rack rosette; `units` defaults to the member's. */
export const rackRosetteBody = (memberUnits: Units = 'mm') =>
  z.strictObject({ ...rosetteFields, rosette: z.unknown().refine((v) => v !== undefined, 'is required') }).superRefine(withRosetteCheck(memberUnits));
export type RackRosetteBody = { name: string; units?: Units; rosette: RosetteObject; tags?: string[]; notes?: string };

/** A change to a rack rosette: any of the fields; a new `rosette` is read in `units` if given, else in the rosette's stored units. */
export const rackRosettePatch = (storedUnits: Units = 'mm') =>
  z
    .strictObject({ ...rosetteFields, name: rosetteFields.name.optional() })
    .refine((b) => Object.values(b).some((v) => v !== undefined), 'give at least one field')
    .superRefine(withRosetteCheck(storedUnits));
export type RackRosettePatch = Partial<RackRosetteBody>;

export interface RackRosette {
  id: string;
  name: string;
  units: Units;
  rosette: RosetteObject;
  tags: string[];
  notes: string;
  createdAt: string;
  updatedAt: string;
}

const list = <T extends z.ZodType>(item: T) => z.array(item, { error: 'must be a list' }).max(RACK_LIMITS.shopItems, `takes at most ${RACK_LIMITS.shopItems}`);
const label = text(RACK_LIMITS.shopNameMax).optional();

const shopRubber = z.discriminatedUnion('shape', [
  z.strictObject({ name: label, shape: z.literal('round'), radius: finite }),
  z.strictObject({ name: label, shape: z.literal('flat'), width: finite }),
], { error: 'must have shape "round" (radius) or "flat" (width)' });
const shopTravel = z.strictObject({
  name: label,
  /** Bar travel for one revolution of the rosette, a length. */
  travelPerRev: finite,
  /** Cutter displacement per rubber displacement. */
  leverRatio: finite.min(0.01, 'must be at least 0.01').max(10, 'must be at most 10'),
});
const shopCutter = z.strictObject({ name: label, diameter: finite, flutes: finite.int('must be a whole number').min(1, 'must be at least 1').max(8, 'must be at most 8') });
const shopFollower = z.strictObject({ name: label, radius: finite });
const shopVCutter = z.strictObject({ name: label, vAngle: finite.gt(0, 'must be greater than 0°').lt(180, 'must be less than 180°') });

const shopShape = {
  units: unitsSchema.optional(),
  rubbers: list(shopRubber),
  travels: list(shopTravel),
  cutters: list(shopCutter),
  followers: list(shopFollower),
  vCutters: list(shopVCutter),
};

type Issue = (path: (string | number)[], message: string) => void;

/** Checks the shop's lengths against SHOP_LIMITS_MM after conversion, naming the field and the limit in the shop's units. */
function checkShopLengths(shop: z.infer<z.ZodObject<typeof shopShape>>, units: Units, issue: Issue): void {
  const toMm = units === 'in' ? MM_PER_INCH : 1;
  const show = (mm: number) => (units === 'in' ? `${+(mm / MM_PER_INCH).toFixed(4)} in` : `${mm} mm`);
  const check = (value: number, key: keyof typeof SHOP_LIMITS_MM, path: (string | number)[]) => {
    const [lo, hi] = SHOP_LIMITS_MM[key];
    if (!(value * toMm >= lo && value * toMm <= hi)) issue(path, `must be between ${show(lo)} and ${show(hi)}`);
  };
  shop.rubbers.forEach((r, i) => (r.shape === 'round' ? check(r.radius, 'rubberRadius', ['rubbers', i, 'radius']) : check(r.width, 'rubberWidth', ['rubbers', i, 'width'])));
  shop.travels.forEach((t, i) => check(t.travelPerRev, 'travelPerRev', ['travels', i, 'travelPerRev']));
  shop.cutters.forEach((c, i) => check(c.diameter, 'cutterDiameter', ['cutters', i, 'diameter']));
  shop.followers.forEach((f, i) => check(f.radius, 'followerRadius', ['followers', i, 'radius']));
}

const issueIn = (ctx: z.RefinementCtx, prefix: (string | number)[]): Issue => (path, message) => ctx.addIssue({ code: 'custom', path: [...prefix, ...path], message });

/** The rest of the shop; `units` defaults to the member's. */
export const rackShopBody = (memberUnits: Units = 'mm') =>
  z.strictObject(shopShape).superRefine((shop, ctx) => checkShopLengths(shop, shop.units ?? memberUnits, issueIn(ctx, [])));
export type RackShopBody = z.input<ReturnType<typeof rackShopBody>>;
export type RackShop = Omit<z.output<ReturnType<typeof rackShopBody>>, 'units'> & { units: Units };
export type ShopRubber = z.infer<typeof shopRubber>;
export type ShopTravel = z.infer<typeof shopTravel>;
export type ShopCutter = z.infer<typeof shopCutter>;
export type ShopFollower = z.infer<typeof shopFollower>;

export const EMPTY_SHOP = (units: Units): RackShop => ({ units, rubbers: [], travels: [], cutters: [], followers: [], vCutters: [] });

export interface Rack {
  /** The member's units: what the web app shows (0.001 in / 0.01 mm). */
  units: Units;
  rosettes: RackRosette[];
  shop: RackShop;
}

/** The rack file: the whole rack, versioned like the design file. */
export const rackFileSchema = z
  .strictObject({
    format: z.literal(RACK_FORMAT, { error: `must be "${RACK_FORMAT}"` }),
    rosettes: z
      .array(
        z.strictObject({ name: rosetteFields.name, units: unitsSchema, rosette: z.unknown(), tags: rackTagsSchema.default([]), notes: text(RACK_LIMITS.notesMax).default('') }),
        { error: 'must be a list' },
      )
      .max(RACK_LIMITS.rosettes, `takes at most ${RACK_LIMITS.rosettes} rosettes`),
    shop: z.strictObject({ ...shopShape, units: unitsSchema }),
  })
  .superRefine((file, ctx) => {
    const readings = rackReadingsProblem(file.rosettes.reduce((n, r) => n + rosetteReadings(r.rosette), 0));
    if (readings) ctx.addIssue({ code: 'custom', path: ['rosettes'], message: readings });
    file.rosettes.forEach((r, i) => {
      for (const issue of rosetteIssues(r.rosette, r.units)) issueIn(ctx, ['rosettes', i, 'rosette'])(issue.path, issue.message);
    });
    checkShopLengths(file.shop, file.shop.units, issueIn(ctx, ['shop']));
  });
export interface RackFile {
  format: typeof RACK_FORMAT;
  rosettes: { name: string; units: Units; rosette: RosetteObject; tags: string[]; notes: string }[];
  shop: RackShop;
}

/** A rosette's lengths converted to `units` (inch = 25.4 mm exactly). */
export function rosetteInUnits(rosette: RosetteObject, from: Units, to: Units): RosetteObject {
  if (from === to) return rosette;
  // Divided, not multiplied by 1/25.4: v / 25.4 is the correctly rounded inch value.
  const f = (v: number) => (to === 'in' ? v / MM_PER_INCH : v * MM_PER_INCH);
  return {
    baseRadius: f(rosette.baseRadius),
    layers: rosette.layers.map((l) => ({
      ...l,
      amplitude: f(l.amplitude),
      wave: l.wave.shape === 'measured' ? { ...l.wave, points: l.wave.points.map(([a, r]) => [a, f(r)] as [number, number]) } : l.wave,
    })),
  };
}
