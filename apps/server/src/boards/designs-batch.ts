import type { RequestHandler } from 'express';
import { eq } from 'drizzle-orm';
import { designsBatchBody } from '@barwright/contracts';
import { boards, designRackOrigins, designs, designUpdates } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { HttpError } from '../http/http-error';
import { parseBody } from '../http/validate';
import { initialDocUpdate } from '../designs/designs-service';
import { ownRosettesAmong } from '../rack/rack-service';
import { requireBoardRole } from './board-access';

/**
 * POST /api/boards/:id/designs/batch (editor or owner): a sweep's shortlist made bar designs in one
 * transaction, each with the rack rosette it came from recorded as its origin. All or nothing.
 */
export function createDesignsBatch(db: Db): RequestHandler {
  return async (req, res) => {
    const user = requireUser(req);
    const boardId = String(req.params.id);
    await requireBoardRole(db, boardId, user.id, 'editor');
    const body = parseBody(designsBatchBody, req.body);
    const asked = [...new Set(body.designs.flatMap((d) => (d.rackRosetteId ? [d.rackRosetteId.toLowerCase()] : [])))];
    const rosettes = new Map((await ownRosettesAmong(db, user.id, asked)).map((r) => [r.id, r]));
    const fields: Record<string, string> = {};
    body.designs.forEach((d, i) => {
      if (d.rackRosetteId && !rosettes.has(d.rackRosetteId.toLowerCase())) fields[`designs[${i}].rackRosetteId`] = 'is not a rosette of your rack';
    });
    if (Object.keys(fields).length) throw new HttpError(400, 'invalid_input', 'Some origins are not rosettes of your rack.', fields);
    // Each design's first co-editing update is built before the transaction, giving way to other requests
    // every few designs: 100 at once held the event loop for over a second on a loaded server.
    const updates: Uint8Array[] = [];
    for (let i = 0; i < body.designs.length; i++) {
      if (i > 0 && i % 10 === 0) await new Promise((resolve) => setImmediate(resolve));
      updates.push(initialDocUpdate(body.designs[i].file));
    }
    const ids = await db.transaction(async (tx) => {
      const rows = await tx.insert(designs).values(body.designs.map((d) => ({ boardId, title: d.title, createdBy: user.id }))).returning({ id: designs.id });
      await tx.insert(designUpdates).values(rows.map((row, i) => ({ designId: row.id, update: updates[i] })));
      const origins = rows.flatMap((row, i) => {
        const rosette = body.designs[i].rackRosetteId ? rosettes.get(body.designs[i].rackRosetteId!.toLowerCase()) : undefined;
        return rosette ? [{ designId: row.id, rackRosetteId: rosette.id, rosetteName: rosette.name }] : [];
      });
      if (origins.length) await tx.insert(designRackOrigins).values(origins);
      await tx.update(boards).set({ updatedAt: new Date() }).where(eq(boards.id, boardId));
      return rows.map((r) => r.id);
    });
    res.status(201).json({ ids });
  };
}
