import { inject, Injectable, signal } from '@angular/core';
import type { CuratedItem } from '@barwright/contracts';
import { ModerationApi } from '../moderation-api';
import { moveItem } from './move-item';

/** The showcase as curated: its entries in order. Moves show at once and are then saved; the server's answer is kept. */
@Injectable()
export class CurationStore {
  private readonly api = inject(ModerationApi);
  private readonly list = signal<readonly CuratedItem[] | null>(null);
  private readonly saving = signal(false);

  readonly items = this.list.asReadonly();
  readonly busy = this.saving.asReadonly();

  async load(): Promise<void> {
    this.list.set(await this.api.curated());
  }

  async feature(entryId: string, note: string): Promise<CuratedItem> {
    const added = await this.api.feature(entryId, note);
    await this.load();
    return added;
  }

  async editNote(entryId: string, note: string): Promise<void> {
    const updated = await this.api.editNote(entryId, note);
    this.list.update((all) => (all ?? []).map((i) => (i.entry.id === entryId ? updated : i)));
  }

  async unfeature(entryId: string): Promise<void> {
    await this.api.unfeature(entryId);
    await this.load();
  }

  /** Moves an entry and saves the new order; on a refusal (the showcase changed meanwhile) the list is reloaded and the error passed on. */
  async move(from: number, to: number): Promise<void> {
    const before = this.list() ?? [];
    const moved = moveItem(before, from, to);
    if (moved.every((item, i) => item === before[i])) return;
    this.list.set(moved);
    this.saving.set(true);
    try {
      this.list.set(await this.api.reorder(moved.map((i) => i.entry.id), before[from].entry.id));
    } catch (error) {
      await this.load();
      throw error;
    } finally {
      this.saving.set(false);
    }
  }
}
