import type { MatDialog } from '@angular/material/dialog';
import { MODERATION_REASON_MAX } from '@barwright/contracts';
import { askReason, type ReasonWording } from '../../../shared/reason-dialog/reason-dialog';
import type { Decision } from '../moderation-api';

export interface DecisionRequest {
  decision: Decision;
  /** "the comment on “Sine 24”". */
  itemName: string;
  authorName: string;
}

/** What each decision asks for: hiding and suspending need a reason; the others take an optional note for the log. */
export function wordingFor(r: DecisionRequest): ReasonWording {
  switch (r.decision) {
    case 'hide':
      return { title: `Hide ${r.itemName}?`, message: `Members and visitors no longer see it. ${r.authorName} still does, with your reason beside it. Nothing is deleted; it can be restored.`, label: `Reason, shown to ${r.authorName}`, required: true, confirm: 'Hide', danger: true };
    case 'dismiss':
      return { title: `Dismiss the reports on ${r.itemName}?`, message: 'The item stays as it is; the reports close and stay in its history.', label: 'Note for the audit log (optional)', required: false, confirm: 'Dismiss reports', danger: false };
    case 'restore':
      return { title: `Restore ${r.itemName}?`, message: 'Everyone sees it again, where it was.', label: 'Note for the audit log (optional)', required: false, confirm: 'Restore', danger: false };
    case 'suspend-author':
      return { title: `Suspend ${r.authorName}?`, message: `${r.authorName} is signed out everywhere at once and cannot sign in until an admin restores the account. The item itself stays to be decided.`, label: 'Reason, for the audit log', required: true, confirm: `Suspend ${r.authorName}`, danger: true };
  }
}

/** Asks for the words that go with a decision at the desk; resolves them, or null when cancelled. */
export function askDecision(dialog: MatDialog, request: DecisionRequest): Promise<string | null> {
  return askReason(dialog, {
    wording: wordingFor(request),
    max: MODERATION_REASON_MAX,
    testIds: { field: 'decision-words', cancel: 'decision-cancel', confirm: 'decision-confirm' },
  });
}
