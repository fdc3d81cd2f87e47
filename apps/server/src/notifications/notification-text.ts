import type { Notification } from '@barwright/contracts';
import type { NotificationRow } from '../../../../db/schema';

const quoted = (title?: string) => `“${title ?? 'a bar'}”`;

type ItemData = Pick<NotificationRow['data'], 'itemKind' | 'entryTitle'>;

/** "bar “Sine 24”", "comment on “Sine 24”", "photo on “Sine 24”". */
const itemOf = (d: ItemData) => (d.itemKind === 'comment' || d.itemKind === 'photo' ? `${d.itemKind} on ${quoted(d.entryTitle)}` : `bar ${quoted(d.entryTitle)}`);
const itemLink = (d: ItemData, entryLink: string) => (d.itemKind === 'comment' ? `${entryLink}#comments` : entryLink);

/** The moderator's words as one sentence: a final full stop added when they end without one. */
const sentence = (words: string) => (/[.!?…]$/.test(words.trim()) ? words.trim() : `${words.trim()}.`);

/** The sentence and the app link of a notification (pure; the words are kept from the moment it happened). */
export function describeNotification(row: Pick<NotificationRow, 'kind' | 'data' | 'entryId' | 'boardId'>): { text: string; link: string } {
  const who = row.data.actorName ?? 'Someone';
  const entryLink = `/entries/${row.entryId}`;
  switch (row.kind) {
    case 'remix':
      return { text: `${who} remixed your bar ${quoted(row.data.entryTitle)}.`, link: entryLink };
    case 'rating':
      return { text: `${who} rated your bar ${quoted(row.data.entryTitle)}: ${row.data.stars} of 5 stars.`, link: entryLink };
    case 'comment':
      return { text: `${who} commented on your bar ${quoted(row.data.entryTitle)}.`, link: `${entryLink}#comments` };
    case 'invitation':
      return {
        text: `${who} invited you to the board ${quoted(row.data.boardName)} as ${row.data.role === 'editor' ? 'an editor' : 'a viewer'}. Accept with the link in the invitation e-mail.`,
        link: '/boards',
      };
    case 'vote-opened':
      return { text: `${who} asks on the board ${quoted(row.data.boardName)}: ${quoted(row.data.question)} Answer before it closes.`, link: `/boards/${row.boardId}/votes/${row.data.voteId}` };
    case 'item-hidden':
      return {
        text: `${who} hid your ${itemOf(row.data)}. ${row.data.reason ? `Reason: ${sentence(row.data.reason)} ` : ''}Others no longer see it; you still do, and it is not deleted.`,
        link: itemLink(row.data, entryLink),
      };
    case 'item-restored':
      return { text: `${who} restored your ${itemOf(row.data)}: everyone sees it again.`, link: itemLink(row.data, entryLink) };
    case 'entry-featured':
      return { text: `${who} featured your bar ${quoted(row.data.entryTitle)} in the showcase${row.data.note ? `: ${quoted(row.data.note)}` : '.'}`, link: entryLink };
    case 'vote-closed':
      return { text: `The vote ${quoted(row.data.question)} on the board ${quoted(row.data.boardName)} has closed: see the ranking.`, link: `/boards/${row.boardId}/votes/${row.data.voteId}` };
  }
}

export function toNotification(row: NotificationRow): Notification {
  return {
    id: row.id,
    kind: row.kind,
    ...describeNotification(row),
    actor: row.actorId ? { id: row.actorId, displayName: row.data.actorName ?? '' } : null,
    entryId: row.entryId,
    boardId: row.boardId,
    read: row.readAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
