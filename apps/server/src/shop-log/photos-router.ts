import { pipeline } from 'node:stream/promises';
import { Router, type Request, type RequestHandler } from 'express';
import { and, eq } from 'drizzle-orm';
import { PHOTO_FIELD, photoFields } from '@barwright/contracts';
import { photos, type PhotoRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { requireDesignRole } from '../boards/board-access';
import { forbidden, HttpError, notFound } from '../http/http-error';
import { parseBody } from '../http/validate';
import { requireUuid } from '../http/uuid';
import { requireOpenEntry, requireVisibleEntry, viewerOf } from '../publishing/entry-access';
import type { PhotoStorage } from './photo-storage';
import { receiveFile } from './photo-upload';
import { checkDailyAllowance, listPhotos, storePhoto, type PhotoLimits } from './photos-service';
import { photosShownTo, seesHiddenItem } from '../moderation/hidden-visibility';

export interface PhotosRouterDeps {
  db: Db;
  /** The local folder or the S3 bucket; absent (uploads answer 503) when the server has neither. */
  files?: PhotoStorage;
  limits: PhotoLimits;
}

type Target = { entryId: string } | { designId: string };

/** May the viewer see this photo? Entry photos follow the entry; design photos the board. */
async function requirePhotoAccess(db: Db, req: Request): Promise<PhotoRow> {
  const [photo] = await db.select().from(photos).where(eq(photos.id, requireUuid(req.params.id as string, 'photo')));
  if (!photo) throw notFound('photo');
  // Hidden by moderation: its uploader and the moderators only.
  if (photo.hiddenAt && !seesHiddenItem(photo.uploaderId, viewerOf(req))) throw notFound('photo');
  try {
    if (photo.entryId) await requireVisibleEntry(db, photo.entryId, viewerOf(req));
    else await requireDesignRole(db, photo.designId!, requireUser(req).id, 'viewer');
  } catch {
    throw notFound('photo');
  }
  return photo;
}

export function photosRouter(deps: PhotosRouterDeps): Router {
  const { db, limits } = deps;
  const router = Router();
  const receive = receiveFile(PHOTO_FIELD, limits.maxBytes);

  /** Checks who may upload where, and the day's allowance, before the body is read. */
  const guard = (target: (req: Request) => Promise<Target>): RequestHandler => async (req, res, next) => {
    const user = requireUser(req);
    if (!deps.files) throw new HttpError(503, 'uploads_unavailable', 'This server takes no uploads (it has no uploads directory).');
    res.locals.target = await target(req);
    await checkDailyAllowance(db, user.id, limits.perDay);
    next();
  };
  const store: RequestHandler = async (req, res) => {
    if (!req.file) throw new HttpError(400, 'invalid_input', `Choose a photo to upload (form field "${PHOTO_FIELD}").`, { [PHOTO_FIELD]: 'is required' });
    const fields = parseBody(photoFields, req.body);
    const photo = await storePhoto(db, deps.files!, { upload: req.file.buffer, target: res.locals.target, uploader: requireUser(req), fields }, limits);
    res.status(201).json(photo);
  };

  router.post('/entries/:id/photos', guard(async (req) => ({ entryId: (await requireOpenEntry(db, req.params.id as string, requireUser(req), 'given photos')).id })), receive, store);
  router.post('/designs/:id/photos', guard(async (req) => ({ designId: (await requireDesignRole(db, req.params.id as string, requireUser(req).id, 'editor')).design.id })), receive, store);
  router.get('/entries/:id/photos', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await listPhotos(db, and(eq(photos.entryId, entry.id), photosShownTo(viewerOf(req)))!));
  });
  router.get('/designs/:id/photos', async (req, res) => {
    const { design } = await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    res.json(await listPhotos(db, eq(photos.designId, design.id)));
  });

  const serve = (which: 'fileName' | 'thumbName'): RequestHandler => async (req, res) => {
    const photo = await requirePhotoAccess(db, req);
    // A stored name never changes content, so it is the entity tag; a fresh copy needs no read of the store.
    res.set({ 'X-Content-Type-Options': 'nosniff', 'Content-Security-Policy': "default-src 'none'", 'Cache-Control': 'private, max-age=3600', ETag: `"${photo[which]}"` });
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    const stored = await deps.files?.read(photo[which]);
    if (!stored) throw notFound('photo');
    res.type(photo.mime).set('Content-Length', String(stored.bytes));
    // Headers are sent: a storage failure from here on can only cut the answer short.
    await pipeline(stored.body, res).catch(() => res.destroy());
  };
  router.get('/photos/:id', serve('fileName'));
  router.get('/photos/:id/thumb', serve('thumbName'));
  router.delete('/photos/:id', async (req, res) => {
    const user = requireUser(req);
    const photo = await requirePhotoAccess(db, req);
    if (photo.uploaderId !== user.id) throw forbidden('Only who uploaded a photo can delete it.');
    await db.delete(photos).where(eq(photos.id, photo.id));
    await deps.files?.remove(photo.fileName, photo.thumbName);
    res.status(204).end();
  });
  return router;
}
