import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { createDesignBody, DESIGN_PRESET_FILES, DESIGN_PRESET_LABELS, DESIGN_PRESETS, DESIGN_TITLE_MAX, type DesignPreset } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { DesignSketch } from '../../../shared/design-sketch/design-sketch';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';

/** Creates the design; resolves with its id. */
export type CreateDesign = (title: string, preset: DesignPreset) => Promise<string>;

@Component({
  selector: 'bw-new-design-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, DesignSketch],
  template: `
    <h2 mat-dialog-title>New bar design</h2>
    <form [formGroup]="form" (ngSubmit)="submit()" novalidate>
      <mat-dialog-content class="fields">
        <mat-form-field>
          <mat-label>Title</mat-label>
          <input matInput formControlName="title" [attr.maxlength]="titleMax" cdkFocusInitial autocomplete="off" data-testid="new-design-title" />
          <mat-error>{{ fieldMessage('Title', form.controls.title.errors) }}</mat-error>
        </mat-form-field>
        <fieldset class="presets" aria-describedby="preset-hint" data-testid="new-design-preset">
          <legend>Start from</legend>
          <p class="hint" id="preset-hint">A complete starting set-up you then change to suit your rosette and machine. Each picture is its line study.</p>
          <div class="choices">
            @for (preset of presets; track preset) {
              <label class="choice" [class.chosen]="form.controls.preset.value === preset" [attr.data-testid]="'new-design-preset-' + preset">
                <input type="radio" formControlName="preset" [value]="preset" name="preset" />
                <bw-design-sketch [design]="presetFile[preset]" />
                <span class="name">{{ presetLabel[preset] }}</span>
              </label>
            }
          </div>
        </fieldset>
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
    .presets {
      margin: 0;
      padding: 0;
      border: 0;
      min-width: 0;
    }
    legend {
      padding: 0;
      font: var(--mat-sys-title-small);
      color: var(--mat-sys-on-surface);
    }
    .hint {
      margin: 0.25rem 0 0.75rem;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .choices {
      display: grid;
      grid-template-columns: repeat(3, minmax(0, 1fr));
      gap: 0.75rem;
    }
    .choice {
      position: relative;
      display: flex;
      flex-direction: column;
      gap: 0.375rem;
      padding: 0.5rem;
      border: 1px solid var(--bw-rule);
      border-radius: var(--mat-sys-corner-medium);
      cursor: pointer;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface);

      &:hover {
        border-color: var(--mat-sys-outline);
      }
      &.chosen {
        border-color: var(--bw-brass);
        box-shadow: 0 0 0 1px var(--bw-brass);
      }
      &:has(input:focus-visible) {
        outline: 3px solid var(--bw-focus);
        outline-offset: 2px;
      }
    }
    // The radio is there for the keyboard and screen readers; the card shows the choice.
    .choice input {
      position: absolute;
      opacity: 0;
      width: 1px;
      height: 1px;
      margin: 0;
    }
    .name {
      line-height: 1.3;
    }
    @media (max-width: 599.98px) {
      .choices {
        grid-template-columns: repeat(2, minmax(0, 1fr));
      }
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
  protected readonly presetFile = DESIGN_PRESET_FILES;
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
  const ref = dialog.open<NewDesignDialog, CreateDesign, string>(NewDesignDialog, { data: create, width: '40rem', maxWidth: 'calc(100vw - 2rem)' });
  return firstValueFrom(ref.afterClosed());
}
