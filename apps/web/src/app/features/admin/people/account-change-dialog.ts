import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { ADMIN_REASON_MAX } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { fieldMessage } from '../../../shared/forms/field-message';
import { accountChangeWording, type AccountChange } from './account-change-wording';

export interface AccountChangeRequest {
  name: string;
  email: string;
  change: AccountChange;
}

/** Confirms a change of role or suspension and takes its reason for the audit log; closes with the reason, or nothing when cancelled. */
@Component({
  selector: 'bw-account-change-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 mat-dialog-title>{{ wording.title }}</h2>
    <mat-dialog-content>
      <p class="bw-muted">{{ wording.message }}</p>
      <form id="account-change-form" (submit)="$event.preventDefault(); confirm()" novalidate>
        <mat-form-field class="words">
          <mat-label>{{ wording.label }}</mat-label>
          <textarea matInput [formControl]="reason" rows="3" [attr.maxlength]="max" data-testid="account-change-reason"></textarea>
          <mat-error>{{ fieldMessage('The reason', reason.errors) }}</mat-error>
        </mat-form-field>
      </form>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <!-- Bare mat-dialog-close would close with "", which reads as a confirmation without a reason. -->
      <button mat-button type="button" [mat-dialog-close]="undefined" data-testid="account-change-cancel">Cancel</button>
      <button mat-flat-button type="submit" form="account-change-form" [class.danger]="wording.danger" data-testid="account-change-confirm">{{ wording.confirm }}</button>
    </mat-dialog-actions>
  `,
  styles: `
    .words {
      width: 100%;
    }
    .danger {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AccountChangeDialog {
  private readonly request = inject<AccountChangeRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<AccountChangeDialog, string>>(MatDialogRef);
  protected readonly wording = accountChangeWording(this.request.name, this.request.email, this.request.change);
  protected readonly max = ADMIN_REASON_MAX;
  protected readonly reason = new FormControl('', {
    nonNullable: true,
    validators: [Validators.maxLength(ADMIN_REASON_MAX), ...(this.wording.required ? [Validators.required] : [])],
  });
  protected readonly fieldMessage = fieldMessage;

  protected confirm(): void {
    this.reason.setValue(this.reason.value.trim());
    if (this.reason.invalid) {
      this.reason.markAsTouched();
      return;
    }
    this.ref.close(this.reason.value);
  }
}

/** Opens the dialog; resolves the reason given (maybe empty when optional), or null when cancelled. */
export async function askAccountChange(dialog: MatDialog, request: AccountChangeRequest): Promise<string | null> {
  const ref = dialog.open<AccountChangeDialog, AccountChangeRequest, string>(AccountChangeDialog, { data: request, width: '30rem', maxWidth: 'calc(100vw - 2rem)', autoFocus: 'first-tabbable' });
  return (await firstValueFrom(ref.afterClosed())) ?? null;
}
