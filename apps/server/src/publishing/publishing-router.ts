import { gzipSync } from 'node:zlib';
import { Router, type Request, type Response } from 'express';
import { publishBody, type DesignEntryLinkAnswer, type PublishResult } from '@barwright/contracts';
import { and, eq, isNull } from 'drizzle-orm';
import { entries } from '../../../../db/schema';
import type { ComputePool } from '../compute/compute-pool';
import { ExportCache } from '../compute/export-cache';
import { requireUser } from '../auth/auth-router';
import { requireDesignRole } from '../boards/board-access';
import { validatedDesign } from '../designs/designs-service';
import { forbidden, HttpError } from '../http/http-error';
import { exportQuery, fileSlug as slug } from '../designs/export-query';
import { parseBody } from '../http/validate';
import type { DesignDocStore } from '../realtime/design-doc-store';
import { currentDoc } from '../realtime/live-docs';
import type { Db } from '../database/database';
import { requireRevision, requireVisibleEntry, viewerOf } from './entry-access';
import { entryDetail, people } from './entry-detail';
import { toEntryRevision } from './entry-views';
import { deleteEntry, publishDesign } from './publishing-service';

export interface PublishingRouterDeps {
  db: Db;
  store: DesignDocStore;
  compute: ComputePool;
}


/** Our own SVG, served as an image: no scripts, nothing loaded, not framed; gzip when the client takes it (it shrinks some 85 %). */
function sendSvg(req: Request, res: Response, svg: string, maxAgeSeconds: number) {
  res.set({
    'Content-Type': 'image/svg+xml; charset=utf-8',
    'X-Content-Type-Options': 'nosniff',
    'Content-Security-Policy': "default-src 'none'; style-src 'unsafe-inline'; img-src data:", // the lit thumbnail is a PNG inside the SVG
    // private: a shared cache must not keep serving a bar after the moderators hide it.
    'Cache-Control': `private, max-age=${maxAgeSeconds}`,
    Vary: 'Accept-Encoding',
  });
  if (/\bgzip\b/.test(req.get('accept-encoding') ?? '')) res.set('Content-Encoding', 'gzip').send(gzipSync(svg));
  else res.send(svg);
}

export function publishingRouter(deps: PublishingRouterDeps): Router {
  const { db, store, compute } = deps;
  const router = Router();
  // A revision never changes, so neither do its files.
  const exports = new ExportCache(compute.limits.cacheBytes);

  router.post('/designs/:id/publish', async (req, res) => {
    const user = requireUser(req);
    const { design } = await requireDesignRole(db, req.params.id, user.id, 'editor');
    const body = parseBody(publishBody, req.body);
    const file = validatedDesign(await currentDoc(store, design.id));
    res.status(201).json((await publishDesign(db, design, file, user, body, (d) => compute.thumbnailSvg(d))) satisfies PublishResult);
  });

  // The live entry a board design was published as, so a republish can start from its words;
  // null (not a 404) for a design never published, which is the usual case, not an error.
  router.get('/designs/:id/entry', async (req, res) => {
    const { design } = await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    const [entry] = await db
      .select({ entryId: entries.id, title: entries.title, description: entries.description, tags: entries.tags, latestRevision: entries.latestRevision })
      .from(entries)
      .where(and(eq(entries.designId, design.id), isNull(entries.deletedAt)));
    res.json((entry ?? null) satisfies DesignEntryLinkAnswer);
  });

  router.get('/entries/:id', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    res.json(await entryDetail(db, entry, viewerOf(req)));
  });
  router.get('/entries/:id/revisions/:n', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    const revision = await requireRevision(db, entry, req.params.n);
    const names = await people(db, [revision.authorId]);
    res.json(toEntryRevision(revision, names.get(revision.authorId)!));
  });
  router.get('/entries/:id/thumbnail.svg', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    sendSvg(req, res, (await requireRevision(db, entry, undefined)).thumbnailSvg, 300);
  });
  router.get('/entries/:id/revisions/:n/thumbnail.svg', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    sendSvg(req, res, (await requireRevision(db, entry, req.params.n)).thumbnailSvg, 86_400);
  });
  router.get('/entries/:id/export', async (req, res) => {
    const entry = await requireVisibleEntry(db, req.params.id, viewerOf(req));
    const { format } = exportQuery(req.query);
    const revision = await requireRevision(db, entry, req.query.revision === undefined ? undefined : String(req.query.revision));
    const file = await exports.get(`${revision.id}:${format}`, () => compute.exportDesign(revision.design, format, slug(revision.title), { title: revision.title }));
    res.type(file.mime).attachment(file.filename).send(typeof file.content === 'string' ? file.content : Buffer.from(file.content));
  });
  router.delete('/entries/:id', async (req, res) => {
    const user = requireUser(req);
    const entry = await requireVisibleEntry(db, req.params.id, user);
    if (entry.authorId !== user.id) throw forbidden('Only the author can delete this entry.');
    await deleteEntry(db, entry);
    res.status(204).end();
  });
  return router;
}
