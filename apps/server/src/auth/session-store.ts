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
const expiryOf = (sess: session.SessionData) => (sess.cookie?.expires ? new Date(sess.cookie.expires) : new Date(Date.now() + 86_400_000));

/**
 * A rolling session's expiry moves on every request; writing it each time would rewrite the row on
 * every request. It is written only once it has moved this far past the stored one (a 7-day idle
 * timeout is then at most a minute shorter than it would be).
 */
export const TOUCH_AFTER_MS = 60_000;
/** How many sessions' stored expiries are remembered for that (beyond it the oldest are forgotten and simply written again). */
const REMEMBERED_EXPIRIES = 10_000;

/** How often expired sessions are swept. */
export const PRUNE_EVERY_MS = 3600_000;

/** An express-session store in our own database, so sessions survive a restart and can be ended per user. */
export class DatabaseSessionStore extends session.Store {
  /** The expiry last read or written per session id, in insertion order (oldest first). */
  private readonly storedExpiry = new Map<string, number>();

  constructor(private readonly db: Db) {
    super();
  }

  private remember(sid: string, expiresAt: Date) {
    this.storedExpiry.delete(sid);
    this.storedExpiry.set(sid, expiresAt.getTime());
    if (this.storedExpiry.size > REMEMBERED_EXPIRIES) this.storedExpiry.delete(this.storedExpiry.keys().next().value!);
  }

  override get(sid: string, callback: Callback<session.SessionData | null>): void {
    settle(async () => {
      const [row] = await this.db.select().from(sessions).where(eq(sessions.sid, sid));
      if (!row || row.expiresAt <= new Date()) return null;
      this.remember(sid, row.expiresAt);
      return row.data as session.SessionData;
    }, callback);
  }

  override set(sid: string, sess: session.SessionData, callback?: Callback): void {
    const expiresAt = expiryOf(sess);
    const values = { sid, userId: userIdOf(sess), data: sess, expiresAt };
    settle(async () => {
      await this.db.insert(sessions).values(values).onConflictDoUpdate({ target: sessions.sid, set: { userId: values.userId, data: sess, expiresAt } });
      this.remember(sid, expiresAt);
    }, callback);
  }

  override touch(sid: string, sess: session.SessionData, callback?: Callback): void {
    const expiresAt = expiryOf(sess);
    const stored = this.storedExpiry.get(sid);
    if (stored !== undefined && expiresAt.getTime() - stored < TOUCH_AFTER_MS) {
      callback?.();
      return;
    }
    settle(async () => {
      await this.db.update(sessions).set({ expiresAt }).where(eq(sessions.sid, sid));
      this.remember(sid, expiresAt);
    }, callback);
  }

  override destroy(sid: string, callback?: Callback): void {
    this.storedExpiry.delete(sid);
    settle(async () => {
      await this.db.delete(sessions).where(eq(sessions.sid, sid));
    }, callback);
  }

  /** Ends every session of a user at once (suspension, password reset). */
  async destroyUserSessions(userId: string): Promise<void> {
    await this.db.delete(sessions).where(eq(sessions.userId, userId));
  }

  /** Deletes the sessions past their expiry; returns how many. main.ts calls it every PRUNE_EVERY_MS. */
  async pruneExpired(now = new Date()): Promise<number> {
    const gone = await this.db.delete(sessions).where(lt(sessions.expiresAt, now)).returning({ sid: sessions.sid });
    for (const { sid } of gone) this.storedExpiry.delete(sid);
    return gone.length;
  }
}
