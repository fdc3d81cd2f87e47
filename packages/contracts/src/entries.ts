import * as z from 'zod';
import { MATERIALS, WAVE_SHAPES, type Design, type MaterialId, type ScheduleKind, type WaveShape } from './design';
import { SCHEDULE_KINDS } from './design-labels';

/**
 * Published entries: a bar design made public as a series of immutable revisions.
 * Routes (all under /api):
 *   POST /designs/:id/publish            PublishBody → 201 PublishResult   (editor or owner on the design's board)
 *   GET  /designs/:id/entry              → DesignEntryLink, or null when the design was never published (board members)
 *   GET  /entries                        ExploreQuery (query string) → ExplorePage   (anyone, signed in or not)
 *   GET  /entries/:id                    → EntryDetail
 *   GET  /entries/:id/revisions/:n       → EntryRevision
 *   GET  /entries/:id/thumbnail.svg      → image/svg+xml of the latest revision's line study
 *   GET  /entries/:id/revisions/:n/thumbnail.svg → the same for one revision
 *   GET  /entries/:id/export?format=svg|dxf|gcode|csv|pdf[&revision=n] → the file (attachment)
 *   DELETE /entries/:id                  → 204 (its author only; the entry disappears for everyone)
 * A hidden entry (moderation) or a deleted one answers 404 to everyone except, for hidden ones,
 * its author and moderators/admins, who see it with `hidden: true`.
 */

export const ENTRY_TITLE_MAX = 100;
export const ENTRY_DESCRIPTION_MAX = 4000;
export const ENTRY_TAGS_MAX = 10;
export const ENTRY_TAG_MAX = 30;

/** A tag: lower case letters, digits and single hyphens ("basket-weave"); spaces become hyphens. */
export const tagSchema = z
  .string({ error: 'must be text' })
  .trim()
  .toLowerCase()
  .transform((t) => t.replace(/\s+/g, '-'))
  .pipe(
    z
      .string()
      .min(1, 'must not be empty')
      .max(ENTRY_TAG_MAX, `must be at most ${ENTRY_TAG_MAX} characters`)
      .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'may hold only letters, digits and hyphens'),
  );

export const publishBody = z.strictObject({
  title: z.string({ error: 'is required' }).trim().min(1, 'is required').max(ENTRY_TITLE_MAX, `must be at most ${ENTRY_TITLE_MAX} characters`),
  description: z.string({ error: 'must be text' }).trim().max(ENTRY_DESCRIPTION_MAX, `must be at most ${ENTRY_DESCRIPTION_MAX} characters`).default(''),
  tags: z
    .array(tagSchema, { error: 'must be a list of tags' })
    .max(ENTRY_TAGS_MAX, `takes at most ${ENTRY_TAGS_MAX} tags`)
    .default([])
    .transform((tags) => [...new Set(tags)]),
});
export type PublishBody = z.input<typeof publishBody>;

/** `POST /api/designs/:id/publish`: the entry (new, or the design's existing one) and the revision just made. */
export interface PublishResult {
  entryId: string;
  revision: number;
  /** True when this publish created the entry; false when it added a revision to it. */
  created: boolean;
}

/** `GET /api/designs/:id/entry`: the live entry a board design was published as, with its words. */
export const designEntryLinkSchema = z.object({
  entryId: z.string(),
  title: z.string(),
  description: z.string(),
  tags: z.array(z.string()),
  latestRevision: z.number().int(),
});
export type DesignEntryLink = z.infer<typeof designEntryLinkSchema>;
/** A design never published answers 200 with null: the usual case, not an error. */
export const designEntryLinkAnswerSchema = designEntryLinkSchema.nullable();
export type DesignEntryLinkAnswer = z.infer<typeof designEntryLinkAnswerSchema>;

export interface PersonRef {
  id: string;
  displayName: string;
}

/** The searchable facts of a revision, taken from its design file (first rosette layer). */
export interface EntryFacts {
  title: string;
  description: string;
  tags: string[];
  /** Lobes of the first rosette layer. */
  lobes: number;
  /** Wave shape of the first rosette layer. */
  wave: WaveShape;
  material: MaterialId;
  /** Cutter (end mill) diameter in millimetres, whatever the file's units. */
  cutterDiameterMm: number;
}

export interface RatingSummary {
  count: number;
  /** Mean stars (1–5), null without ratings. */
  mean: number | null;
  /** Lower bound of the 95 % Wilson interval of the share of 4–5 star ratings (0 without ratings); "top" sorts by it. */
  score: number;
}

/** A card in Explore, the remixes list and elsewhere. */
export interface EntryCard extends EntryFacts {
  id: string;
  author: PersonRef;
  /** When the entry was first published / last republished (ISO 8601). */
  publishedAt: string;
  updatedAt: string;
  revisionCount: number;
  rating: RatingSummary;
  remixCount: number;
  commentCount: number;
  /** Relative URL of the latest revision's line-study thumbnail (SVG). */
  thumbnailUrl: string;
  /** The latest revision's phase schedule (Explore's cards and table show it; other lists may leave it out). */
  schedule?: ScheduleKind;
}

