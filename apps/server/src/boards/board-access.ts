import { EventEmitter } from 'node:events';
import { and, eq, isNull } from 'drizzle-orm';
import type { BoardRole } from '@barwright/contracts';
import { boardMembers, designs } from '../../../../db/schema';
import type { Db } from '../database/database';
import { forbidden, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';

/** Told whenever someone's role on a board changes or ends, so open sockets follow at once. */
export class BoardAccessEvents extends EventEmitter<{ changed: [{ boardId: string; userId?: string }] }> {}

const RANK: Record<BoardRole, number> = { viewer: 1, editor: 2, owner: 3 };

export async function boardRoleOf(db: Db, boardId: string, userId: string): Promise<BoardRole | undefined> {
  const [row] = await db
    .select({ role: boardMembers.role })
    .from(boardMembers)
    .where(and(eq(boardMembers.boardId, boardId), eq(boardMembers.userId, userId)));
  return row?.role;
}

/**
 * The caller's role on a board, at least `least`. Someone who is not a member gets 404, as if the
 * board did not exist: boards are private, and their names should not leak.
 */
export async function requireBoardRole(db: Db, boardId: string, userId: string, least: BoardRole): Promise<BoardRole> {
  const role = isUuid(boardId) ? await boardRoleOf(db, boardId, userId) : undefined;
  if (!role) throw notFound('board');
  if (RANK[role] < RANK[least]) throw forbidden(`This needs the ${least} role on the board; you are ${role === 'viewer' ? 'a viewer' : `an ${role}`}.`);
  return role;
}

/** The design (not deleted, unless `includeDeleted`) and the caller's role on its board. */
export async function requireDesignRole(db: Db, designId: string, userId: string, least: BoardRole, includeDeleted = false) {
  const [design] = isUuid(designId)
    ? await db
        .select()
        .from(designs)
        .where(includeDeleted ? eq(designs.id, designId) : and(eq(designs.id, designId), isNull(designs.deletedAt)))
    : [];
  if (!design) throw notFound('design');
  const role = await boardRoleOf(db, design.boardId, userId);
  if (!role) throw notFound('design');
  if (RANK[role] < RANK[least]) throw forbidden(`This needs the ${least} role on the board; you are ${role === 'viewer' ? 'a viewer' : `an ${role}`}.`);
  return { design, role };
}

export const atLeast = (role: BoardRole, least: BoardRole) => RANK[role] >= RANK[least];
