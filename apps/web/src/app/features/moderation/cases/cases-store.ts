import { computed, inject, Injectable, signal } from '@angular/core';
import type { ModerationCase } from '@barwright/contracts';
import { ModerationApi, type Decision } from '../moderation-api';

/** Which list a desk page shows: the open reports, or what is hidden now. */
export type CaseList = 'queue' | 'hidden';

/** The cases of one desk page, as the server last answered them; a decision replaces its case with the server's answer. */
@Injectable()
export class CasesStore {
  private readonly api = inject(ModerationApi);
  private readonly list = signal<readonly ModerationCase[] | null>(null);
  private readonly deciding = signal<string | null>(null);
  private which: CaseList = 'queue';

  readonly cases = this.list.asReadonly();
  /** The item a decision is on its way for (its buttons wait). */
  readonly busy = this.deciding.asReadonly();
  readonly openReports = computed(() => (this.list() ?? []).reduce((n, c) => n + c.openReports.length, 0));

  async load(which: CaseList): Promise<void> {
    this.which = which;
    this.list.set(which === 'queue' ? (await this.api.queue()).cases : await this.api.hidden());
  }

  async decide(c: ModerationCase, decision: Decision, words: string): Promise<ModerationCase> {
    this.deciding.set(c.item.target.id);
    try {
      const updated = await this.api.decide(c.item.target, decision, words);
      this.list.update((all) => (all ?? []).map((x) => (x.item.target.id === updated.item.target.id ? updated : x)));
      return updated;
    } finally {
      this.deciding.set(null);
    }
  }

  /** Reloads the list (a decided case leaves the queue on the next load, not under the moderator's cursor). */
  refresh(): Promise<void> {
    return this.load(this.which);
  }
}