/** One immutable revision, with its design file. */
export interface EntryRevision extends EntryFacts {
  entryId: string;
  number: number;
  author: PersonRef;
  createdAt: string;
  design: Design;
  thumbnailUrl: string;
}

export interface RevisionListItem {
  number: number;
  title: string;
  author: PersonRef;
  createdAt: string;
}

/** `GET /api/entries/:id`. */
export interface EntryDetail extends EntryCard {
  latest: EntryRevision;
  /** Every revision, newest first. */
  revisions: RevisionListItem[];
  photoCount: number;
  /** The revision this entry was remixed from (null for an original); `available` false when that entry is hidden or deleted. */
  parent: { entryId: string; revision: number; title: string | null; available: boolean } | null;
  rootEntryId: string;
  /** Set for the viewers who may see a hidden entry (its author, moderators). */
  hidden: boolean;
  hiddenReason: string | null;
  /** The board design it was published from, only for members of that board (to open it in the studio). */
  source: { boardId: string; designId: string } | null;
  viewer: {
    signedIn: boolean;
    isAuthor: boolean;
    /** Signed in, not the author. */
    canRate: boolean;
    /** The viewer's own stars, or null. */
    myStars: number | null;
    canDelete: boolean;
  };
}

/** `schedule`: by phase schedule in SCHEDULE_KINDS order (plain first), newest first within one. */
export const EXPLORE_SORTS = ['top', 'newest', 'remixed', 'discussed', 'schedule', 'relevance'] as const;
export type ExploreSort = (typeof EXPLORE_SORTS)[number];
export const EXPLORE_PAGE_SIZE_MAX = 60;
export const EXPLORE_PAGE_SIZE_DEFAULT = 24;

const intParam = (min: number, max: number) =>
  z.coerce.number({ error: 'must be a number' }).int('must be a whole number').min(min, `must be at least ${min}`).max(max, `must be at most ${max}`);
const mmParam = z.coerce.number({ error: 'must be a number' }).positive('must be greater than 0').max(50, 'must be at most 50 mm');
/** Repeated (`tags=a&tags=b`) or comma-separated (`tags=a,b`). */
const listParam = z
  .union([z.string(), z.array(z.string())])
  .transform((v) => (Array.isArray(v) ? v : [v]).flatMap((s) => s.split(',')).map((s) => s.trim()).filter(Boolean));

/**
 * `GET /api/entries` query string. Filters combine with AND; `tags` must all be present; `q` is a
 * full-text search over title, description and tags (English stemming, web-search syntax:
 * "quoted phrase", -excluded, or). `relevance` needs `q`. Default sort: `relevance` when `q` is
 * given, else `newest`. Ties break by newest, then id, so pages never overlap.
 */
export const exploreQuery = z
  .strictObject({
    q: z.string().trim().max(200, 'must be at most 200 characters').optional(),
    lobes: intParam(1, 360).optional(),
    wave: z.enum(WAVE_SHAPES as [WaveShape, ...WaveShape[]], { error: `must be one of ${WAVE_SHAPES.join(', ')}` }).optional(),
    material: z.enum(MATERIALS, { error: `must be one of ${MATERIALS.join(', ')}` }).optional(),
    /** The latest revision's phase schedule (plain, barleycorn, basket weave, moiré, twist, a list). */
    schedule: z.enum(SCHEDULE_KINDS, { error: `must be one of ${SCHEDULE_KINDS.join(', ')}` }).optional(),
    /** Cutter diameter range in millimetres, inclusive. */
    cutterMin: mmParam.optional(),
    cutterMax: mmParam.optional(),
    tags: listParam.pipe(z.array(tagSchema).max(ENTRY_TAGS_MAX, `takes at most ${ENTRY_TAGS_MAX} tags`)).optional(),
    /** An author's user id. */
    author: z.uuid('must be a user id').optional(),
    sort: z.enum(EXPLORE_SORTS, { error: `must be one of ${EXPLORE_SORTS.join(', ')}` }).optional(),
    page: intParam(1, 10_000).default(1),
    pageSize: intParam(1, EXPLORE_PAGE_SIZE_MAX).default(EXPLORE_PAGE_SIZE_DEFAULT),
  })
  .refine((q) => q.cutterMin === undefined || q.cutterMax === undefined || q.cutterMin <= q.cutterMax, {
    path: ['cutterMax'],
    message: 'must not be below cutterMin',
  })
  .refine((q) => q.sort !== 'relevance' || Boolean(q.q), { path: ['sort'], message: 'relevance needs a search (q)' });
export type ExploreQuery = z.output<typeof exploreQuery>;

export interface ExplorePage {
  items: EntryCard[];
  /** Entries matching the filters, over all pages. */
  total: number;
  page: number;
  pageSize: number;
  sort: ExploreSort;
}
