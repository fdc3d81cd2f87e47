import * as z from 'zod';
import type { PersonRef } from './entries';

/**
 * Shop log: photos of real cuts, on a published entry (any signed-in member may add theirs) or
 * on a board design (editor or owner). Multipart form: the image in field `photo`, plus the
 * fields of `photoFields`.
 *   POST   /api/entries/:id/photos   multipart → 201 Photo
 *   POST   /api/designs/:id/photos   multipart → 201 Photo
 *   GET    /api/entries/:id/photos   → Photo[] (newest first; anyone who may see the entry)
 *   GET    /api/designs/:id/photos   → Photo[] (board members)
 *   GET    /api/photos/:id           → the re-encoded image (its own content type, nosniff)
 *   GET    /api/photos/:id/thumb     → a thumbnail at most PHOTO_THUMB_PX on its longer side
 *   DELETE /api/photos/:id           → 204 (the uploader)
 * Refusals: 413 too large, 415 not a JPEG/PNG/WebP by content, 422 unreadable or too many pixels,
 * 429 the day's count reached. Every accepted image is re-encoded without any metadata (GPS included).
 */
export const PHOTO_KINDS = ['trial', 'keeper'] as const;
export type PhotoKind = (typeof PHOTO_KINDS)[number];
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
/** Largest image accepted, in pixels (width × height). */
export const PHOTO_MAX_PIXELS = 40_000_000;
export const PHOTOS_PER_DAY = 30;
export const PHOTO_THUMB_PX = 480;
export const PHOTO_CAPTION_MAX = 300;
export const PHOTO_MATERIAL_MAX = 60;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
/** The multipart field that carries the image. */
export const PHOTO_FIELD = 'photo';

/** Today's date (YYYY-MM-DD) in the easternmost time zone (UTC+14), so no member's today is "in the future". */
export const latestCalendarDate = (now = new Date()) => new Date(now.getTime() + 14 * 3600_000).toISOString().slice(0, 10);

export const photoFields = z.strictObject({
  kind: z.enum(PHOTO_KINDS, { error: 'must be trial or keeper' }),
  caption: z.string().trim().max(PHOTO_CAPTION_MAX, `must be at most ${PHOTO_CAPTION_MAX} characters`).default(''),
  /** What was cut, in the member's words ("acrylic", "O1 tool steel"). */
  material: z.string().trim().max(PHOTO_MATERIAL_MAX, `must be at most ${PHOTO_MATERIAL_MAX} characters`).default(''),
  /** The day of the cut, YYYY-MM-DD, not in the future. */
  date: z.iso
    .date({ error: 'must be a date (YYYY-MM-DD)' })
    .refine((d) => d <= latestCalendarDate(), 'must not be in the future'),
});
export type PhotoFields = z.input<typeof photoFields>;

export interface Photo {
  id: string;
  entryId: string | null;
  designId: string | null;
  kind: PhotoKind;
  caption: string;
  material: string;
  /** YYYY-MM-DD. */
  date: string;
  mime: (typeof PHOTO_TYPES)[number];
  width: number;
  height: number;
  bytes: number;
  uploader: PersonRef;
  createdAt: string;
  url: string;
  thumbUrl: string;
  /** Moderation: set only for the viewers who may see a hidden photo (its uploader, moderators); others never receive it. */
  hidden?: boolean;
  hiddenReason?: string | null;
}
