import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { BOARD_NAME_MAX, createBoardBody, type BoardSummary, type RemixResult } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { EntriesApi } from '../entries-api';
import { editableBoards } from '../../../shared/board-choice/editable-boards';

export interface RemixRequest {
  entryId: string;
  title: string;
}

/** Remix: choose one of my boards (owner or editor), or name a new one; the copy opens in the studio. */
@Component({
  selector: 'bw-remix-dialog',
  imports: [ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatRadioModule],
  templateUrl: './remix-dialog.html',
  styleUrl: './remix-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RemixDialog {
  protected readonly request = inject<RemixRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<RemixDialog, RemixResult>>(MatDialogRef);
  private readonly api = inject(EntriesApi);
  protected readonly boards = signal<BoardSummary[] | null>(null);
  protected readonly board = new FormControl<string | null>(null, Validators.required);
  protected readonly newName = new FormControl('', { nonNullable: true, validators: [Validators.required, contractValidator(createBoardBody.shape.name)] });
  protected readonly nameMax = BOARD_NAME_MAX;
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;

  constructor() {
    void this.api.boards().then((lists) => {
      const boards = editableBoards(lists);
      this.boards.set(boards);
      if (boards.length > 0) this.board.setValue(boards[0].id);
    });
  }

  protected async remix(): Promise<void> {
    this.problem.set(null);
    if (this.board.invalid) {
      this.board.markAsTouched();
      return;
    }
    await this.run(() => this.api.remix(this.request.entryId, this.board.value!), this.board);
  }

  /** No board to remix onto yet: make one and remix onto it in one go. */
  protected async createAndRemix(): Promise<void> {
    this.problem.set(null);
    if (this.newName.invalid) {
      this.newName.markAsTouched();
      return;
    }
    await this.run(async () => {
      const board = await this.api.createBoard(this.newName.value.trim());
      return this.api.remix(this.request.entryId, board.id);
    }, this.newName);
  }

  private async run(work: () => Promise<RemixResult>, field: FormControl): Promise<void> {
    this.busy.set(true);
    try {
      this.ref.close(await work());
    } catch (error) {
      this.problem.set(formProblem(error, field));
    } finally {
      this.busy.set(false);
    }
  }
}

/** Opens the remix dialog; resolves with the new design, or undefined when cancelled. */
export async function openRemixDialog(dialog: MatDialog, request: RemixRequest): Promise<RemixResult | undefined> {
  const ref = dialog.open<RemixDialog, RemixRequest, RemixResult>(RemixDialog, { data: request, width: '30rem', maxWidth: 'calc(100vw - 2rem)' });
  return firstValueFrom(ref.afterClosed());
}
