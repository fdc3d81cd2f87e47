import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MODERATION_REASON_MAX } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { fieldMessage } from '../../../shared/forms/field-message';
import type { Decision } from '../moderation-api';

export interface DecisionRequest {
  decision: Decision;
  /** "the comment on “Sine 24”". */
  itemName: string;
  authorName: string;
}

interface Wording {
  title: string;
  message: string;
  label: string;
  required: boolean;
  confirm: string;
  danger: boolean;
}

/** What each decision asks for: hiding and suspending need a reason; the others take an optional note for the log. */
export function wordingFor(r: DecisionRequest): Wording {
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

/** Asks for the words that go with a decision at the desk; closes with them, or with nothing when cancelled. */
@Component({
  selector: 'bw-decision-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 mat-dialog-title>{{ wording.title }}</h2>
    <mat-dialog-content>
      <p class="bw-muted">{{ wording.message }}</p>
      <form id="decision-form" (submit)="$event.preventDefault(); decide()" novalidate>
        <mat-form-field class="words">
          <mat-label>{{ wording.label }}</mat-label>
          <textarea matInput [formControl]="words" rows="3" [attr.maxlength]="max" data-testid="decision-words"></textarea>
          <mat-error>{{ fieldMessage('The reason', words.errors) }}</mat-error>
        </mat-form-field>
      </form>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <!-- Bare mat-dialog-close would close with "", which reads as going ahead with an empty note. -->
      <button mat-button type="button" [mat-dialog-close]="undefined" data-testid="decision-cancel">Cancel</button>
      <button mat-flat-button type="submit" form="decision-form" [class.danger]="wording.danger" data-testid="decision-confirm">{{ wording.confirm }}</button>
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
export class DecisionDialog {
  private readonly request = inject<DecisionRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<DecisionDialog, string>>(MatDialogRef);
  protected readonly wording = wordingFor(this.request);
  protected readonly max = MODERATION_REASON_MAX;
  protected readonly words = new FormControl('', {
    nonNullable: true,
    validators: [Validators.maxLength(MODERATION_REASON_MAX), ...(this.wording.required ? [Validators.required] : [])],
  });
  protected readonly fieldMessage = fieldMessage;

  protected decide(): void {
    this.words.setValue(this.words.value.trim());
    if (this.words.invalid) {
      this.words.markAsTouched();
      return;
    }
    this.ref.close(this.words.value);
  }
}

/** Opens the dialog; resolves the words given, or null when cancelled. */
export async function askDecision(dialog: MatDialog, request: DecisionRequest): Promise<string | null> {
  const ref = dialog.open<DecisionDialog, DecisionRequest, string>(DecisionDialog, { data: request, width: '30rem', maxWidth: 'calc(100vw - 2rem)', autoFocus: 'first-tabbable' });
  return (await firstValueFrom(ref.afterClosed())) ?? null;
}
