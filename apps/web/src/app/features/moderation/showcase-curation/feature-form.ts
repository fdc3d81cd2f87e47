import { ChangeDetectionStrategy, Component, computed, DestroyRef, inject, input, signal, viewChild } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, FormGroupDirective, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatAutocompleteModule, MatAutocompleteSelectedEvent } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { SHOWCASE_NOTE_MAX, type EntryCard } from '@barwright/contracts';
import { debounceTime, distinctUntilChanged, startWith, switchMap } from 'rxjs';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { ModerationApi } from '../moderation-api';

/** Feature a bar: find it by title, tags or description, say why it is worth a look, add it to the showcase. */
@Component({
  selector: 'bw-feature-form',
  imports: [ReactiveFormsModule, MatAutocompleteModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  template: `
    <form class="form bw-panel" [formGroup]="form" (submit)="$event.preventDefault(); submit()" novalidate aria-labelledby="feature-title">
      <h2 id="feature-title">Feature a bar</h2>
      <div class="fields">
        <mat-form-field class="search">
          <mat-label>Bar</mat-label>
          <mat-icon matPrefix aria-hidden="true">search</mat-icon>
          <input matInput [formControl]="search" [matAutocomplete]="auto" autocomplete="off" data-testid="feature-search" />
          <mat-autocomplete #auto="matAutocomplete" (optionSelected)="choose($event)" [displayWith]="titleOf">
            @for (e of choices(); track e.id) {
              <mat-option [value]="e" [attr.data-testid]="'feature-option-' + e.id">{{ e.title }} <span class="by">· {{ e.author.displayName }}</span></mat-option>
            }
          </mat-autocomplete>
          <mat-hint>Search by title, tags or description</mat-hint>
          <mat-error>Choose a bar from the list</mat-error>
        </mat-form-field>
        <mat-form-field class="note">
          <mat-label>Curator’s note</mat-label>
          <textarea matInput formControlName="note" rows="2" [attr.maxlength]="noteMax" data-testid="feature-note"></textarea>
          <mat-hint>Why it is worth a look; shown beside it on the home page</mat-hint>
          <mat-error>{{ fieldMessage('The note', form.controls.note.errors) }}</mat-error>
        </mat-form-field>
      </div>
      @if (problem(); as message) { <p class="bw-form-alert" role="alert">{{ message }}</p> }
      <div class="bw-form-actions">
        <button mat-flat-button class="bw-brass" type="submit" [disabled]="busy()" data-testid="feature-submit">
          <mat-icon aria-hidden="true">star_outline</mat-icon>{{ busy() ? 'Adding…' : 'Add to the showcase' }}
        </button>
      </div>
    </form>
  `,
  styles: `
    h2 {
      margin-bottom: 1rem;
    }
    .fields {
      display: grid;
      grid-template-columns: minmax(0, 1fr) minmax(0, 1.3fr);
      gap: 0.5rem 1rem;
    }
    mat-form-field {
      width: 100%;
    }
    .by {
      color: var(--mat-sys-on-surface-variant);
    }
    @media (max-width: 719.98px) {
      .fields {
        grid-template-columns: minmax(0, 1fr);
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FeatureForm {
  private readonly api = inject(ModerationApi);
  /** Entries already in the showcase, left out of the choices. */
  readonly exclude = input<readonly string[]>([]);
  readonly save = input.required<(entryId: string, note: string) => Promise<void>>();

  protected readonly search = new FormControl<string | EntryCard>('', { nonNullable: true });
  protected readonly form = new FormGroup({
    entryId: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    note: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(SHOWCASE_NOTE_MAX)] }),
  });
  /** Resetting through the directive also forgets that the form was submitted (else the emptied note shows as an error). */
  private readonly formDirective = viewChild.required(FormGroupDirective);
  private readonly found = signal<EntryCard[]>([]);
  protected readonly choices = computed(() => this.found().filter((e) => !this.exclude().includes(e.id)));
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly noteMax = SHOWCASE_NOTE_MAX;
  protected readonly fieldMessage = fieldMessage;
  protected readonly titleOf = (e: EntryCard | string | null) => (typeof e === 'string' ? e : (e?.title ?? ''));

  constructor() {
    this.search.valueChanges
      .pipe(
        startWith(''),
        debounceTime(200),
        distinctUntilChanged(),
        switchMap((v) => {
          if (typeof v !== 'string') return [];
          this.form.controls.entryId.setValue(''); // typing again drops the earlier choice
          return this.api.findEntries(v);
        }),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe((entries) => this.found.set(entries));
  }

  protected choose(event: MatAutocompleteSelectedEvent): void {
    this.form.controls.entryId.setValue((event.option.value as EntryCard).id);
    this.search.setErrors(null);
  }

  protected async submit(): Promise<void> {
    this.problem.set(null);
    this.form.controls.note.setValue(this.form.controls.note.value.trim());
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      if (this.form.controls.entryId.invalid) {
        this.search.setErrors({ required: true });
        this.search.markAsTouched();
      }
      return;
    }
    this.busy.set(true);
    try {
      await this.save()(this.form.controls.entryId.value, this.form.controls.note.value);
      this.formDirective().resetForm();
      this.search.reset('');
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
    } finally {
      this.busy.set(false);
    }
  }
}
