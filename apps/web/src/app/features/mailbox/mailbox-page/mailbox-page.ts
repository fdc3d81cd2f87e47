import { BreakpointObserver } from '@angular/cdk/layout';
import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { filter, interval, map } from 'rxjs';
import { MailboxStore } from '../mailbox-store';
import { MessageView } from '../message-view/message-view';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** New mail shows up by itself: the page asks again this often while the tab is visible. */
const POLL_MS = 5000;

@Component({
  selector: 'bw-mailbox-page',
  imports: [DateTextPipe, MatButtonModule, MatIconModule, MatProgressBarModule, MessageView],
  providers: [MailboxStore],
  templateUrl: './mailbox-page.html',
  styleUrl: './mailbox-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MailboxPage {
  protected readonly store = inject(MailboxStore);
  private readonly document = inject(DOCUMENT);

  protected readonly compact = toSignal(
    inject(BreakpointObserver)
      .observe('(max-width: 839.98px)')
      .pipe(map((s) => s.matches)),
    { initialValue: false },
  );

  constructor() {
    void this.store.refresh();
    interval(POLL_MS)
      .pipe(
        filter(() => this.document.visibilityState === 'visible' && !this.store.loading()),
        takeUntilDestroyed(),
      )
      .subscribe(() => this.store.refresh().catch((error: unknown) => console.warn('Mailbox poll failed', error)));
  }

  protected refresh(): Promise<void> {
    return this.store.refresh();
  }

  protected open(id: string): void {
    this.store.select(id);
  }

  protected close(): void {
    this.store.select(null);
  }
}
