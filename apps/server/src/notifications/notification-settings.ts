import { and, eq } from 'drizzle-orm';
import type { EmailMode } from '@barwright/contracts';
import { notificationSettings, notifications } from '../../../../db/schema';
import type { Db } from '../database/database';

/** A member's e-mail mode; `immediate` until they choose. */
export async function emailModeOf(db: Db, userId: string): Promise<EmailMode> {
  const [row] = await db.select({ email: notificationSettings.email }).from(notificationSettings).where(eq(notificationSettings.userId, userId));
  return row?.email ?? 'immediate';
}

export async function setEmailMode(db: Db, userId: string, email: EmailMode): Promise<EmailMode> {
  await db
    .insert(notificationSettings)
    .values({ userId, email })
    .onConflictDoUpdate({ target: notificationSettings.userId, set: { email, updatedAt: new Date() } });
  // Leaving digest mode drops what waited for the digest (the bell still lists it).
  if (email !== 'digest') await db.update(notifications).set({ digestPending: false }).where(and(eq(notifications.userId, userId), eq(notifications.digestPending, true)));
  return email;
}
