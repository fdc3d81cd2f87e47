import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioChange, MatRadioModule } from '@angular/material/radio';
import { Router } from '@angular/router';
import type { EmailMode, Notification } from '@barwright/contracts';
import { NotificationCenter } from '../../../core/notifications/notification-center';
import { Notifier } from '../../../core/error-handling/notifier';
import { KIND_ICONS, KIND_LABELS } from '../notification-list';
import { NotificationsStore } from '../notifications-store';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

const EMAIL_CHOICES: readonly { mode: EmailMode; label: string; hint: string }[] = [
  { mode: 'immediate', label: 'Each one as it happens', hint: 'one e-mail per notification' },
  { mode: 'digest', label: 'A daily digest', hint: 'at most one e-mail a day' },
  { mode: 'off', label: 'No e-mail', hint: 'the bell still shows them' },
];

/** The member's notifications (live), marking read, and how they arrive by e-mail. */
@Component({
  selector: 'bw-notifications-page',
  imports: [DateTextPipe, MatButtonModule, MatIconModule, MatProgressBarModule, MatRadioModule],
  providers: [NotificationsStore],
  templateUrl: './notifications-page.html',
  styleUrl: './notifications-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotificationsPage {
  protected readonly store = inject(NotificationsStore);
  protected readonly center = inject(NotificationCenter);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);
  protected readonly icons = KIND_ICONS;
  protected readonly kinds = KIND_LABELS;
  protected readonly emailChoices = EMAIL_CHOICES;
  protected readonly savingEmail = signal(false);

  constructor() {
    void this.store.load();
  }

  protected async open(n: Notification, event: MouseEvent): Promise<void> {
    // Let the browser open a new tab for modified clicks; a plain click stays in the app.
    if (event.ctrlKey || event.metaKey || event.shiftKey || event.button !== 0) return;
    event.preventDefault();
    if (!n.read) await this.store.markRead([n.id]);
    await this.router.navigateByUrl(n.link);
  }

  protected markRead(n: Notification): void {
    void this.store.markRead([n.id]);
  }

  protected markAllRead(): void {
    void this.store.markRead();
  }

  protected async setEmail(change: MatRadioChange): Promise<void> {
    this.savingEmail.set(true);
    try {
      await this.store.setEmail(change.value as EmailMode);
      void this.notifier.tell('E-mail setting saved.', undefined, 2500);
    } finally {
      this.savingEmail.set(false);
    }
  }
}
