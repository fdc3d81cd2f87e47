import { createHash, randomBytes } from 'node:crypto';
import { and, count, desc, eq, gt, inArray, isNull } from 'drizzle-orm';
import type { BoardDetail, BoardInvitation, BoardMember, BoardRole, BoardSummary } from '@barwright/contracts';
import { boardInvitations, boardMembers, boards, designs, users, type BoardRow, type UserRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { HttpError, notFound } from '../http/http-error';
import { listBoardDesigns, toDesignSummary } from '../designs/designs-service';

export const INVITATION_LIFETIME_MS = 7 * 86_400_000;
const sha256 = (token: string) => createHash('sha256').update(token).digest('hex');

export async function createBoard(db: Db, owner: UserRow, name: string): Promise<BoardRow> {
  return db.transaction(async (tx) => {
    const [board] = await tx.insert(boards).values({ name, ownerId: owner.id }).returning();
    await tx.insert(boardMembers).values({ boardId: board.id, userId: owner.id, role: 'owner' });
    return board;
  });
}

/** The boards a user belongs to, with their role, split by who owns them. */
export async function listBoards(db: Db, userId: string): Promise<{ mine: BoardSummary[]; shared: BoardSummary[] }> {
  const rows = await db
    .select({ board: boards, role: boardMembers.role, ownerName: users.displayName })
    .from(boardMembers)
    .innerJoin(boards, eq(boards.id, boardMembers.boardId))
    .innerJoin(users, eq(users.id, boards.ownerId))
    .where(eq(boardMembers.userId, userId))
    .orderBy(desc(boards.updatedAt));
  const ids = rows.map((r) => r.board.id);
  const counts = ids.length
    ? await db
        .select({ boardId: designs.boardId, n: count() })
        .from(designs)
        .where(and(inArray(designs.boardId, ids), isNull(designs.deletedAt)))
        .groupBy(designs.boardId)
    : [];
  const countOf = new Map(counts.map((c) => [c.boardId, c.n]));
  const summaries = rows.map((r) => toSummary(r.board, r.role, r.ownerName, countOf.get(r.board.id) ?? 0));
  return { mine: summaries.filter((s) => s.role === 'owner'), shared: summaries.filter((s) => s.role !== 'owner') };
}

const toSummary = (b: BoardRow, role: BoardRole, ownerName: string, designCount: number): BoardSummary => ({
  id: b.id,
  name: b.name,
  role,
  ownerName,
  archived: b.archivedAt !== null,
  designCount,
  updatedAt: b.updatedAt.toISOString(),
});

export async function boardDetail(db: Db, boardId: string, role: BoardRole): Promise<BoardDetail> {
  const [row] = await db
    .select({ board: boards, ownerName: users.displayName })
    .from(boards)
    .innerJoin(users, eq(users.id, boards.ownerId))
    .where(eq(boards.id, boardId));
  if (!row) throw notFound('board');
  const rows = await db
    .select({ userId: users.id, displayName: users.displayName, email: users.email, role: boardMembers.role })
    .from(boardMembers)
    .innerJoin(users, eq(users.id, boardMembers.userId))
    .where(eq(boardMembers.boardId, boardId))
    .orderBy(users.displayName);
  // Addresses go to the owner, who invites and removes by them; other members see names only.
  const members: BoardMember[] = rows.map(({ email, ...member }) => (role === 'owner' ? { ...member, email } : member));
  const invitations: BoardInvitation[] =
    role === 'owner'
      ? (
          await db
            .select({ inv: boardInvitations, by: users.displayName })
            .from(boardInvitations)
            .innerJoin(users, eq(users.id, boardInvitations.invitedBy))
            .where(and(eq(boardInvitations.boardId, boardId), isNull(boardInvitations.acceptedAt), isNull(boardInvitations.revokedAt), gt(boardInvitations.expiresAt, new Date())))
        ).map(({ inv, by }) => ({ id: inv.id, email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString(), invitedBy: by }))
      : [];
  const list = await listBoardDesigns(db, boardId, role === 'owner');
  return {
    ...toSummary(row.board, role, row.ownerName, list.filter((d) => !d.deletedAt).length),
    members,
    invitations,
    designs: list.map(toDesignSummary),
  };
}

export async function createInvitation(db: Db, input: { boardId: string; email: string; role: 'editor' | 'viewer'; invitedBy: string }) {
  const [member] = await db
    .select({ id: users.id })
    .from(boardMembers)
    .innerJoin(users, eq(users.id, boardMembers.userId))
    .where(and(eq(boardMembers.boardId, input.boardId), eq(users.email, input.email)));
  if (member) throw new HttpError(409, 'conflict', `${input.email} is already a member of this board.`, { email: 'is already a member' });
  const token = randomBytes(32).toString('base64url');
  const [invitation] = await db
    .insert(boardInvitations)
    .values({ ...input, tokenHash: sha256(token), expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS) })
    .returning();
  return { invitation, token };
}

/** Accepts an invitation for the signed-in user, once; the invitation must be addressed to their e-mail. */
export async function acceptInvitation(db: Db, user: UserRow, token: string): Promise<string> {
  return db.transaction(async (tx) => {
    const [inv] = await tx.select().from(boardInvitations).where(eq(boardInvitations.tokenHash, sha256(token)));
    if (!inv || inv.acceptedAt || inv.revokedAt || inv.expiresAt <= new Date()) {
      throw new HttpError(400, 'invalid_token', 'This invitation is used, withdrawn or expired. Ask the board owner for a new one.');
    }
    if (inv.email !== user.email) {
      throw new HttpError(403, 'forbidden', `This invitation was sent to ${inv.email}. Sign in with that address to accept it.`);
    }
    await tx.update(boardInvitations).set({ acceptedAt: new Date() }).where(eq(boardInvitations.id, inv.id));
    await tx.insert(boardMembers).values({ boardId: inv.boardId, userId: user.id, role: inv.role }).onConflictDoNothing();
    return inv.boardId;
  });
}

/** Withdraws an open invitation of this board; 404 when the board has no invitation with that id. */
export async function revokeInvitation(db: Db, boardId: string, invitationId: string): Promise<void> {
  const revoked = await db
    .update(boardInvitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(boardInvitations.id, invitationId), eq(boardInvitations.boardId, boardId)))
    .returning({ id: boardInvitations.id });
  if (revoked.length === 0) throw notFound('invitation');
}
