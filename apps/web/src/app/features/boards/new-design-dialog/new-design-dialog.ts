import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { createDesignBody, DESIGN_PRESET_LABELS, DESIGN_PRESETS, DESIGN_TITLE_MAX, type DesignPreset } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';

/** Creates the design; resolves with its id. */
export type CreateDesign = (title: string, preset: DesignPreset) => Promise<string>;

@Component({
  selector: 'bw-new-design-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule],
  template: `
    <h2 mat-dialog-title>New bar design</h2>
    <form [formGroup]="form" (ngSubmit)="submit()" novalidate>
      <mat-dialog-content class="fields">
        <mat-form-field>
          <mat-label>Title</mat-label>
          <input matInput formControlName="title" [attr.maxlength]="titleMax" cdkFocusInitial autocomplete="off" data-testid="new-design-title" />
          <mat-error>{{ fieldMessage('Title', form.controls.title.errors) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Start from</mat-label>
          <mat-select formControlName="preset" data-testid="new-design-preset">
            @for (preset of presets; track preset) {
              <mat-option [value]="preset" [attr.data-testid]="'new-design-preset-' + preset">{{ presetLabel[preset] }}</mat-option>
            }
          </mat-select>
          <mat-hint>A complete starting set-up you then change to suit your rosette and machine</mat-hint>
        </mat-form-field>
        @if (problem(); as message) {
          <p class="bw-form-alert" role="alert">{{ message }}</p>
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button class="bw-brass" type="submit" [disabled]="busy()" data-testid="new-design-create">
          {{ busy() ? 'Creating…' : 'Create and open' }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .fields {
      display: flex;
      flex-direction: column;
      gap: 1rem;
      padding-top: 0.5rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewDesignDialog {
  private readonly create = inject<CreateDesign>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<NewDesignDialog, string>>(MatDialogRef);
  protected readonly form = inject(NonNullableFormBuilder).group({
    title: ['', [Validators.required, contractValidator(createDesignBody.shape.title)]],
    preset: ['example' as DesignPreset],
  });
  protected readonly presets = DESIGN_PRESETS;
  protected readonly presetLabel = DESIGN_PRESET_LABELS;
  protected readonly titleMax = DESIGN_TITLE_MAX;
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
      const { title, preset } = this.form.getRawValue();
      this.ref.close(await this.create(title.trim(), preset));
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}

/** Asks for a title and a preset, creates the design; resolves with its id, or undefined if cancelled. */
export async function askForNewDesign(dialog: MatDialog, create: CreateDesign): Promise<string | undefined> {
  const ref = dialog.open<NewDesignDialog, CreateDesign, string>(NewDesignDialog, { data: create, width: '30rem', maxWidth: 'calc(100vw - 2rem)' });
  return firstValueFrom(ref.afterClosed());
}
