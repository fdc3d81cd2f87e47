import { AUDIT_ACTION_LABELS, type AuditEntry } from '@barwright/contracts';

/** One audit entry as a sentence: "Tobias hid comment on “Sine 24” (by Ilse)", "Odile changed the role of Maren: member → moderator". */
export function auditSentence(e: AuditEntry): string {
  const verb = AUDIT_ACTION_LABELS[e.action];
  const by = e.subject && e.target.kind !== 'user' ? ` (by ${e.subject.displayName})` : '';
  switch (e.action) {
    case 'showcase.reorder':
      return `${e.actor.displayName} ${verb}`;
    case 'user.role':
      return `${e.actor.displayName} ${verb} ${e.target.label}: ${e.details['from'] ?? 'new account'} → ${e.details['to']}`;
    case 'report.dismiss': {
      const n = Number(e.details['reports'] ?? 0);
      return `${e.actor.displayName} dismissed ${n === 1 ? 'the report' : `${n} reports`} on ${e.target.label}${by}`;
    }
    default:
      return `${e.actor.displayName} ${verb} ${e.target.label}${by}`;
  }
}

/** Where the web app shows what an entry is about, if anywhere still. */
export function auditLink(e: AuditEntry): string | null {
  if (e.target.kind === 'entry' && e.target.id) return `/entries/${e.target.id}`;
  const entryId = e.details['entryId'];
  if ((e.target.kind === 'comment' || e.target.kind === 'photo') && typeof entryId === 'string') return `/entries/${entryId}`;
  return null;
}
