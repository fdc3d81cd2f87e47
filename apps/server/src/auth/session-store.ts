import session from 'express-session';
import { eq, lt } from 'drizzle-orm';
import { sessions } from '../../../../db/schema';
import type { Db } from '../database/database';

type Callback<T = void> = (error?: unknown, value?: T) => void;
/** Runs a database call for a callback-style store method; a synchronous throw reaches the callback too. */
function settle<T>(work: () => Promise<T>, callback?: Callback<T>): void {
  Promise.resolve()
    .then(work)
    .then((value) => callback?.(undefined, value), (error) => callback?.(error));
}

const userIdOf = (sess: session.SessionData) => (sess as { passport?: { user?: string } }).passport?.user ?? null;

/** An express-session store in our own database, so sessions survive a restart and can be ended per user. */
export class DatabaseSessionStore extends session.Store {
  constructor(private readonly db: Db) {
    super();
  }

  override get(sid: string, callback: Callback<session.SessionData | null>): void {
    settle(async () => {
      const [row] = await this.db.select().from(sessions).where(eq(sessions.sid, sid));
      return row && row.expiresAt > new Date() ? (row.data as session.SessionData) : null;
    }, callback);
  }

  override set(sid: string, sess: session.SessionData, callback?: Callback): void {
    const expiresAt = sess.cookie?.expires ? new Date(sess.cookie.expires) : new Date(Date.now() + 86_400_000);
    const values = { sid, userId: userIdOf(sess), data: sess, expiresAt };
    settle(async () => {
      await this.db.insert(sessions).values(values).onConflictDoUpdate({ target: sessions.sid, set: { userId: values.userId, data: sess, expiresAt } });
    }, callback);
  }

  override touch(sid: string, sess: session.SessionData, callback?: Callback): void {
    const expiresAt = sess.cookie?.expires ? new Date(sess.cookie.expires) : new Date(Date.now() + 86_400_000);
    settle(async () => {
      await this.db.update(sessions).set({ expiresAt }).where(eq(sessions.sid, sid));
    }, callback);
  }

  override destroy(sid: string, callback?: Callback): void {
    settle(async () => {
      await this.db.delete(sessions).where(eq(sessions.sid, sid));
    }, callback);
  }

  /** Ends every session of a user at once (suspension, password reset). */
  async destroyUserSessions(userId: string): Promise<void> {
    await this.db.delete(sessions).where(eq(sessions.userId, userId));
  }

  async pruneExpired(now = new Date()): Promise<void> {
    await this.db.delete(sessions).where(lt(sessions.expiresAt, now));
  }
}
