import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { REPORT_DETAILS_MAX, REPORT_REASON_LABELS, REPORT_REASONS, type ReportReason, type ReportTarget } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { ModerationApi } from '../moderation-api';

export interface ReportRequest {
  target: ReportTarget;
  /** What is reported, in words: "the comment by Ilse", "“Sine 24”". */
  what: string;
}

/** One line under each reason, so members choose alike. */
export const REASON_HINTS: Record<ReportReason, string> = {
  spam: 'Advertising, repeated posts, links that lead away from the craft.',
  unsafe: 'Advice or a set-up that could hurt someone at the machine or the furnace.',
  not_their_work: 'Someone else’s design or photo shown as the member’s own.',
  offensive: 'Insulting, hateful or harassing.',
  other: 'Say what is wrong below.',
};

/** Report an entry, a comment or a photo to the moderators, with a reason (and words, required for “other”). */
@Component({
  selector: 'bw-report-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatRadioModule],
  templateUrl: './report-dialog.html',
  styleUrl: './report-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReportDialog {
  protected readonly request = inject<ReportRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ReportDialog, boolean>>(MatDialogRef);
  private readonly api = inject(ModerationApi);
  protected readonly reasons = REPORT_REASONS;
  protected readonly labels = REPORT_REASON_LABELS;
  protected readonly hints = REASON_HINTS;
  protected readonly detailsMax = REPORT_DETAILS_MAX;
  protected readonly form = new FormGroup({
    reason: new FormControl<ReportReason | null>(null, Validators.required),
    details: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(REPORT_DETAILS_MAX)] }),
  });
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;

  constructor() {
    // “Other” needs words; the server says so too.
    this.form.controls.reason.valueChanges.subscribe((reason) => {
      const details = this.form.controls.details;
      details.setValidators(reason === 'other' ? [Validators.required, Validators.maxLength(REPORT_DETAILS_MAX)] : [Validators.maxLength(REPORT_DETAILS_MAX)]);
      details.updateValueAndValidity();
    });
  }

  protected async send(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    try {
      const { reason, details } = this.form.getRawValue();
      await this.api.report({ target: this.request.target, reason: reason!, details: details.trim() });
      this.ref.close(true);
    } catch (error) {
      this.problem.set(formProblem(error, this.form, { already_reported: 'You have reported this already. The moderators will look at it.' }));
    } finally {
      this.busy.set(false);
    }
  }
}

/** Opens the report dialog; resolves true once the report is filed. */
export async function openReportDialog(dialog: MatDialog, request: ReportRequest): Promise<boolean> {
  const ref = dialog.open<ReportDialog, ReportRequest, boolean>(ReportDialog, { data: request, width: '32rem', maxWidth: 'calc(100vw - 2rem)', autoFocus: 'first-tabbable' });
  return (await firstValueFrom(ref.afterClosed())) === true;
}
