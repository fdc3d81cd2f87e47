import { ChangeDetectionStrategy, Component, effect, inject, input, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { BOARD_NAME_MAX, createBoardBody } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { ApiError } from '../../../core/http/api-error';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { askForName } from '../../../shared/name-dialog/name-dialog';
import { BoardStore } from '../board-store';
import { ROLE_HINTS, ROLE_LABELS } from '../board-roles';
import { BoardDesigns } from './board-designs';
import { BoardMembers } from './board-members';
import { BoardVotes } from '../../votes/board-votes/board-votes';

@Component({
  selector: 'bw-board-page',
  imports: [RouterLink, MatButtonModule, MatIconModule, MatMenuModule, MatProgressBarModule, BoardDesigns, BoardMembers, BoardVotes],
  providers: [BoardStore],
  templateUrl: './board-page.html',
  styleUrl: './board-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardPage {
  protected readonly store = inject(BoardStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  readonly boardId = input.required<string>();
  protected readonly roleLabel = ROLE_LABELS;
  protected readonly roleHint = ROLE_HINTS;

  constructor() {
    effect(() => {
      const id = this.boardId();
      untracked(() => void this.load(id));
    });
  }

  private async load(id: string): Promise<void> {
    try {
      await this.store.load(id);
    } catch (error) {
      if (error instanceof ApiError && error.status === 404) {
        void this.notifier.tell('That board does not exist, or you are not a member of it.');
        await this.router.navigate(['/boards']);
        return;
      }
      throw error;
    }
  }

  protected async rename(): Promise<void> {
    const board = this.store.board();
    if (!board) return;
    await askForName(this.dialog, {
      title: 'Rename board',
      label: 'Board name',
      initial: board.name,
      maxLength: BOARD_NAME_MAX,
      schema: createBoardBody.shape.name,
      confirmLabel: 'Rename',
      testId: 'board-rename',
      save: (name) => this.store.rename(name),
    });
  }

  protected async toggleArchived(): Promise<void> {
    const board = this.store.board();
    if (!board) return;
    if (!board.archived) {
      const confirmed = await confirmWith(this.dialog, {
        title: `Archive “${board.name}”?`,
        message: 'The board moves out of the lists (show archived boards to find it). Its designs, members and history stay as they are, and you can bring it back at any time.',
        confirmLabel: 'Archive board',
      });
      if (!confirmed) return;
    }
    await this.store.setArchived(!board.archived);
    void this.notifier.tell(board.archived ? 'The board is back in the lists.' : 'The board is archived.', undefined, 3000);
  }

  protected async leave(): Promise<void> {
    const board = this.store.board();
    if (!board) return;
    const confirmed = await confirmWith(this.dialog, {
      title: `Leave “${board.name}”?`,
      message: `You will no longer see this board or its designs. ${board.ownerName} can invite you again.`,
      confirmLabel: 'Leave board',
      danger: true,
    });
    if (!confirmed) return;
    await this.store.leave();
    void this.notifier.tell(`You have left “${board.name}”.`, undefined, 4000);
    await this.router.navigate(['/boards']);
  }
}
