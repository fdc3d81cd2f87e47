import * as z from 'zod';
import { MATERIALS, WAVE_SHAPES, type WaveShape } from './design';
import type { EntryCard } from './entries';

/**
 * The showcase: published bars chosen by moderators, in the order they set, each with a curator's note.
 *   GET    /api/showcase                          → ShowcaseItem[] (anyone; hidden and deleted entries left out)
 *   GET    /api/moderation/showcase               → CuratedItem[]  (moderators, admins: hidden ones too, flagged)
 *   POST   /api/moderation/showcase               FeatureBody → 201 CuratedItem (added last; 409 already featured or hidden)
 *   PATCH  /api/moderation/showcase/:entryId      ShowcaseNoteBody → CuratedItem
 *   DELETE /api/moderation/showcase/:entryId      → 204
 *   PUT    /api/moderation/showcase/order         ShowcaseOrderBody → CuratedItem[] (409 when the list changed meanwhile)
 * Every change lands in the audit log.
 */
export const SHOWCASE_NOTE_MAX = 500;
/** Most entries the showcase holds. */
export const SHOWCASE_MAX = 60;

const note = z.string({ error: 'is required' }).trim().min(1, 'is required: say why this bar is worth a look').max(SHOWCASE_NOTE_MAX, `must be at most ${SHOWCASE_NOTE_MAX} characters`);

export const featureBody = z.strictObject({ entryId: z.uuid('must be an entry id'), note });
export type FeatureBody = z.input<typeof featureBody>;

export const showcaseNoteBody = z.strictObject({ note });
export type ShowcaseNoteBody = z.input<typeof showcaseNoteBody>;

export const showcaseOrderBody = z.strictObject({
  /** Every featured entry, first shown first. */
  entryIds: z
    .array(z.uuid('must be entry ids'), { error: 'must be a list of entry ids' })
    .max(SHOWCASE_MAX, `takes at most ${SHOWCASE_MAX} ids`)
    .refine((ids) => new Set(ids).size === ids.length, 'must not name an entry twice'),
  /** The entry the curator moved, when one was (a swap of neighbours reads either way; this says which the log names). */
  moved: z.uuid('must be an entry id').optional(),
});
export type ShowcaseOrderBody = z.input<typeof showcaseOrderBody>;

const personSchema = z.object({ id: z.string(), displayName: z.string() });

/** The answer schema of contracts' EntryCard (entries.ts declares it as an interface); the checks below keep the two equal. */
export const entryCardSchema = z.object({
  id: z.string(),
  title: z.string(),
  description: z.string(),
  tags: z.array(z.string()),
  lobes: z.number().int(),
  wave: z.enum(WAVE_SHAPES as [WaveShape, ...WaveShape[]]),
  material: z.enum(MATERIALS),
  cutterDiameterMm: z.number(),
  author: personSchema,
  publishedAt: z.string(),
  updatedAt: z.string(),
  revisionCount: z.number().int(),
  rating: z.object({ count: z.number().int(), mean: z.number().nullable(), score: z.number() }),
  remixCount: z.number().int(),
  commentCount: z.number().int(),
  thumbnailUrl: z.string(),
});
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : never) : never;
const cardsAgree: Same<z.infer<typeof entryCardSchema>, EntryCard> = true;
void cardsAgree;

export const showcaseItemSchema = z.object({
  entry: entryCardSchema,
  note: z.string(),
  /** When it was featured (ISO 8601). */
  featuredAt: z.string(),
  /** Who featured it; null once that account is gone. */
  featuredBy: personSchema.nullable(),
  /** 0 first. */
  position: z.number().int(),
});
export type ShowcaseItem = z.infer<typeof showcaseItemSchema>;

/** A showcase row as the curators see it: the entry may be hidden (left out of the public showcase until restored). */
export const curatedItemSchema = showcaseItemSchema.extend({ hidden: z.boolean(), hiddenReason: z.string().nullable() });
export type CuratedItem = z.infer<typeof curatedItemSchema>;
