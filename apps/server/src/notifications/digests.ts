import { and, asc, eq, inArray, isNull, lt, or, sql } from 'drizzle-orm';
import { notificationSettings, notifications, users } from '../../../../db/schema';
import type { Db } from '../database/database';
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
 */
export async function sendDueDigests(deps: DigestDeps, now = new Date()): Promise<number> {
  const { db } = deps;
  const due = await db
    .select({ userId: notificationSettings.userId, email: users.email, name: users.displayName })
    .from(notificationSettings)
    .innerJoin(users, eq(users.id, notificationSettings.userId))
    .where(
      and(
        eq(notificationSettings.email, 'digest'),
        isNull(users.suspendedAt),
        or(isNull(notificationSettings.lastDigestAt), lt(notificationSettings.lastDigestAt, new Date(now.getTime() - DIGEST_INTERVAL_MS))),
        sql`exists (select 1 from ${notifications} where ${notifications.userId} = ${notificationSettings.userId} and ${notifications.digestPending})`,
      ),
    );
  let sent = 0;
  for (const member of due) {
    const pending = await db
      .select()
      .from(notifications)
      .where(and(eq(notifications.userId, member.userId), eq(notifications.digestPending, true), shownNotifications))
      .orderBy(asc(notifications.createdAt));
    if (!pending.length) continue; // all that waits is about items hidden meanwhile
    const lines = pending.slice(-DIGEST_MAX_LINES).map((n) => describeNotification(n).text);
    const unsubscribe = unsubscribeUrl(deps.publicUrl, deps.secret, member.userId);
    await deps.mailer.send(member.email, digestMail(member.name, lines, { open: `${deps.publicUrl}/notifications`, unsubscribe }));
    await db.update(notifications).set({ digestPending: false }).where(inArray(notifications.id, pending.map((n) => n.id)));
    await db.update(notificationSettings).set({ lastDigestAt: now }).where(eq(notificationSettings.userId, member.userId));
    sent++;
  }
  return sent;
}
