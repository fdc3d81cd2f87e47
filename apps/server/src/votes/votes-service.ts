import { and, asc, desc, eq, gt, inArray, isNull, lte, sql } from 'drizzle-orm';
import { VOTE_LIMITS, type CreateVoteBody, type Vote, type VotePair, type VoteSummary } from '@barwright/contracts';
import { boardMembers, boards, designs, users, voteAnswers, votes, type VoteRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireBoardRole } from '../boards/board-access';
import { HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';
import { ADVISORY_LOCKS, advisoryXactLock } from '../database/advisory-locks';
import type { Notifier } from '../notifications/notifier';
import { allPairs, rankDesigns, storedPair, type StoredAnswer } from './vote-ranking';
import type { VoteEvents } from './vote-events';

const DAY_MS = 86_400_000;

export interface VotesDeps {
  db: Db;
  notifier: Notifier;
  events: VoteEvents;
}

const toSummary = (row: VoteRow): VoteSummary => ({ id: row.id, boardId: row.boardId, question: row.question, closesAt: row.closesAt.toISOString(), closed: row.closedAt !== null });

/** The vote and the caller's role on its board (any member may see and answer); others get 404. */
export async function requireVote(db: Db, voteId: string, userId: string) {
  const [row] = isUuid(voteId) ? await db.select().from(votes).where(eq(votes.id, voteId)) : [];
  if (!row) throw notFound('vote');
  const role = await requireBoardRole(db, row.boardId, userId, 'viewer').catch(() => {
    throw notFound('vote');
  });
  return { vote: row, role };
}

export class VotesService {
  readonly events: VoteEvents;

  constructor(private readonly deps: VotesDeps) {
    this.events = deps.events;
  }

  /** Owners and editors open votes; other members get 403, strangers 404. */
  async mayOpen(boardId: string, userId: string): Promise<void> {
    await requireBoardRole(this.deps.db, boardId, userId, 'editor');
  }

  async open(boardId: string, user: { id: string; displayName: string }, body: CreateVoteBody): Promise<{ id: string }> {
    const { db } = this.deps;
    await requireBoardRole(db, boardId, user.id, 'editor');
    const ids = body.designIds.map((id) => id.toLowerCase());
    const found = new Set(
      (await db.select({ id: designs.id }).from(designs).where(and(eq(designs.boardId, boardId), isNull(designs.deletedAt), inArray(designs.id, ids)))).map((r) => r.id),
    );
    const fields: Record<string, string> = {};
    ids.forEach((id, i) => {
      if (!found.has(id)) fields[`designIds[${i}]`] = 'is not a design of this board';
    });
    const closesAt = new Date(body.closesAt);
    if (closesAt.getTime() <= Date.now()) fields.closesAt = 'must be in the future';
    else if (closesAt.getTime() > Date.now() + VOTE_LIMITS.maxDays * DAY_MS) fields.closesAt = `must be within ${VOTE_LIMITS.maxDays} days`;
    if (Object.keys(fields).length) throw new HttpError(400, 'invalid_input', `Check the highlighted fields: ${Object.entries(fields).map(([p, m]) => `${p} ${m}`).join('; ')}`, fields);
    const row = await db.transaction(async (tx) => {
      // Every opening tells every member (by e-mail too): a day's openings per board are bounded, counted
      // and used in one step.
      await advisoryXactLock(tx, ADVISORY_LOCKS.votes, boardId);
      const [{ n }] = await tx
        .select({ n: sql<number>`count(*)::int` })
        .from(votes)
        .where(and(eq(votes.boardId, boardId), gt(votes.createdAt, new Date(Date.now() - DAY_MS))));
      if (n >= VOTE_LIMITS.openedPerBoardPerDay) {
        throw new HttpError(429, 'too_many_votes', `A board opens at most ${VOTE_LIMITS.openedPerBoardPerDay} votes a day; try again tomorrow or close and reuse one.`);
      }
      const [inserted] = await tx.insert(votes).values({ boardId, question: body.question, designIds: ids, createdBy: user.id, closesAt }).returning();
      return inserted;
    });
    await this.tellMembers(row, user, 'vote-opened');
    return { id: row.id };
  }

  async list(boardId: string, userId: string): Promise<VoteSummary[]> {
    await requireBoardRole(this.deps.db, boardId, userId, 'viewer');
    const rows = await this.deps.db.select().from(votes).where(eq(votes.boardId, boardId)).orderBy(desc(votes.createdAt));
    return Promise.all(rows.map(async (r) => toSummary(await this.closeIfDue(r))));
  }

  async detail(voteId: string, userId: string): Promise<Vote> {
    const { vote } = await requireVote(this.deps.db, voteId, userId);
    return this.describe(await this.closeIfDue(vote), userId);
  }

  /** The next pair for this member: of the pairs they have not answered, one of the least compared by everyone; undefined when none is left or the vote has closed. */
  async nextPair(voteId: string, userId: string): Promise<VotePair | undefined> {
    const { db } = this.deps;
    const { vote: found } = await requireVote(db, voteId, userId);
    const vote = await this.closeIfDue(found);
    if (vote.closedAt) return undefined; // a closed vote takes no more answers
    const answers = await this.answers(vote.id);
    const mine = new Set(answers.filter((a) => a.userId === userId).map((a) => `${a.lowId} ${a.highId}`));
    const times = new Map<string, number>();
    for (const a of answers) times.set(`${a.lowId} ${a.highId}`, (times.get(`${a.lowId} ${a.highId}`) ?? 0) + 1);
    // A design deleted since the vote opened is no longer shown: its pairs are not asked.
    const live = await this.liveDesigns(vote.designIds);
    const open = allPairs(vote.designIds).filter(([l, h]) => live.has(l) && live.has(h) && !mine.has(`${l} ${h}`));
    if (open.length === 0) return undefined;
    const least = Math.min(...open.map(([l, h]) => times.get(`${l} ${h}`) ?? 0));
    const choices = open.filter(([l, h]) => (times.get(`${l} ${h}`) ?? 0) === least);
    const [l, h] = choices[Math.floor(Math.random() * choices.length)];
    // Either side first, so no design is always shown on the left.
    return Math.random() < 0.5 ? { a: l, b: h } : { a: h, b: l };
  }

  /** Stores (or changes) the member's answer for a pair of the vote; a closed vote refuses it (409). */
  async answer(voteId: string, userId: string, body: { a: string; b: string; pick: 'a' | 'b' | 'tie' }): Promise<Vote> {
    const { db } = this.deps;
    const { vote: found } = await requireVote(db, voteId, userId);
    const vote = await this.closeIfDue(found);
    if (vote.closedAt) throw new HttpError(409, 'vote_closed', 'This vote has closed; answers are no longer taken.');
    const inVote = new Set(vote.designIds);
    const fields: Record<string, string> = {};
    if (!inVote.has(body.a.toLowerCase())) fields.a = 'is not a design of this vote';
    if (!inVote.has(body.b.toLowerCase())) fields.b = 'is not a design of this vote';
    if (body.a.toLowerCase() === body.b.toLowerCase()) fields.b = 'must be another design than a';
    if (Object.keys(fields).length) throw new HttpError(400, 'invalid_input', 'Both designs must be in the vote, and differ.', fields);
    const live = await this.liveDesigns([body.a.toLowerCase(), body.b.toLowerCase()]);
    for (const side of ['a', 'b'] as const) if (!live.has(body[side].toLowerCase())) fields[side] = 'was deleted from the board; its pairs are no longer asked';
    if (Object.keys(fields).length) throw new HttpError(400, 'invalid_input', 'A design of this pair was deleted.', fields);
    const stored = storedPair(body.a, body.b, body.pick);
    await db.transaction(async (tx) => {
      // The vote's row locked while the answer is stored: a close arriving at the same moment waits, and
      // an answer arriving after it finds the vote closed.
      const [locked] = await tx.select({ closedAt: votes.closedAt }).from(votes).where(eq(votes.id, vote.id)).for('update');
      if (locked?.closedAt) throw new HttpError(409, 'vote_closed', 'This vote has closed; answers are no longer taken.');
      await tx
        .insert(voteAnswers)
        .values({ voteId: vote.id, userId, ...stored })
        .onConflictDoUpdate({ target: [voteAnswers.voteId, voteAnswers.userId, voteAnswers.lowId, voteAnswers.highId], set: { pick: stored.pick, answeredAt: new Date() } });
    });
    const detail = await this.describe(vote, userId);
    this.events.emit('ranking', { voteId: vote.id, boardId: vote.boardId, ranking: detail.ranking, answers: detail.answers, closed: false });
    return detail;
  }

  async close(voteId: string, user: { id: string; displayName: string }): Promise<Vote> {
    const { db } = this.deps;
    const { vote, role } = await requireVote(db, voteId, user.id);
    if (role === 'viewer') throw new HttpError(403, 'forbidden', 'This needs the editor role on the board; you are a viewer.');
    const closed = (await this.markClosed(vote, new Date(), user)) ?? vote;
    return this.describe(closed, user.id);
  }

  /** Closes every vote past its closing time (a periodic check; reads close them too). */
  async closeDue(now = new Date()): Promise<number> {
    const due = await this.deps.db.select().from(votes).where(and(isNull(votes.closedAt), lte(votes.closesAt, now)));
    for (const vote of due) await this.closeIfDue(vote);
    return due.length;
  }

  /** Closes a vote whose time has come (once, whoever asks first), telling the members. */
  private async closeIfDue(vote: VoteRow): Promise<VoteRow> {
    if (vote.closedAt || vote.closesAt.getTime() > Date.now()) return vote;
    const [creator] = await this.deps.db.select({ id: users.id, displayName: users.displayName }).from(users).where(eq(users.id, vote.createdBy));
    return (await this.markClosed(vote, vote.closesAt, creator)) ?? (await this.reload(vote.id));
  }

  private async markClosed(vote: VoteRow, at: Date, actor: { id: string; displayName: string }): Promise<VoteRow | undefined> {
    const [row] = await this.deps.db.update(votes).set({ closedAt: at }).where(and(eq(votes.id, vote.id), isNull(votes.closedAt))).returning();
    if (!row) return undefined; // closed already
    const answers = await this.answers(row.id);
    this.events.emit('ranking', { voteId: row.id, boardId: row.boardId, ranking: rankDesigns(row.designIds, answers), answers: answers.length, closed: true });
    await this.tellMembers(row, actor, 'vote-closed');
    return row;
  }

  private async reload(voteId: string): Promise<VoteRow> {
    const [row] = await this.deps.db.select().from(votes).where(eq(votes.id, voteId));
    return row;
  }

  private answers(voteId: string): Promise<(StoredAnswer & { userId: string })[]> {
    return this.deps.db
      .select({ userId: voteAnswers.userId, lowId: voteAnswers.lowId, highId: voteAnswers.highId, pick: voteAnswers.pick })
      .from(voteAnswers)
      .where(eq(voteAnswers.voteId, voteId))
      .orderBy(asc(voteAnswers.answeredAt));
  }

  /** Those of the ids whose designs are not deleted. */
  private async liveDesigns(ids: readonly string[]): Promise<Set<string>> {
    if (!ids.length) return new Set();
    const rows = await this.deps.db.select({ id: designs.id }).from(designs).where(and(inArray(designs.id, [...ids]), isNull(designs.deletedAt)));
    return new Set(rows.map((r) => r.id));
  }

  private async describe(vote: VoteRow, userId: string): Promise<Vote> {
    const { db } = this.deps;
    const [answers, titles, [creator]] = await Promise.all([
      this.answers(vote.id),
      db.select({ id: designs.id, title: designs.title, deletedAt: designs.deletedAt }).from(designs).where(inArray(designs.id, vote.designIds)),
      db.select({ id: users.id, displayName: users.displayName }).from(users).where(eq(users.id, vote.createdBy)),
    ]);
    const titleOf = new Map(titles.map((t) => [t.id, t.deletedAt ? `${t.title} (deleted)` : t.title]));
    // Pairs still asked: those of designs not deleted since the vote opened (answers given before stay in the ranking).
    const live = new Set(titles.filter((t) => !t.deletedAt).map((t) => t.id));
    const n = vote.designIds.filter((id) => live.has(id)).length;
    const isLive = (a: StoredAnswer) => live.has(a.lowId) && live.has(a.highId);
    return {
      ...toSummary(vote),
      designs: vote.designIds.map((id) => ({ id, title: titleOf.get(id) ?? '(deleted design)' })),
      createdBy: creator ?? { id: vote.createdBy, displayName: '' },
      createdAt: vote.createdAt.toISOString(),
      closedAt: vote.closedAt?.toISOString() ?? null,
      answers: answers.length,
      myAnswers: answers.filter((a) => a.userId === userId && isLive(a)).length,
      pairs: (n * (n - 1)) / 2,
      ranking: rankDesigns(vote.designIds, answers),
    };
  }

  /** Tells every member of the board (in the app, and by e-mail as each has chosen); the notifier skips the actor. */
  private async tellMembers(vote: VoteRow, actor: { id: string; displayName: string }, kind: 'vote-opened' | 'vote-closed') {
    const { db, notifier } = this.deps;
    const [board] = await db.select({ id: boards.id, name: boards.name }).from(boards).where(eq(boards.id, vote.boardId));
    const members = await db.select({ userId: boardMembers.userId }).from(boardMembers).where(eq(boardMembers.boardId, vote.boardId));
    for (const m of members) await notifier.notify({ userId: m.userId, kind, actor, board, data: { voteId: vote.id, question: vote.question } });
  }
}
