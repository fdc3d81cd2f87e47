import * as z from 'zod';
import { isoInstant } from './instant';

/**
 * Notifications: in the app (the bell, live over socket.io: see socket-events.ts) and by e-mail.
 * Kinds: remix, rating, comment (on the member's bar), invitation, votes on their boards, and moderation of
 * their own items (item-hidden, item-restored: a bar, comment or photo; entry-featured: a bar put in the showcase).
 *   GET  /api/notifications?limit=&before=      → NotificationList (newest first; `before` an ISO time for the next page)
 *   POST /api/notifications/read                MarkReadBody → { unread }
 *   GET  /api/notifications/settings            → NotificationSettings
 *   PUT  /api/notifications/settings            NotificationSettings → NotificationSettings
 *   GET  /api/notifications/unsubscribe?token=  → { email: 'off' } (no sign-in; the link in every notification e-mail;
 *                                                  a browser asking for HTML gets a short page instead)
 */
export const NOTIFICATION_KINDS = ['remix', 'rating', 'comment', 'invitation', 'vote-opened', 'vote-closed', 'item-hidden', 'item-restored', 'entry-featured'] as const;
export type NotificationKind = (typeof NOTIFICATION_KINDS)[number];

export const EMAIL_MODES = ['immediate', 'digest', 'off'] as const;
export type EmailMode = (typeof EMAIL_MODES)[number];

export interface Notification {
  id: string;
  kind: NotificationKind;
  /** One sentence for the bell and the e-mail: "maren remixed your bar “Sine 24”." */
  text: string;
  /** Where the web app opens it (a path of the app, e.g. `/entries/<id>`). */
  link: string;
  actor: { id: string; displayName: string } | null;
  entryId: string | null;
  boardId: string | null;
  read: boolean;
  createdAt: string;
}

export interface NotificationList {
  items: Notification[];
  unread: number;
}

export const NOTIFICATIONS_PAGE_MAX = 100;
export const notificationListQuery = z.strictObject({
  limit: z.coerce.number({ error: 'must be a number' }).int('must be a whole number').min(1, 'must be at least 1').max(NOTIFICATIONS_PAGE_MAX, `must be at most ${NOTIFICATIONS_PAGE_MAX}`).default(30),
  before: isoInstant().optional(),
});

export const markReadBody = z.union(
  [
    z.strictObject({ ids: z.array(z.uuid('must be notification ids')).min(1, 'needs at least one id').max(500, 'takes at most 500 ids') }),
    z.strictObject({ all: z.literal(true, { error: 'must be true' }) }),
  ],
  { error: 'give ids (a list) or all: true' },
);
export type MarkReadBody = z.input<typeof markReadBody>;

export const notificationSettings = z.strictObject({
  /** immediate: one e-mail per notification; digest: one a day at most; off: none (the bell still shows them). */
  email: z.enum(EMAIL_MODES, { error: `must be one of ${EMAIL_MODES.join(', ')}` }),
});
export type NotificationSettings = z.infer<typeof notificationSettings>;
