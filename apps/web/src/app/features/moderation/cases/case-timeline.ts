import { AUDIT_ACTION_LABELS, REPORT_REASON_LABELS, type ModerationCase } from '@barwright/contracts';

/** One line of an item's history at the desk: an earlier report or a decision. */
export interface TimelineLine {
  at: string;
  /** "Rita reported it: Spam (dismissed)", "Tobias hid it". */
  text: string;
  /** The words given with it (a reason, a report's details). */
  words: string;
  kind: 'report' | 'action';
}

const STATUS = { open: 'open', dismissed: 'dismissed', upheld: 'upheld' } as const;

/** The item's earlier reports and the audit log's lines about it, newest first, in one list. */
export function caseTimeline(c: Pick<ModerationCase, 'earlierReports' | 'actions'>): TimelineLine[] {
  const reports: TimelineLine[] = c.earlierReports.map((r) => ({
    at: r.createdAt,
    text: `${r.reporter.displayName} reported it: ${REPORT_REASON_LABELS[r.reason]} (${STATUS[r.status]})`,
    words: r.details,
    kind: 'report',
  }));
  const actions: TimelineLine[] = c.actions.map((a) => ({
    at: a.at,
    text: `${a.actor.displayName} ${AUDIT_ACTION_LABELS[a.action]}${a.action === 'report.dismiss' ? '' : ' it'}`,
    words: a.reason ?? '',
    kind: 'action',
  }));
  return [...reports, ...actions].sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
}

/** "2 reports by 2 members" for a case's heading. */
export function reportsSummary(c: Pick<ModerationCase, 'openReports'>): string {
  const n = c.openReports.length;
  const people = new Set(c.openReports.map((r) => r.reporter.id)).size;
  if (n === 0) return 'No open reports';
  return `${n} open report${n === 1 ? '' : 's'}${people > 1 ? ` by ${people} members` : ''}`;
}

/** How the desk names an item: "Comment on “Sine 24”", "Bar “Sine 24”", "Photo on “Sine 24”". */
export function itemName(c: Pick<ModerationCase, 'item'>): string {
  const title = `“${c.item.entryTitle}”`;
  switch (c.item.target.kind) {
    case 'entry':
      return `Bar ${title}`;
    case 'comment':
      return `Comment on ${title}`;
    case 'photo':
      return `Photo on ${title}`;
  }
}

/** The same in the middle of a sentence: "the comment on “Sine 24”". */
export function itemPhrase(c: Pick<ModerationCase, 'item'>): string {
  const name = itemName(c);
  return `the ${name.charAt(0).toLowerCase()}${name.slice(1)}`;
}
