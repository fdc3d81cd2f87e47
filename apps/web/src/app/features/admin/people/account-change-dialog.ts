import type { MatDialog } from '@angular/material/dialog';
import { ADMIN_REASON_MAX } from '@barwright/contracts';
import { askReason } from '../../../shared/reason-dialog/reason-dialog';
import { accountChangeWording, type AccountChange } from './account-change-wording';

export interface AccountChangeRequest {
  name: string;
  email: string;
  change: AccountChange;
}

/** Confirms a change of role or suspension and takes its reason for the audit log; resolves the reason, or null when cancelled. */
export function askAccountChange(dialog: MatDialog, request: AccountChangeRequest): Promise<string | null> {
  return askReason(dialog, {
    wording: accountChangeWording(request.name, request.email, request.change),
    max: ADMIN_REASON_MAX,
    testIds: { field: 'account-change-reason', cancel: 'account-change-cancel', confirm: 'account-change-confirm' },
  });
}
