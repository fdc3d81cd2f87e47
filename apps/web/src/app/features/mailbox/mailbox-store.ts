import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import type { MailboxMessage } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The messages the server's local fake SMTP server received, newest first. Lives with the mailbox page. */
@Injectable()
export class MailboxStore {
  private readonly http = inject(HttpClient);
  private readonly list = signal<readonly MailboxMessage[]>([]);
  private readonly chosenId = signal<string | null>(null);
  private readonly fetching = signal(false);
  private readonly fetchedOnce = signal(false);

  readonly messages = this.list.asReadonly();
  readonly loading = this.fetching.asReadonly();
  readonly loaded = this.fetchedOnce.asReadonly();
  readonly selected = computed(() => this.list().find((m) => m.id === this.chosenId()) ?? null);

  async refresh(): Promise<void> {
    this.fetching.set(true);
    try {
      const messages = await firstValueFrom(this.http.get<MailboxMessage[]>('/api/dev/mailbox'));
      this.list.set([...messages].sort((a, b) => b.sentAt.localeCompare(a.sentAt)));
      this.fetchedOnce.set(true);
    } finally {
      this.fetching.set(false);
    }
  }

  select(id: string | null): void {
    this.chosenId.set(id);
  }
}
