import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { Router } from '@angular/router';
import { BOARD_NAME_MAX, createBoardBody } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';
import { BoardsStore } from '../boards-store';
import { BoardCard } from './board-card';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'bw-board-list-page',
  imports: [BoardCard, RouterLink, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSlideToggleModule],
  providers: [BoardsStore],
  templateUrl: './board-list-page.html',
  styleUrl: './board-list-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardListPage {
  protected readonly store = inject(BoardsStore);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, contractValidator(createBoardBody.shape.name)]],
  });
  protected readonly nameMax = BOARD_NAME_MAX;
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  constructor() {
    void this.store.load();
  }

  protected async createBoard(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const board = await this.store.create(this.form.getRawValue().name.trim());
      this.form.reset();
      void this.notifier.tell(`Board “${board.name}” created.`, undefined, 3000);
      await this.router.navigate(['/boards', board.id]);
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }
}
