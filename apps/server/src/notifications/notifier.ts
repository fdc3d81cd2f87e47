import { and, count, eq, isNull } from 'drizzle-orm';
import type { NotificationKind } from '@barwright/contracts';
import { notifications, users, type NotificationRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import type { Mailer } from '../mail/mailer';
import { findUserByEmail } from '../auth/users';
import { notificationMail } from './notification-mails';
import type { NotificationEvents } from './notification-events';
import { emailModeOf } from './notification-settings';
import { describeNotification, toNotification } from './notification-text';
import { unsubscribeUrl } from './unsubscribe-token';
import { shownNotifications } from '../moderation/hidden-visibility';

export interface NotifierDeps {
  db: Db;
  mailer: Mailer;
  publicUrl: string;
  /** Signs the unsubscribe links. */
  secret: string;
  events: NotificationEvents;
  log: (error: unknown) => void;
}

export interface NotifyInput {
  userId: string;
  kind: NotificationKind;
  actor: { id: string; displayName: string };
  entry?: { id: string; title: string };
  board?: { id: string; name: string };
  /** The comment told of, so the notification leaves the list while moderation hides it. */
  comment?: { id: string };
  data?: { stars?: number; role?: string; voteId?: string; question?: string; itemKind?: 'bar' | 'comment' | 'photo'; reason?: string; note?: string };
  /** A moderation decision: the member is told "the moderators", not which one (the audit log keeps who). */
  byModerators?: boolean;
}

/** Notifications the member has not read yet (of those shown: none about hidden items). */
export async function unreadCount(db: Db, userId: string): Promise<number> {
  const [{ n }] = await db.select({ n: count() }).from(notifications).where(and(eq(notifications.userId, userId), isNull(notifications.readAt), shownNotifications));
  return n;
}

/**
 * Records a notification, pushes it to the member's open sockets, and e-mails it according to
 * their setting (at once, in the daily digest, or not at all). A failure here is logged and never
 * undoes or fails what caused the notification.
 */
export class Notifier {
  constructor(private readonly deps: NotifierDeps) {}

  unreadCount(userId: string): Promise<number> {
    return unreadCount(this.deps.db, userId);
  }

  async notify(input: NotifyInput): Promise<void> {
    if (input.userId === input.actor.id) return; // nobody is told of their own doings
    try {
      await this.record(input);
    } catch (error) {
      this.deps.log(error);
    }
  }

  /** A board invitation: in the app for a member who already has an account (the invitation e-mail itself goes out as before). */
  async invited(input: { email: string; board: { id: string; name: string }; inviter: { id: string; displayName: string }; role: string }): Promise<void> {
    try {
      const user = await findUserByEmail(this.deps.db, input.email);
      if (user) await this.notify({ userId: user.id, kind: 'invitation', actor: input.inviter, board: input.board, data: { role: input.role } });
    } catch (error) {
      this.deps.log(error);
    }
  }

  private async record(input: NotifyInput) {
    const { db } = this.deps;
    // The invitation has its own e-mail already; the others follow the member's setting.
    const mode = input.kind === 'invitation' ? 'off' : await emailModeOf(db, input.userId);
    const [row] = await db
      .insert(notifications)
      .values({
        userId: input.userId,
        kind: input.kind,
        actorId: input.byModerators ? null : input.actor.id,
        entryId: input.entry?.id ?? null,
        boardId: input.board?.id ?? null,
        commentId: input.comment?.id ?? null,
        data: { actorName: input.byModerators ? 'The moderators' : input.actor.displayName, entryTitle: input.entry?.title, boardName: input.board?.name, ...input.data },
        digestPending: mode === 'digest',
      })
      .returning();
    this.deps.events.emit('created', { userId: input.userId, notification: toNotification(row), unread: await this.unreadCount(input.userId) });
    if (mode === 'immediate') void this.mail(row).catch(this.deps.log);
  }

  private async mail(row: NotificationRow) {
    const [user] = await this.deps.db.select().from(users).where(eq(users.id, row.userId));
    if (!user || user.suspendedAt) return;
    const { text, link } = describeNotification(row);
    await this.deps.mailer.send(user.email, notificationMail(user.displayName, text, { open: this.deps.publicUrl + link, unsubscribe: unsubscribeUrl(this.deps.publicUrl, this.deps.secret, user.id) }));
  }
}
