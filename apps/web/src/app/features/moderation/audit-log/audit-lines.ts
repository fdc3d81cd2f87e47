import { AUDIT_ACTION_LABELS, type AuditEntry } from '@barwright/contracts';

/** One audit entry as a sentence: "Tobias hid comment on “Sine 24” (by Ilse)", "Odile changed the role of Maren: member → moderator". */
export function auditSentence(e: AuditEntry): string {
  const verb = AUDIT_ACTION_LABELS[e.action];
  const by = e.subject && e.target.kind !== 'user' ? ` (by ${e.subject.displayName})` : '';
  // A bar's title in quotes, as a comment's label ("comment on “Sine 24”") already has it.
  const what = e.target.kind === 'entry' ? `“${e.target.label}”` : e.target.label;
  switch (e.action) {
    case 'showcase.unfeature':
      return `${e.actor.displayName} took ${what} out of the showcase`;
    case 'showcase.reorder':
      return `${e.actor.displayName} ${reorderText(e.details['moves'])}`;
    case 'user.role': {
      const what = e.details['undo'] === true ? 'undid the role change of' : verb;
      return `${e.actor.displayName} ${what} ${e.target.label}: ${e.details['from'] ?? 'new account'} → ${e.details['to']}`;
    }
    case 'report.dismiss': {
      const n = Number(e.details['reports'] ?? 0);
      return `${e.actor.displayName} dismissed ${n === 1 ? 'the report' : `${n} reports`} on ${what}${by}`;
    }
    default:
      return `${e.actor.displayName} ${verb} ${what}${by}`;
  }
}

interface Move {
  title: string;
  from: number;
  to: number;
}

/**
 * "moved “Sine 24” from place 3 to 1 in the showcase", or for several "reordered the showcase: “A” 2 → 1, “B” 1 → 2";
 * a line written before moves were recorded says only "reordered the showcase".
 */
function reorderText(moves: unknown): string {
  const list = Array.isArray(moves) ? (moves as Move[]) : [];
  if (list.length === 1) return `moved “${list[0].title}” from place ${list[0].from} to ${list[0].to} in the showcase`;
  if (list.length === 0) return 'reordered the showcase';
  return `reordered the showcase: ${list.map((m) => `“${m.title}” ${m.from} → ${m.to}`).join(', ')}`;
}

/** What the log calls an item when filtering by it: "the bar “Sine 24”", "comment on “Sine 24”", "the account of Maren". */
export function itemTitle(item: { kind: string; label: string }): string {
  switch (item.kind) {
    case 'entry':
      return `the bar “${item.label}”`;
    case 'user':
      return `the account of ${item.label}`;
    default:
      return item.label;
  }
}

/** Where the web app shows what an entry is about, if anywhere still. */
export function auditLink(e: AuditEntry): string | null {
  if (e.target.kind === 'entry' && e.target.id) return `/entries/${e.target.id}`;
  const entryId = e.details['entryId'];
  if ((e.target.kind === 'comment' || e.target.kind === 'photo') && typeof entryId === 'string') return `/entries/${entryId}`;
  return null;
}
