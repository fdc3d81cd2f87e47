import type { Notification, NotificationKind } from '@barwright/contracts';

/** The list with `arrived` merged in: no duplicates (a live one may also come by REST), newest first (pure). */
export function mergeNotifications(list: readonly Notification[], arrived: readonly Notification[]): Notification[] {
  const byId = new Map<string, Notification>();
  for (const n of [...list, ...arrived]) byId.set(n.id, n);
  return [...byId.values()].sort((a, b) => b.createdAt.localeCompare(a.createdAt) || b.id.localeCompare(a.id));
}

/** The list after marking some read (or all, without ids) (pure). */
export function markedRead(list: readonly Notification[], ids?: readonly string[]): Notification[] {
  return list.map((n) => (!ids || ids.includes(n.id) ? { ...n, read: true } : n));
}

export const KIND_ICONS: Readonly<Record<NotificationKind, string>> = {
  remix: 'call_split',
  rating: 'star',
  comment: 'chat_bubble_outline',
  invitation: 'group_add',
  'vote-opened': 'how_to_vote',
  'vote-closed': 'leaderboard',
  'item-hidden': 'visibility_off',
  'item-restored': 'visibility',
  'entry-featured': 'workspace_premium',
};

export const KIND_LABELS: Readonly<Record<NotificationKind, string>> = {
  remix: 'Remix',
  rating: 'Rating',
  comment: 'Comment',
  invitation: 'Invitation',
  'vote-opened': 'Vote',
  'vote-closed': 'Vote closed',
  'item-hidden': 'Hidden by the moderators',
  'item-restored': 'Restored',
  'entry-featured': 'Featured',
};
