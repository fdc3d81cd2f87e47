import { computed, DestroyRef, inject, Injectable, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import type { EmailMode, Notification } from '@barwright/contracts';
import { NotificationCenter } from '../../core/notifications/notification-center';
import { NotificationsApi } from '../../core/notifications/notifications-api';
import { markedRead, mergeNotifications } from './notification-list';

const PAGE = 30;

/** The notifications page: the list (live arrivals merged in), paging back in time, marking read, e-mail settings. */
@Injectable()
export class NotificationsStore {
  private readonly api = inject(NotificationsApi);
  private readonly center = inject(NotificationCenter);
  private readonly items = signal<Notification[]>([]);
  private readonly fetched = signal(false);
  private readonly more = signal(false);
  private readonly mode = signal<EmailMode | null>(null);

  readonly list = this.items.asReadonly();
  readonly loaded = this.fetched.asReadonly();
  readonly hasOlder = this.more.asReadonly();
  readonly email = this.mode.asReadonly();
  readonly unreadHere = computed(() => this.items().filter((n) => !n.read).length);

  constructor() {
    this.center.incoming$.pipe(takeUntilDestroyed(inject(DestroyRef))).subscribe((n) => this.items.update((list) => mergeNotifications(list, [n])));
  }

  async load(): Promise<void> {
    const [list, settings] = await Promise.all([this.api.list({ limit: PAGE }), this.api.settings()]);
    this.items.update((current) => mergeNotifications(list.items, current));
    this.more.set(list.items.length === PAGE);
    this.center.setUnread(list.unread);
    this.mode.set(settings.email);
    this.fetched.set(true);
  }

  async loadOlder(): Promise<void> {
    const oldest = this.items().at(-1);
    if (!oldest) return;
    const list = await this.api.list({ limit: PAGE, before: oldest.createdAt });
    this.items.update((current) => mergeNotifications(current, list.items));
    this.more.set(list.items.length === PAGE);
  }

  async markRead(ids?: string[]): Promise<void> {
    const { unread } = await this.api.markRead(ids ? { ids } : { all: true });
    this.items.update((list) => markedRead(list, ids));
    this.center.setUnread(unread);
  }

  async setEmail(email: EmailMode): Promise<void> {
    const saved = await this.api.saveSettings({ email });
    this.mode.set(saved.email);
  }
}
