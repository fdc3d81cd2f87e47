import { ChangeDetectionStrategy, Component, computed, effect, inject, input, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Title } from '@angular/platform-browser';
import { Router, RouterLink } from '@angular/router';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { ApiError } from '../../../core/http/api-error';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { EntryCard } from '../../../shared/entry-card/entry-card';
import { PhotoGrid } from '../../shop-log/photo-grid/photo-grid';
import { CommentThread } from '../comments/comment-thread';
import { setUpFacts } from '../design-facts';
import { EntryDownloads } from '../design-views/entry-downloads';
import { EntryDrawings } from '../design-views/entry-drawings';
import { EntryStore } from '../entry-store';
import { EntryChangesView } from '../history/entry-changes';
import { RevisionHistory } from '../history/revision-history';
import { LineageView } from '../lineage/lineage-view';
import { EntryRating } from '../rating/entry-rating';
import { openRemixDialog } from '../remix/remix-dialog';
import { ReportButton } from '../../moderation/report-dialog/report-button';
import { ModeratorMenu } from '../../moderation/moderator-menu/moderator-menu';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** The design page of a published bar: drawings, cut plan, downloads, rating, lineage, shop log, comments, history. */
@Component({
  selector: 'bw-entry-page',
  imports: [
    DateTextPipe, RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule, CommentThread, EntryCard, EntryChangesView, EntryDownloads,
    EntryDrawings, EntryRating, LineageView, PhotoGrid, ModeratorMenu, ReportButton, RevisionHistory,
  ],
  providers: [EntryStore],
  templateUrl: './entry-page.html',
  styleUrl: './entry-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryPage {
  protected readonly store = inject(EntryStore);
  protected readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);
  private readonly title = inject(Title);

  readonly entryId = input.required<string>();
  protected readonly facts = computed(() => {
    const latest = this.store.latest();
    return latest ? setUpFacts(latest.design) : [];
  });
  protected readonly photoTarget = computed(() => ({ entryId: this.entryId() }));
  protected readonly returnUrl = computed(() => `/entries/${this.entryId()}`);
  protected readonly units = computed(() => this.auth.me()?.units ?? 'mm');
  protected readonly canRemix = computed(() => this.auth.signedIn() && !this.store.entry()?.hidden);

  constructor() {
    effect(() => {
      const id = this.entryId();
      untracked(() => void this.load(id));
    });
    effect(() => {
      const entry = this.store.entry();
      if (entry) this.title.setTitle(`${entry.title} · Barwright`);
    });
  }

  protected async remix(): Promise<void> {
    const entry = this.store.entry();
    if (!entry) return;
    const result = await openRemixDialog(this.dialog, { entryId: entry.id, title: entry.title });
    if (!result) return;
    void this.notifier.tell(`Remixed onto your board. Change what you like, then publish it from the board.`, undefined, 5000);
    await this.router.navigate(['/studio', result.designId]);
  }

  protected rate(stars: number): void {
    void this.store.rate(stars);
  }

  protected unrate(): void {
    void this.store.unrate();
  }

  protected async remove(): Promise<void> {
    const entry = this.store.entry();
    if (!entry) return;
    const confirmed = await confirmWith(this.dialog, {
      title: `Delete “${entry.title}” for everyone?`,
      message: 'It leaves Explore and its page closes. Remixes of it keep their own pages; their lineage shows it as no longer available. The design on your board stays.',
      confirmLabel: 'Delete entry',
      danger: true,
    });
    if (!confirmed) return;
    await this.store.remove();
    void this.notifier.tell(`“${entry.title}” is no longer published.`, undefined, 4000);
    await this.router.navigate(['/explore']);
  }

  private async load(id: string): Promise<void> {
    try {
      await this.store.load(id);
    } catch (error) {
      if (error instanceof ApiError && (error.status === 404 || error.status === 400)) {
        void this.notifier.tell('That bar is not published, or it is no longer shown.');
        await this.router.navigate(['/explore'], { replaceUrl: true });
        return;
      }
      throw error;
    }
  }
}
