import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, signal, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { BoardDetail, Design, RankedDesign, Vote, VotePair, VotePick } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { ApiError } from '../../../core/http/api-error';
import { BoardsApi } from '../../boards/boards-api';
import type { CompareSide } from '../../../shared/compare/compare-side';
import { SideBySide } from '../../../shared/compare/side-by-side';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';
import { VotesApi } from '../votes-api';
import { watchVote } from '../vote-socket';

/** One vote: the next pair to answer, side by side under one light, and the ranking as it stands (live). */
@Component({
  selector: 'bw-vote-page',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SideBySide, DateTextPipe],
  templateUrl: './vote-page.html',
  styleUrl: './vote-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VotePage {
  private readonly api = inject(VotesApi);
  private readonly boards = inject(BoardsApi);
  private readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);

  readonly id = input.required<string>();
  protected readonly vote = signal<Vote | null>(null);
  protected readonly board = signal<BoardDetail | null>(null);
  /** The pair to answer; null when every pair is answered (or the vote is closed); undefined while reading. */
  protected readonly pair = signal<VotePair | null | undefined>(undefined);
  protected readonly sides = signal<CompareSide[] | null>(null);
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly live = signal(false);
  private readonly designs = new Map<string, Promise<Design>>();

  protected readonly canClose = computed(() => {
    const role = this.board()?.role;
    return !this.vote()?.closed && (role === 'owner' || role === 'editor' || this.vote()?.createdBy.id === this.auth.me()?.id);
  });
  protected readonly titles = computed(() => new Map((this.vote()?.designs ?? []).map((d) => [d.id, d.title])));
  /** Strength as a share of the whole, for the bar beside each design. */
  protected readonly ranking = computed(() => {
    const ranking = this.vote()?.ranking ?? [];
    const top = Math.max(...ranking.map((r) => r.strength), 0);
    return ranking.map((r, i) => ({ ...r, place: i + 1, title: this.titles().get(r.designId) ?? 'A design', share: top > 0 ? r.strength / top : 0 }));
  });

  constructor() {
    const destroyRef = inject(DestroyRef);
    effect((onCleanup) => {
      const id = this.id();
      untracked(() => void this.load(id));
      const stop = watchVote(
        id,
        (update) => {
          this.live.set(true);
          const vote = this.vote();
          if (vote) this.vote.set({ ...vote, ranking: update.ranking, answers: update.answers, closed: update.closed });
          if (update.closed) this.pair.set(null);
        },
        () => this.live.set(false),
      );
      onCleanup(stop);
    });
    destroyRef.onDestroy(() => this.designs.clear());
  }

  protected async answer(pick: VotePick): Promise<void> {
    const pair = this.pair();
    if (!pair || this.busy()) return;
    this.busy.set(true);
    this.problem.set(null);
    try {
      this.vote.set(await this.api.answer(this.id(), { a: pair.a, b: pair.b, pick }));
      await this.nextPair();
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      this.problem.set(error.message);
      await this.reload();
    } finally {
      this.busy.set(false);
    }
  }

  protected async close(): Promise<void> {
    const ok = await confirmWith(this.dialog, { title: 'Close this vote?', message: 'No more answers are taken; the ranking stays as it is now.', confirmLabel: 'Close the vote' });
    if (!ok) return;
    this.vote.set(await this.api.close(this.id()));
    this.pair.set(null);
  }

  protected percent(strength: number): string {
    return `${(strength * 100).toFixed(1)} %`;
  }

  protected trackRank(_: number, r: RankedDesign): string {
    return r.designId;
  }

  private async load(id: string): Promise<void> {
    const vote = await this.api.read(id);
    this.vote.set(vote);
    void this.boards.get(vote.boardId).then((b) => this.board.set(b)).catch(() => undefined);
    await this.nextPair();
  }

  private async reload(): Promise<void> {
    this.vote.set(await this.api.read(this.id()));
    await this.nextPair();
  }

  private async nextPair(): Promise<void> {
    if (this.vote()?.closed) {
      this.pair.set(null);
      return;
    }
    const pair = await this.api.nextPair(this.id());
    if (!pair) {
      this.pair.set(null);
      this.sides.set(null);
      return;
    }
    const [a, b] = await Promise.all([this.design(pair.a), this.design(pair.b)]);
    this.sides.set([
      { label: this.titles().get(pair.a) ?? 'Left', design: a },
      { label: this.titles().get(pair.b) ?? 'Right', design: b },
    ]);
    this.pair.set(pair);
  }

  private design(id: string): Promise<Design> {
    let design = this.designs.get(id);
    if (!design) {
      design = this.api.design(id);
      this.designs.set(id, design);
    }
    return design;
  }
}
