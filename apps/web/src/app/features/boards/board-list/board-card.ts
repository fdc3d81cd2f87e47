import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import type { BoardSummary } from '@barwright/contracts';
import { ROLE_LABELS } from '../board-roles';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** One board in the lists: its name (the link), your role, owner, design count and last change. */
@Component({
  selector: 'bw-board-card',
  imports: [DateTextPipe, RouterLink],
  template: `
    <article class="card" [class.archived]="board().archived" data-testid="board-card">
      <a class="card-link" [routerLink]="['/boards', board().id]" data-testid="board-card-link">
        <span class="card-name">{{ board().name }}</span>
      </a>
      <span class="tags">
        <span class="tag role" data-testid="board-card-role">{{ roleLabel[board().role] }}</span>
        @if (board().archived) { <span class="tag archived-tag">Archived</span> }
      </span>
      <dl class="facts">
        <div><dt>Owner</dt><dd>{{ board().ownerName }}</dd></div>
        <div><dt>Designs</dt><dd data-testid="board-card-count">{{ board().designCount }}</dd></div>
        <div><dt>Changed</dt><dd><time [attr.datetime]="board().updatedAt">{{ board().updatedAt | dateText }}</time></dd></div>
      </dl>
    </article>
  `,
  styleUrl: './board-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardCard {
  readonly board = input.required<BoardSummary>();
  protected readonly roleLabel = ROLE_LABELS;
}
