import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import type { BoardSummary, DesignsBatchBody } from '@barwright/contracts';
import { ApiError } from '../../../core/http/api-error';
import { editableBoards } from '../../../shared/board-choice/editable-boards';
import { SweepApi } from '../sweep-api';

export interface ShortlistDialogData {
  designs: DesignsBatchBody['designs'];
}

/** "Send to board": a board the member may edit, then every shortlisted candidate made a bar design there in one request, all or nothing. */
@Component({
  selector: 'bw-shortlist-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatSelectModule, RouterLink],
  template: `
    <h2 mat-dialog-title>Send the shortlist to a board</h2>
    <mat-dialog-content data-testid="shortlist-dialog">
      @if (sent(); as s) {
        <p role="status" data-testid="shortlist-sent">
          {{ s.count }} bar {{ s.count === 1 ? 'design is' : 'designs are' }} on “{{ s.board.name }}”, each recording its rack rosette as its origin.
          <a [routerLink]="['/boards', s.board.id]" mat-dialog-close data-testid="shortlist-board-link">Open the board</a>
        </p>
      } @else {
        <p class="lede">These {{ data.designs.length }} become bar designs on the board, all of them or none:</p>
        <ol class="titles">@for (d of data.designs; track $index) { <li>{{ d.title }}</li> }</ol>
        @if (boards(); as list) {
          @if (list.length === 0) {
            <p>You have no board you may add to. <a routerLink="/boards" mat-dialog-close>Make a board</a> first.</p>
          } @else {
            <mat-form-field subscriptSizing="dynamic" class="board">
              <mat-label>Board</mat-label>
              <mat-select [formControl]="board" data-testid="shortlist-board">
                @for (b of list; track b.id) { <mat-option [value]="b.id">{{ b.name }}</mat-option> }
              </mat-select>
            </mat-form-field>
          }
        } @else {
          <p>Reading your boards…</p>
        }
        @if (problems().length) {
          <div class="problems" role="alert" data-testid="shortlist-problems">
            <p>Nothing was added to the board:</p>
            <ul>@for (p of problems(); track $index) { <li>{{ p }}</li> }</ul>
          </div>
        }
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>{{ sent() ? 'Close' : 'Cancel' }}</button>
      @if (!sent()) {
        <button mat-flat-button type="button" (click)="send()" [disabled]="sending() || !board.value" data-testid="shortlist-send">Make the designs</button>
      }
    </mat-dialog-actions>
  `,
  styles: `
    .lede { margin-top: 0; }
    .titles { margin: 0 0 1rem; padding-left: 1.5rem; max-height: 12rem; overflow: auto; }
    .board { width: 100%; }
    .problems { color: var(--mat-sys-error); ul { margin: 0.25rem 0; padding-left: 1.25rem; } p { margin: 0.5rem 0 0; } }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShortlistDialog {
  protected readonly data = inject<ShortlistDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(SweepApi);
  protected readonly boards = signal<BoardSummary[] | null>(null);
  protected readonly board = new FormControl<string | null>(null, Validators.required);
  protected readonly sending = signal(false);
  protected readonly problems = signal<string[]>([]);
  protected readonly sent = signal<{ board: BoardSummary; count: number } | null>(null);

  constructor() {
    void this.api.boards().then((lists) => {
      const boards = editableBoards(lists);
      this.boards.set(boards);
      if (boards[0]) this.board.setValue(boards[0].id);
    });
  }

  protected async send(): Promise<void> {
    const board = this.boards()?.find((b) => b.id === this.board.value);
    if (!board) return;
    this.problems.set([]);
    this.sending.set(true);
    try {
      const { ids } = await this.api.sendToBoard(board.id, { designs: this.data.designs });
      this.sent.set({ board, count: ids.length });
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.problems.set(fields.length ? fields.map(([path, message]) => `${this.fieldWords(path)} ${message}.`) : [error.message]);
    } finally {
      this.sending.set(false);
    }
  }

  /** "designs.2.file.rubber.radius" → "“title” (rubber.radius)". */
  private fieldWords(path: string): string {
    const m = /^designs\.(\d+)\.?(.*)$/.exec(path);
    const d = m ? this.data.designs[Number(m[1])] : undefined;
    return d ? `“${d.title}”${m![2] ? ` (${m![2].replace(/^file\./, '')})` : ''}` : path;
  }
}
