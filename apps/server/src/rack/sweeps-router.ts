import { Router } from 'express';
import { and, desc, eq, sql } from 'drizzle-orm';
import { chosenRosettes, sweepBody, sweepCountProblem, SWEEP_LIMITS, type SavedSweep, type CandidateKey, type SweepChoices, type SweepSummary } from '@barwright/contracts';
import { savedSweeps } from '../../../../db/schema';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';
import { ADVISORY_LOCKS, advisoryXactLock } from '../database/advisory-locks';
import { parseBody } from '../http/validate';
import { ownRosettesAmong, rackRosetteRows } from './rack-service';

type Row = typeof savedSweeps.$inferSelect;

const toSaved = (row: Row): SavedSweep => ({
  id: row.id,
  name: row.name,
  choices: row.choices,
  shortlist: row.shortlist,
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

/**
 * How many rosettes the choices take from the member's rack: picked ones must all be theirs, and the
 * whole sweep must stay within SWEEP_MAX_CANDIDATES (400 naming the field and how to narrow it).
 */
async function sweepBars(db: Db, ownerId: string, choices: SweepChoices, shortlist: readonly CandidateKey[] = []): Promise<number> {
  const pick = choices.rosettes;
  if (pick.by === 'picked') {
    const own = new Set((await ownRosettesAmong(db, ownerId, pick.ids)).map((r) => r.id));
    const i = pick.ids.findIndex((id) => !own.has(id.toLowerCase()));
    if (i >= 0) throw new HttpError(400, 'invalid_input', 'A picked rosette is not on your rack.', { [`choices.rosettes.ids[${i}]`]: 'is not a rosette of your rack' });
  }
  const taken = pick.by === 'picked' ? pick.ids.map((id) => id.toLowerCase()) : chosenRosettes(choices, await rackRosetteRows(db, ownerId)).map((r) => r.id);
  const problem = sweepCountProblem(choices, taken.length);
  if (problem) throw new HttpError(400, 'invalid_input', problem, { choices: problem });
  // A shortlist key names a candidate of this sweep: never a rosette it does not take (another member's included).
  const inSweep = new Set(taken);
  const fields: Record<string, string> = {};
  shortlist.forEach((key, i) => {
    if (!inSweep.has(key.rosetteId.toLowerCase())) fields[`shortlist[${i}].rosetteId`] = 'is not a rosette this sweep takes from your rack';
  });
  if (Object.keys(fields).length) throw new HttpError(400, 'invalid_input', 'Some shortlisted candidates are not in this sweep.', fields);
  return taken.length * choices.rubbers.length * choices.travels.length * choices.cutters.length;
}

async function ownSweep(db: Db, ownerId: string, id: string): Promise<Row> {
  const [row] = isUuid(id) ? await db.select().from(savedSweeps).where(and(eq(savedSweeps.id, id), eq(savedSweeps.ownerId, ownerId))) : [];
  if (!row) throw notFound('sweep');
  return row;
}

/** Saved sweeps at /api/rack/sweeps: their choices and shortlists (results are recomputed), the member's own only. */
export function sweepsRouter({ db }: { db: Db }): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    const rows = await db.select().from(savedSweeps).where(eq(savedSweeps.ownerId, requireUser(req).id)).orderBy(desc(savedSweeps.updatedAt));
    res.json(rows.map((r): SweepSummary => ({ id: r.id, name: r.name, candidates: r.candidates, shortlisted: r.shortlist.length, updatedAt: r.updatedAt.toISOString() })));
  });
  router.post('/', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(sweepBody, req.body);
    const candidates = await sweepBars(db, user.id, body.choices, body.shortlist);
    const row = await db.transaction(async (tx) => {
      // Counted and stored in one step, so requests sent together cannot all pass the count.
      await advisoryXactLock(tx, ADVISORY_LOCKS.sweeps, user.id);
      const [{ n }] = await tx.select({ n: sql<number>`count(*)::int` }).from(savedSweeps).where(eq(savedSweeps.ownerId, user.id));
      if (n >= SWEEP_LIMITS.saved) throw new HttpError(400, 'invalid_input', `You can keep at most ${SWEEP_LIMITS.saved} sweeps; delete some first.`, { sweeps: `at most ${SWEEP_LIMITS.saved} saved sweeps` });
      const [inserted] = await tx.insert(savedSweeps).values({ ownerId: user.id, name: body.name, choices: body.choices, shortlist: body.shortlist, candidates }).returning();
      return inserted;
    });
    res.status(201).json(toSaved(row));
  });
  router.get('/:id', async (req, res) => {
    res.json(toSaved(await ownSweep(db, requireUser(req).id, req.params.id)));
  });
  router.put('/:id', async (req, res) => {
    const user = requireUser(req);
    const row = await ownSweep(db, user.id, req.params.id);
    const body = parseBody(sweepBody, req.body);
    const candidates = await sweepBars(db, user.id, body.choices, body.shortlist);
    const [updated] = await db
      .update(savedSweeps)
      .set({ name: body.name, choices: body.choices, shortlist: body.shortlist, candidates, updatedAt: new Date() })
      .where(eq(savedSweeps.id, row.id))
      .returning();
    if (!updated) throw notFound('sweep'); // deleted while this change was checked
    res.json(toSaved(updated));
  });
  router.delete('/:id', async (req, res) => {
    const row = await ownSweep(db, requireUser(req).id, req.params.id);
    await db.delete(savedSweeps).where(eq(savedSweeps.id, row.id));
    res.status(204).end();
  });
  return router;
}
