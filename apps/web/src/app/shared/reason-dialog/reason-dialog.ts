import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import { fieldMessage } from '../forms/field-message';

/** The words of one confirmation that takes a reason (a moderator's decision, an admin's change of an account). */
export interface ReasonWording {
  title: string;
  message: string;
  /** The reason field's label: who reads the reason (the author, the audit log). */
  label: string;
  required: boolean;
  confirm: string;
  danger: boolean;
}

export interface ReasonRequest {
  wording: ReasonWording;
  /** The server's limit on the reason, in characters. */
  max: number;
  /** Test ids of the reason field and the two buttons. */
  testIds: { field: string; cancel: string; confirm: string };
}

/** Confirms an action and takes its reason; closes with the reason (maybe empty when optional), or nothing when cancelled. */
@Component({
  selector: 'bw-reason-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 mat-dialog-title>{{ wording.title }}</h2>
    <mat-dialog-content>
      <p class="bw-muted">{{ wording.message }}</p>
      <form id="reason-form" (submit)="$event.preventDefault(); confirm()" novalidate>
        <mat-form-field class="words">
          <mat-label>{{ wording.label }}</mat-label>
          <textarea matInput [formControl]="reason" rows="3" [attr.maxlength]="request.max" [attr.data-testid]="request.testIds.field"></textarea>
          <mat-error>{{ fieldMessage('The reason', reason.errors) }}</mat-error>
        </mat-form-field>
      </form>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <!-- Bare mat-dialog-close would close with "", which reads as a confirmation with an empty reason. -->
      <button mat-button type="button" [mat-dialog-close]="undefined" [attr.data-testid]="request.testIds.cancel">Cancel</button>
      <button mat-flat-button type="submit" form="reason-form" [class.danger]="wording.danger" [attr.data-testid]="request.testIds.confirm">{{ wording.confirm }}</button>
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
export class ReasonDialog {
  protected readonly request = inject<ReasonRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ReasonDialog, string>>(MatDialogRef);
  protected readonly wording = this.request.wording;
  protected readonly reason = new FormControl('', {
    nonNullable: true,
    validators: [Validators.maxLength(this.request.max), ...(this.wording.required ? [Validators.required] : [])],
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
export async function askReason(dialog: MatDialog, request: ReasonRequest): Promise<string | null> {
  const ref = dialog.open<ReasonDialog, ReasonRequest, string>(ReasonDialog, { data: request, width: '30rem', maxWidth: 'calc(100vw - 2rem)', autoFocus: 'first-tabbable' });
  return (await firstValueFrom(ref.afterClosed())) ?? null;
}
