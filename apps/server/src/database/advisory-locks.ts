import { sql } from 'drizzle-orm';
import type { Db } from './database';

/**
 * First keys of the PostgreSQL advisory locks that make work happen once across instances
 * (pg_advisory_lock(key, 0) or pg_advisory_xact_lock(key, hashtext(id))). PGlite takes them too,
 * trivially: it has one connection.
 */
export const ADVISORY_LOCKS = {
  /** Held while the migrations run: instances starting together wait for the first. */
  migrations: 7401,
  /** With the member (hashtext of the user id): one digest at a time per member. */
  digest: 7402,
  /** With the design (hashtext of the design id): one compaction at a time per design. */
  compaction: 7403,
  /** With the uploader (hashtext of the user id): the day's photo allowance is counted and used in one step. */
  photoAllowance: 7301,
  /** With the member (hashtext of the user id): one change of the rack's rosette count or measured readings (add, change, import) at a time. */
  rack: 7501,
  /** With the member (hashtext of the user id): a saved sweep is counted and stored in one step. */
  sweeps: 7502,
  /** With the board (hashtext of the board id): the day's votes are counted and one opened in one step. */
  votes: 7503,
} as const;

/** Waits for the transaction-scoped lock (key, hashtext(id)); it is released when the transaction ends. */
export async function advisoryXactLock(tx: Pick<Db, 'execute'>, key: number, id: string): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(${key}, hashtext(${id}))`);
}

/** Takes the transaction-scoped lock (key, hashtext(id)) if free; false when another transaction holds it. */
export async function tryAdvisoryXactLock(tx: Pick<Db, 'execute'>, key: number, id: string): Promise<boolean> {
  const result = (await tx.execute(sql`select pg_try_advisory_xact_lock(${key}, hashtext(${id})) as locked`)) as unknown as { rows: { locked: boolean }[] };
  return result.rows[0]?.locked === true;
}
