import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { createDesignBody, type BoardSummary, type RackRosette } from '@barwright/contracts';
import { ApiError } from '../../../core/http/api-error';
import { editableBoards } from '../../../shared/board-choice/editable-boards';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { RosettesApi } from '../../rosettes/rosettes-api';
import { rackFieldLabel } from '../rack-field-label';
import { designFromRosette } from './design-from-rosette';

/** "New design from this rosette": a board the member may edit and a title; closes with the new design's id. */
@Component({
  selector: 'bw-design-from-rosette-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, RouterLink],
  template: `
    <h2 mat-dialog-title>New design from {{ rosette.name }}</h2>
    <mat-dialog-content>
      <p class="lede">A new bar design with this rosette; set the rubber, cutter and bar in the studio.</p>
      @if (boards(); as list) {
        @if (list.length === 0) {
          <p data-testid="from-rosette-no-board">You have no board to put it on yet. <a routerLink="/boards" mat-dialog-close>Make a board</a> first.</p>
        } @else {
          <form id="from-rosette-form" [formGroup]="form" (ngSubmit)="create()" class="fields">
            <mat-form-field>
              <mat-label>Board</mat-label>
              <mat-select [formControl]="board" data-testid="from-rosette-board">
                @for (b of list; track b.id) { <mat-option [value]="b.id">{{ b.name }}</mat-option> }
              </mat-select>
            </mat-form-field>
            <mat-form-field>
              <mat-label>Title</mat-label>
              <input matInput [formControl]="title" data-testid="from-rosette-title" />
              @if (title.hasError('server')) { <mat-error>{{ title.getError('server') }}</mat-error> }
              @else if (title.invalid) { <mat-error>A title of at most 120 characters is required.</mat-error> }
            </mat-form-field>
          </form>
        }
      } @else {
        <p>Reading your boards…</p>
      }
      @if (problem()) { <p class="problem" role="alert" data-testid="from-rosette-problem">{{ problem() }}</p> }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Cancel</button>
      <button mat-flat-button type="submit" form="from-rosette-form" [disabled]="creating() || !boards()?.length" data-testid="from-rosette-create">Make the design</button>
    </mat-dialog-actions>
  `,
  styles: `
    .fields { display: flex; flex-direction: column; }
    .lede { margin-top: 0; }
    .problem { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignFromRosetteDialog {
  protected readonly rosette = inject<RackRosette>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<DesignFromRosetteDialog, string>>(MatDialogRef);
  private readonly api = inject(RosettesApi);

  protected readonly boards = signal<BoardSummary[] | null>(null);
  /** Holds the form element for ngSubmit; the controls stand alone. */
  protected readonly form = new FormGroup({});
  protected readonly board = new FormControl<string | null>(null, Validators.required);
  protected readonly title = new FormControl(this.rosette.name, { nonNullable: true, validators: [Validators.required, contractValidator(createDesignBody.shape.title)] });
  protected readonly creating = signal(false);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    void this.api.boards().then((lists) => {
      const boards = editableBoards(lists);
      this.boards.set(boards);
      if (boards[0]) this.board.setValue(boards[0].id);
    });
  }

  protected async create(): Promise<void> {
    this.problem.set(null);
    if (this.board.invalid || this.title.invalid) {
      this.board.markAsTouched();
      this.title.markAsTouched();
      return;
    }
    this.creating.set(true);
    try {
      const { id } = await this.api.createDesign(this.board.value!, this.title.value.trim(), designFromRosette(this.rosette));
      this.ref.close(id);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      const title = error.fields['title'];
      if (title) this.title.setErrors({ server: title });
      const rest = fields.filter(([path]) => path !== 'title');
      this.problem.set(rest.length ? rest.map(([path, message]) => `${rackFieldLabel(path.replace(/^file\./, ''))} ${message}.`).join(' ') : title ? null : error.message);
    } finally {
      this.creating.set(false);
    }
  }
}
