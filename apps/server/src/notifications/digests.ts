import { and, eq, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import { notificationSettings, notifications, users } from '../../../../db/schema';
import type { Db } from '../database/database';
import { ADVISORY_LOCKS, tryAdvisoryXactLock } from '../database/advisory-locks';
import type { Mailer } from '../mail/mailer';
import { digestMail } from './notification-mails';
import { describeNotification } from './notification-text';
import { unsubscribeUrl } from './unsubscribe-token';
import { shownNotifications } from '../moderation/hidden-visibility';

/** At most one digest a day per member. */
export const DIGEST_INTERVAL_MS = 24 * 3600_000;
/** How often main.ts looks for digests that are due. */
export const DIGEST_CHECK_MS = 3600_000;
const DIGEST_MAX_LINES = 50;

export interface DigestDeps {
  db: Db;
  mailer: Mailer;
  publicUrl: string;
  secret: string;
}

/**
 * Sends each member in digest mode whose last digest is a day old (or who never had one) one
 * e-mail listing their waiting notifications, then marks those as sent. Returns how many went out.
 * Safe to run on several instances at once: each member's digest is claimed before it is sent.
 */
export async function sendDueDigests(deps: DigestDeps, now = new Date()): Promise<number> {
  const { db } = deps;
  const cutoff = new Date(now.getTime() - DIGEST_INTERVAL_MS);
  const due = await db
    .select({ userId: notificationSettings.userId, email: users.email, name: users.displayName, lastDigestAt: notificationSettings.lastDigestAt })
    .from(notificationSettings)
    .innerJoin(users, eq(users.id, notificationSettings.userId))
    .where(
      and(
        eq(notificationSettings.email, 'digest'),
        isNull(users.suspendedAt),
        or(isNull(notificationSettings.lastDigestAt), lt(notificationSettings.lastDigestAt, cutoff)),
        sql`exists (select 1 from ${notifications} where ${notifications.userId} = ${notificationSettings.userId} and ${notifications.digestPending})`,
      ),
    );
  let sent = 0;
  for (const member of due) {
    const pending = await claimDigest(db, member.userId, now, cutoff);
    if (!pending?.length) continue; // claimed by another run, or all that waits is about items hidden meanwhile
    const lines = pending.slice(-DIGEST_MAX_LINES).map((n) => describeNotification(n).text);
    const unsubscribe = unsubscribeUrl(deps.publicUrl, deps.secret, member.userId);
    try {
      await deps.mailer.send(member.email, digestMail(member.name, lines, { open: `${deps.publicUrl}/notifications`, unsubscribe }));
    } catch (error) {
      // Not sent: hand the claim back, so the next check tries again.
      await db.update(notifications).set({ digestPending: true }).where(inArray(notifications.id, pending.map((n) => n.id)));
      await db.update(notificationSettings).set({ lastDigestAt: member.lastDigestAt }).where(eq(notificationSettings.userId, member.userId));
      throw error;
    }
    sent++;
  }
  return sent;
}

class NothingToClaim extends Error {}

/**
 * Claims one member's digest in one short transaction: an advisory lock on the member (a second run
 * meanwhile skips them), `UPDATE notification_settings … RETURNING` that succeeds only while the
 * digest is still due, and `UPDATE notifications … RETURNING` taking the waiting, shown notifications.
 * Returns them in order, or undefined when there is nothing to send (nothing is changed then).
 */
async function claimDigest(db: Db, userId: string, now: Date, cutoff: Date) {
  try {
    return await db.transaction(async (tx) => {
      if (!(await tryAdvisoryXactLock(tx, ADVISORY_LOCKS.digest, userId))) throw new NothingToClaim();
      const claimed = await tx
        .update(notificationSettings)
        .set({ lastDigestAt: now })
        .where(and(eq(notificationSettings.userId, userId), or(isNull(notificationSettings.lastDigestAt), lt(notificationSettings.lastDigestAt, cutoff))))
        .returning({ userId: notificationSettings.userId });
      if (!claimed.length) throw new NothingToClaim();
      const pending = await tx
        .update(notifications)
        .set({ digestPending: false })
        .where(and(eq(notifications.userId, userId), eq(notifications.digestPending, true), shownNotifications))
        .returning();
      if (!pending.length) throw new NothingToClaim(); // rolls the claim back: the digest stays due
      return pending.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
    });
  } catch (error) {
    if (error instanceof NothingToClaim) return undefined;
    throw error;
  }
}
