import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import { contractValidator, type FieldSchema } from '../forms/contract-validator';
import { fieldMessage } from '../forms/field-message';
import { formProblem } from '../forms/form-problem';
import { injectInvalidFocus } from '../forms/invalid-focus';

/** What the name dialog asks for: one name (a board, a design title, a version), saved by `save`. */
export interface NameRequest {
  title: string;
  label: string;
  initial?: string;
  hint?: string;
  maxLength: number;
  schema: FieldSchema;
  confirmLabel: string;
  /** Saves the trimmed name; a field error from the server stays in the dialog. */
  save: (name: string) => Promise<void>;
  testId?: string;
}

@Component({
  selector: 'bw-name-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule],
  template: `
    <h2 mat-dialog-title>{{ request.title }}</h2>
    <form [formGroup]="form" (ngSubmit)="submit()" novalidate>
      <mat-dialog-content>
        <mat-form-field class="field">
          <mat-label>{{ request.label }}</mat-label>
          <input matInput formControlName="name" [attr.maxlength]="request.maxLength" cdkFocusInitial
                 [attr.data-testid]="(request.testId ?? 'name-dialog') + '-input'" />
          @if (request.hint) { <mat-hint>{{ request.hint }}</mat-hint> }
          <mat-error>{{ fieldMessage(request.label, form.controls.name.errors) }}</mat-error>
        </mat-form-field>
        @if (problem(); as message) {
          <p class="bw-form-alert" role="alert">{{ message }}</p>
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button class="bw-brass" type="submit" [disabled]="busy()"
                [attr.data-testid]="(request.testId ?? 'name-dialog') + '-save'">{{ busy() ? 'Saving…' : request.confirmLabel }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .field {
      width: 100%;
      margin-top: 0.25rem;
    }
    .bw-form-alert {
      margin-top: 1rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NameDialog {
  protected readonly request = inject<NameRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<NameDialog, boolean>>(MatDialogRef);
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.request.initial ?? '', [Validators.required, contractValidator(this.request.schema)]],
  });
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected async submit(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      await this.request.save(this.form.getRawValue().name.trim());
      this.ref.close(true);
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}

/** Opens the name dialog; resolves true when the name was saved. */
export async function askForName(dialog: MatDialog, request: NameRequest): Promise<boolean> {
  const ref = dialog.open<NameDialog, NameRequest, boolean>(NameDialog, { data: request, width: '28rem', maxWidth: 'calc(100vw - 2rem)' });
  return (await firstValueFrom(ref.afterClosed())) === true;
}
