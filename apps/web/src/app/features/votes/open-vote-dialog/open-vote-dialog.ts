import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { VOTE_LIMITS } from '@barwright/contracts';
import { ApiError } from '../../../core/http/api-error';
import { VotesApi } from '../votes-api';

export interface OpenVoteData {
  boardId: string;
  designs: readonly { id: string; title: string }[];
}

/** How long a vote stays open, in days (at most VOTE_LIMITS.maxDays). */
const DURATIONS = [
  { days: 1, label: 'One day' },
  { days: 3, label: 'Three days' },
  { days: 7, label: 'A week' },
  { days: 14, label: 'Two weeks' },
  { days: 30, label: 'A month' },
];

/** Open "which would you cut?" over some of the board's designs; closes with the new vote's id. */
@Component({
  selector: 'bw-open-vote-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatCheckboxModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule],
  template: `
    <h2 mat-dialog-title>Ask the board: which would you cut?</h2>
    <mat-dialog-content>
      <form id="open-vote-form" [formGroup]="form" (ngSubmit)="open()" class="fields">
        <mat-form-field>
          <mat-label>Question</mat-label>
          <input matInput [formControl]="question" [maxlength]="limits.questionMax" data-testid="vote-question" />
          @if (question.invalid) { <mat-error>A question of at most {{ limits.questionMax }} characters is required.</mat-error> }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Closes after</mat-label>
          <mat-select [formControl]="days" data-testid="vote-closes">
            @for (d of durations; track d.days) { <mat-option [value]="d.days">{{ d.label }}</mat-option> }
          </mat-select>
        </mat-form-field>
        <fieldset class="designs">
          <legend>Designs to compare ({{ chosen().size }} chosen; {{ limits.minDesigns }} to {{ limits.maxDesigns }})</legend>
          @for (d of data.designs; track d.id) {
            <mat-checkbox [checked]="chosen().has(d.id)" (change)="toggle(d.id)" data-testid="vote-design">{{ d.title }}</mat-checkbox>
          }
        </fieldset>
      </form>
      <p class="hint">Members are shown two designs at a time, lit the same way at the same scale, and pick one or say they can't tell. The ranking follows their answers.</p>
      @if (problem()) { <p class="problem" role="alert" data-testid="vote-open-problem">{{ problem() }}</p> }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="submit" form="open-vote-form" [disabled]="busy() || !enough()" data-testid="vote-open-submit">Open the vote</button>
    </mat-dialog-actions>
  `,
  styles: `
    .fields { display: flex; flex-direction: column; }
    .designs { border: 1px solid var(--mat-sys-outline-variant); border-radius: 8px; padding: 0.25rem 0.75rem; display: flex; flex-direction: column; max-height: 16rem; overflow: auto; }
    .designs legend { font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }
    .hint { font-size: 0.875rem; color: var(--mat-sys-on-surface-variant); }
    .problem { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OpenVoteDialog {
  protected readonly data = inject<OpenVoteData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<OpenVoteDialog, string>>(MatDialogRef);
  private readonly api = inject(VotesApi);

  protected readonly limits = VOTE_LIMITS;
  protected readonly durations = DURATIONS;
  /** Holds the form element for ngSubmit; the controls stand alone. */
  protected readonly form = new FormGroup({});
  protected readonly question = new FormControl('Which would you cut?', { nonNullable: true, validators: [Validators.required, Validators.maxLength(VOTE_LIMITS.questionMax)] });
  protected readonly days = new FormControl(7, { nonNullable: true });
  protected readonly chosen = signal<ReadonlySet<string>>(new Set(this.data.designs.slice(0, VOTE_LIMITS.maxDesigns).map((d) => d.id)));
  protected readonly enough = computed(() => this.chosen().size >= VOTE_LIMITS.minDesigns && this.chosen().size <= VOTE_LIMITS.maxDesigns);
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);

  protected toggle(id: string): void {
    const next = new Set(this.chosen());
    if (!next.delete(id)) next.add(id);
    this.chosen.set(next);
  }

  protected async open(): Promise<void> {
    this.problem.set(null);
    if (this.question.invalid || !this.enough()) return;
    this.busy.set(true);
    try {
      const closesAt = new Date(Date.now() + this.days.value * 86_400_000).toISOString();
      // The board's order, not the order of clicking.
      const designIds = this.data.designs.filter((d) => this.chosen().has(d.id)).map((d) => d.id);
      const { id } = await this.api.open(this.data.boardId, { question: this.question.value.trim(), designIds, closesAt });
      this.ref.close(id);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.problem.set(fields.length ? fields.map(([path, message]) => `${path === 'designIds' ? 'The designs' : path === 'closesAt' ? 'The closing time' : 'The question'} ${message}.`).join(' ') : error.message);
    } finally {
      this.busy.set(false);
    }
  }
}
