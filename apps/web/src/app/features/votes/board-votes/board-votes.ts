import { ChangeDetectionStrategy, Component, effect, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { Router, RouterLink } from '@angular/router';
import { VOTE_LIMITS, type VoteSummary } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';
import { BoardStore } from '../../boards/board-store';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';
import { OpenVoteDialog, type OpenVoteData } from '../open-vote-dialog/open-vote-dialog';
import { VotesApi } from '../votes-api';

/** A board's votes: open ones first; an owner or editor opens a new one over the board's designs. */
@Component({
  selector: 'bw-board-votes',
  imports: [MatButtonModule, MatIconModule, RouterLink, DateTextPipe],
  template: `
    <section class="votes" aria-labelledby="votes-title" data-testid="board-votes">
      <div class="head">
        <h2 id="votes-title">Which would you cut?</h2>
        @if (store.canEdit()) {
          <button mat-stroked-button type="button" (click)="open()" [disabled]="store.liveDesigns().length < min"
                  [attr.title]="store.liveDesigns().length < min ? 'A vote needs at least ' + min + ' designs on the board' : null" data-testid="vote-open">
            <mat-icon aria-hidden="true">how_to_vote</mat-icon> Open a vote
          </button>
        }
      </div>
      @if (votes(); as list) {
        <ul class="list">
          @for (v of list; track v.id) {
            <li>
              <a [routerLink]="['/votes', v.id]" data-testid="board-vote-link">{{ v.question }}</a>
              <span class="when">{{ v.closed ? 'closed' : 'open until ' + (v.closesAt | dateText) }}</span>
            </li>
          } @empty {
            <li class="empty">No votes yet. {{ store.canEdit() ? 'Open one to let the board choose between designs, two at a time.' : '' }}</li>
          }
        </ul>
      }
    </section>
  `,
  styles: `
    .votes { margin-top: 2rem; }
    .head { display: flex; flex-wrap: wrap; align-items: center; justify-content: space-between; gap: 0.5rem 1rem; }
    .head h2 { margin: 0; }
    .list { list-style: none; padding: 0; margin: 0.5rem 0 0; }
    .list li { display: flex; flex-wrap: wrap; gap: 0 0.75rem; padding: 0.5rem 0; border-bottom: 1px solid var(--mat-sys-outline-variant); overflow-wrap: anywhere; }
    .when, .empty { color: var(--mat-sys-on-surface-variant); font-size: 0.875rem; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardVotes {
  protected readonly store = inject(BoardStore);
  private readonly api = inject(VotesApi);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);

  protected readonly min = VOTE_LIMITS.minDesigns;
  protected readonly votes = signal<VoteSummary[] | null>(null);

  constructor() {
    effect(() => {
      const id = this.store.board()?.id;
      if (id) void this.api.list(id).then((votes) => this.votes.set([...votes].sort((a, b) => Number(a.closed) - Number(b.closed))));
    });
  }

  protected async open(): Promise<void> {
    const board = this.store.board();
    if (!board) return;
    const data: OpenVoteData = { boardId: board.id, designs: this.store.liveDesigns().map((d) => ({ id: d.id, title: d.title })) };
    const ref = this.dialog.open<OpenVoteDialog, OpenVoteData, string>(OpenVoteDialog, { data, width: '32rem', maxWidth: '96vw' });
    const id = await firstValueFrom(ref.afterClosed());
    if (id) await this.router.navigate(['/votes', id]);
  }
}
