import { LiveAnnouncer } from '@angular/cdk/a11y';
import { computed, effect, inject, Injectable, signal, untracked } from '@angular/core';
import type { Notification } from '@barwright/contracts';
import { Subject } from 'rxjs';
import { AuthStore } from '../auth/auth-store';
import { NotifySocketClient } from '../realtime/socket-client';
import { NotificationsApi } from './notifications-api';

/**
 * The signed-in member's notifications as the whole app sees them: the unread count for the bell,
 * kept live over the notification socket, and a stream of new ones for the notifications page.
 */
@Injectable({ providedIn: 'root' })
export class NotificationCenter {
  private readonly auth = inject(AuthStore);
  private readonly socket = inject(NotifySocketClient);
  private readonly api = inject(NotificationsApi);
  private readonly announcer = inject(LiveAnnouncer);
  private readonly count = signal(0);
  private readonly arrivals = new Subject<Notification>();
  /** Only a change of account reconnects (saving one's profile gives a new `me` with the same id). */
  private readonly userId = computed(() => this.auth.me()?.id ?? null);

  readonly unread = this.count.asReadonly();
  readonly live = computed(() => this.socket.state() === 'live');
  /** Notifications as they arrive (the page prepends them to its list). */
  readonly incoming$ = this.arrivals.asObservable();

  constructor() {
    // One connection per signed-in account: a new sign-in (or another account) reconnects, signing out closes it.
    effect(() => {
      const userId = this.userId();
      untracked(() => (userId ? this.start() : this.stop()));
    });
  }

  /** The count the server answered to a REST call (marking read). */
  setUnread(unread: number): void {
    this.count.set(unread);
  }

  private start(): void {
    void this.socket.connect({
      'notification:new': (notification, unread) => {
        this.count.set(unread);
        this.arrivals.next(notification);
        void this.announcer.announce(`New notification: ${notification.text}`, 'polite');
      },
      'notification:unread': (unread) => this.count.set(unread),
    });
    // The socket says the count once connected; REST answers too, in case the socket cannot get through.
    void this.api.list({ limit: 1 }).then(
      (list) => this.count.set(list.unread),
      () => undefined,
    );
  }

  private stop(): void {
    this.socket.disconnect();
    this.count.set(0);
  }
}
