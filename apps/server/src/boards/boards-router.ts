import { Router } from 'express';
import { and, eq } from 'drizzle-orm';
import { acceptInvitationBody, createBoardBody, createDesignBody, inviteBody, memberRoleBody, updateBoardBody } from '@barwright/contracts';
import { boardMembers, boards } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { HttpError, notFound } from '../http/http-error';
import { parseBody } from '../http/validate';
import { isUuid, requireUuid } from '../http/uuid';
import { invitationMail } from '../mail/board-mails';
import type { Mailer } from '../mail/mailer';
import { createDesign } from '../designs/designs-service';
import { requireBoardRole, type BoardAccessEvents } from './board-access';
import * as service from './boards-service';
import { createDesignsBatch } from './designs-batch';

export interface BoardsRouterDeps {
  db: Db;
  mailer: Mailer;
  publicUrl: string;
  accessEvents: BoardAccessEvents;
  log: (error: unknown) => void;
  /** Tells an invitee who already has an account in the app too (the community's notifier). */
  notifyInvited?: (input: { email: string; board: { id: string; name: string }; inviter: { id: string; displayName: string }; role: string }) => Promise<void>;
}

export function boardsRouter(deps: BoardsRouterDeps): Router {
  const { db } = deps;
  const router = Router();

  router.post('/', async (req, res) => {
    const user = requireUser(req);
    const board = await service.createBoard(db, user, parseBody(createBoardBody, req.body).name);
    res.status(201).json(await service.boardDetail(db, board.id, 'owner'));
  });
  router.get('/', async (req, res) => {
    res.json(await service.listBoards(db, requireUser(req).id));
  });
  router.get('/:id', async (req, res) => {
    const role = await requireBoardRole(db, req.params.id, requireUser(req).id, 'viewer');
    res.json(await service.boardDetail(db, req.params.id, role));
  });
  router.patch('/:id', async (req, res) => {
    await requireBoardRole(db, req.params.id, requireUser(req).id, 'owner');
    const body = parseBody(updateBoardBody, req.body);
    await db
      .update(boards)
      .set({
        ...(body.name ? { name: body.name } : {}),
        ...(body.archived !== undefined ? { archivedAt: body.archived ? new Date() : null } : {}),
        updatedAt: new Date(),
      })
      .where(eq(boards.id, req.params.id));
    res.json(await service.boardDetail(db, req.params.id, 'owner'));
  });

  router.post('/:id/invitations', async (req, res) => {
    const user = requireUser(req);
    await requireBoardRole(db, req.params.id, user.id, 'owner');
    const body = parseBody(inviteBody, req.body);
    const { invitation, token } = await service.createInvitation(db, { boardId: req.params.id, ...body, invitedBy: user.id });
    const [board] = await db.select().from(boards).where(eq(boards.id, req.params.id));
    const url = `${deps.publicUrl}/boards/invitations/accept?token=${token}`;
    await deps.mailer.send(body.email, invitationMail(user.displayName, board.name, body.role, url)).catch(deps.log);
    await deps.notifyInvited?.({ email: body.email, board: { id: board.id, name: board.name }, inviter: user, role: body.role });
    res.status(201).json({ id: invitation.id, email: invitation.email, role: invitation.role, expiresAt: invitation.expiresAt.toISOString(), invitedBy: user.displayName });
  });
  router.delete('/:id/invitations/:invitationId', async (req, res) => {
    await requireBoardRole(db, req.params.id, requireUser(req).id, 'owner');
    await service.revokeInvitation(db, req.params.id, requireUuid(req.params.invitationId, 'invitation'));
    res.status(204).end();
  });

  router.patch('/:id/members/:userId', async (req, res) => {
    await requireBoardRole(db, req.params.id, requireUser(req).id, 'owner');
    const { role } = parseBody(memberRoleBody, req.body);
    const target = await memberRole(db, req.params.id, req.params.userId);
    if (target === 'owner') throw new HttpError(409, 'conflict', "The owner's role cannot be changed.");
    await db.update(boardMembers).set({ role }).where(and(eq(boardMembers.boardId, req.params.id), eq(boardMembers.userId, req.params.userId)));
    deps.accessEvents.emit('changed', { boardId: req.params.id, userId: req.params.userId });
    res.json(await service.boardDetail(db, req.params.id, 'owner'));
  });
  // The owner removes a member; any other member may remove themselves (leave the board).
  router.delete('/:id/members/:userId', async (req, res) => {
    const user = requireUser(req);
    const leaving = req.params.userId === user.id;
    await requireBoardRole(db, req.params.id, user.id, leaving ? 'viewer' : 'owner');
    const target = await memberRole(db, req.params.id, req.params.userId);
    if (target === 'owner') throw new HttpError(409, 'conflict', 'The owner cannot leave their own board; archive it instead.');
    await db.delete(boardMembers).where(and(eq(boardMembers.boardId, req.params.id), eq(boardMembers.userId, req.params.userId)));
    deps.accessEvents.emit('changed', { boardId: req.params.id, userId: req.params.userId });
    res.status(204).end();
  });

  router.post('/:id/designs/batch', createDesignsBatch(db));
  router.post('/:id/designs', async (req, res) => {
    const user = requireUser(req);
    await requireBoardRole(db, req.params.id, user.id, 'editor');
    const body = parseBody(createDesignBody, req.body);
    const design = await createDesign(db, { boardId: req.params.id, title: body.title, preset: body.preset, file: body.file, createdBy: user.id });
    res.status(201).json({ id: design.id });
  });
  return router;
}

async function memberRole(db: Db, boardId: string, userId: string) {
  const [row] = isUuid(userId)
    ? await db.select().from(boardMembers).where(and(eq(boardMembers.boardId, boardId), eq(boardMembers.userId, userId)))
    : [];
  if (!row) throw notFound('member');
  return row.role;
}

export function invitationsRouter(deps: BoardsRouterDeps): Router {
  const router = Router();
  router.post('/accept', async (req, res) => {
    const user = requireUser(req);
    const boardId = await service.acceptInvitation(deps.db, user, parseBody(acceptInvitationBody, req.body).token);
    res.json({ boardId });
  });
  return router;
}
