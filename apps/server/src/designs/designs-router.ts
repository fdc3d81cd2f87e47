import { Router } from 'express';
import * as Y from 'yjs';
import { and, desc, eq } from 'drizzle-orm';
import { createVersionBody, updateDesignBody, type DesignMeta, type DesignVersion } from '@barwright/contracts';
import { NOTES_TEXT, readDesign, writeDesign } from '@barwright/contracts/design-doc';
import { boards, designs, designVersions, users } from '../../../../db/schema';
import type { ComputePool } from '../compute/compute-pool';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { requireDesignRole } from '../boards/board-access';
import { HttpError, notFound } from '../http/http-error';
import { parseBody } from '../http/validate';
import { isUuid } from '../http/uuid';
import type { DesignDocStore } from '../realtime/design-doc-store';
import { applyServerUpdate, currentDoc } from '../realtime/live-docs';
import { exportQuery, fileSlug as slug } from './export-query';
import { createDesign, toDesignSummary, validatedDesign } from './designs-service';

export interface DesignsRouterDeps {
  db: Db;
  store: DesignDocStore;
  compute: ComputePool;
  /** Closes the open sockets of a deleted design. */
  closeDesignSockets: (designId: string) => void;
}

export function designsRouter(deps: DesignsRouterDeps): Router {
  const { db, store } = deps;
  const router = Router();

  router.get('/:id', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    res.json(validatedDesign(await currentDoc(store, req.params.id)));
  });
  router.get('/:id/meta', async (req, res) => {
    const { design, role } = await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer', true);
    const [board] = await db.select().from(boards).where(eq(boards.id, design.boardId));
    res.json({ ...toDesignSummary(design), boardName: board.name, role } satisfies DesignMeta);
  });
  router.patch('/:id', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'editor');
    const { title } = parseBody(updateDesignBody, req.body);
    const [row] = await db.update(designs).set({ title, updatedAt: new Date() }).where(eq(designs.id, req.params.id)).returning();
    res.json(toDesignSummary(row));
  });
  router.post('/:id/duplicate', async (req, res) => {
    const user = requireUser(req);
    const { design } = await requireDesignRole(db, req.params.id, user.id, 'editor');
    const state = Y.encodeStateAsUpdate(await currentDoc(store, design.id));
    const copy = await createDesign(db, { boardId: design.boardId, title: `${design.title} (copy)`.slice(0, 100), createdBy: user.id, state });
    res.status(201).json({ id: copy.id });
  });
  router.delete('/:id', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'owner');
    await db.update(designs).set({ deletedAt: new Date() }).where(eq(designs.id, req.params.id));
    deps.closeDesignSockets(req.params.id);
    res.status(204).end();
  });
  router.post('/:id/restore', async (req, res) => {
    const { design } = await requireDesignRole(db, req.params.id, requireUser(req).id, 'owner', true);
    const [row] = await db.update(designs).set({ deletedAt: null, updatedAt: new Date() }).where(eq(designs.id, design.id)).returning();
    res.json(toDesignSummary(row));
  });

  router.get('/:id/export', async (req, res) => {
    const { design } = await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    const { format } = exportQuery(req.query);
    const file = await deps.compute.exportDesign(validatedDesign(await currentDoc(store, design.id)), format, slug(design.title), { title: design.title });
    res.type(file.mime).attachment(file.filename).send(typeof file.content === 'string' ? file.content : Buffer.from(file.content));
  });

  router.get('/:id/versions', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    const rows = await db
      .select({ v: designVersions, author: users.displayName })
      .from(designVersions)
      .innerJoin(users, eq(users.id, designVersions.authorId))
      .where(eq(designVersions.designId, req.params.id))
      .orderBy(desc(designVersions.createdAt));
    res.json(rows.map(({ v, author }) => ({ id: v.id, name: v.name, authorName: author, createdAt: v.createdAt.toISOString() }) satisfies DesignVersion));
  });
  router.post('/:id/versions', async (req, res) => {
    const user = requireUser(req);
    await requireDesignRole(db, req.params.id, user.id, 'editor');
    const { name } = parseBody(createVersionBody, req.body);
    const state = Y.encodeStateAsUpdate(await currentDoc(store, req.params.id));
    const [v] = await db.insert(designVersions).values({ designId: req.params.id, name, authorId: user.id, state }).returning();
    res.status(201).json({ id: v.id, name: v.name, authorName: user.displayName, createdAt: v.createdAt.toISOString() } satisfies DesignVersion);
  });
  router.get('/:id/versions/:versionId', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'viewer');
    const version = await findVersion(db, req.params.id, req.params.versionId);
    const doc = new Y.Doc();
    Y.applyUpdate(doc, version.state);
    res.json({ design: readDesign(doc), notes: doc.getText(NOTES_TEXT).toString() });
  });
  // Restoring writes the version's values over the current ones as a new edit, so the history keeps both.
  router.post('/:id/versions/:versionId/restore', async (req, res) => {
    await requireDesignRole(db, req.params.id, requireUser(req).id, 'editor');
    const version = await findVersion(db, req.params.id, req.params.versionId);
    const old = new Y.Doc();
    Y.applyUpdate(old, version.state);
    const live = await currentDoc(store, req.params.id);
    const scratch = new Y.Doc();
    Y.applyUpdate(scratch, Y.encodeStateAsUpdate(live));
    const before = Y.encodeStateVector(scratch);
    writeDesign(scratch, readDesign(old) as never);
    const notes = scratch.getText(NOTES_TEXT);
    scratch.transact(() => {
      notes.delete(0, notes.length);
      notes.insert(0, old.getText(NOTES_TEXT).toString());
    });
    await applyServerUpdate(store, req.params.id, Y.encodeStateAsUpdate(scratch, before));
    res.json(readDesign(scratch));
  });
  return router;
}

async function findVersion(db: Db, designId: string, versionId: string) {
  const [row] = isUuid(versionId)
    ? await db.select().from(designVersions).where(and(eq(designVersions.id, versionId), eq(designVersions.designId, designId)))
    : [];
  if (!row) throw notFound('version');
  return row;
}
