import { and, count, desc, eq, gt, type SQL } from 'drizzle-orm';
import type { Photo } from '@barwright/contracts';
import { photos, users, type PhotoRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { ADVISORY_LOCKS, advisoryXactLock } from '../database/advisory-locks';
import { HttpError } from '../http/http-error';
import type { PhotoStorage } from './photo-storage';
import { processPhoto } from './photo-image';
import { hiddenFields } from '../moderation/hidden-visibility';

export interface PhotoLimits {
  maxBytes: number;
  maxPixels: number;
  perDay: number;
}

export const toPhoto = (p: PhotoRow, uploaderName: string): Photo => ({
  id: p.id,
  entryId: p.entryId,
  designId: p.designId,
  kind: p.kind,
  caption: p.caption,
  material: p.material,
  date: p.takenOn,
  mime: p.mime,
  width: p.width,
  height: p.height,
  bytes: p.bytes,
  uploader: { id: p.uploaderId, displayName: uploaderName },
  createdAt: p.createdAt.toISOString(),
  url: `/api/photos/${p.id}`,
  thumbUrl: `/api/photos/${p.id}/thumb`,
  // Only viewers allowed to see a hidden photo ever receive one (see photosShownTo).
  ...hiddenFields(p),
});

/**
 * 429 once the member has uploaded the day's allowance (a rolling 24 hours). Checked before the body is
 * read (cheap refusal) and again in the insert's transaction under the member's lock (the guarantee).
 */
export async function checkDailyAllowance(db: Db, userId: string, perDay: number): Promise<void> {
  const since = new Date(Date.now() - 86_400_000);
  const [{ n }] = await db.select({ n: count() }).from(photos).where(and(eq(photos.uploaderId, userId), gt(photos.createdAt, since)));
  if (n >= perDay) throw new HttpError(429, 'rate_limited', `You have uploaded ${perDay} photos in the last 24 hours, the limit. Try again tomorrow.`);
}

export async function storePhoto(
  db: Db,
  files: PhotoStorage,
  input: { upload: Buffer; target: { entryId: string } | { designId: string }; uploader: UserRow; fields: { kind: PhotoRow['kind']; caption: string; material: string; date: string } },
  limits: PhotoLimits,
): Promise<Photo> {
  const image = await processPhoto(input.upload, limits.maxPixels);
  const names = await files.save(image.extension, image.full, image.thumb);
  try {
    const row = await db.transaction(async (tx) => {
      // The uploader's uploads queue here from count to insert, so concurrent ones cannot all pass the count.
      await advisoryXactLock(tx, ADVISORY_LOCKS.photoAllowance, input.uploader.id);
      await checkDailyAllowance(tx, input.uploader.id, limits.perDay);
      const [inserted] = await tx
        .insert(photos)
        .values({
          ...input.target,
          uploaderId: input.uploader.id,
          kind: input.fields.kind,
          caption: input.fields.caption,
          material: input.fields.material,
          takenOn: input.fields.date,
          mime: image.mime,
          width: image.width,
          height: image.height,
          bytes: image.full.length,
          ...names,
        })
        .returning();
      return inserted;
    });
    return toPhoto(row, input.uploader.displayName);
  } catch (error) {
    await files.remove(names.fileName, names.thumbName);
    throw error;
  }
}

export async function listPhotos(db: Db, where: SQL): Promise<Photo[]> {
  const rows = await db
    .select({ photo: photos, name: users.displayName })
    .from(photos)
    .innerJoin(users, eq(users.id, photos.uploaderId))
    .where(where)
    .orderBy(desc(photos.createdAt))
    .limit(500);
  return rows.map((r) => toPhoto(r.photo, r.name));
}
