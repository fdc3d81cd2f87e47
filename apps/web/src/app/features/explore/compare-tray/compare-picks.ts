import { computed, Injectable, signal } from '@angular/core';
import type { EntryCard } from '@barwright/contracts';

/** At most this many bars are compared at once: four columns still read side by side. */
export const MAX_PICKS = 4;

/** A bar picked in Explore for comparing. */
export interface Pick {
  id: string;
  title: string;
  thumbnailUrl: string;
}

/** The bars picked for comparing, kept while the member pages and filters through Explore. */
@Injectable({ providedIn: 'root' })
export class ComparePicks {
  private readonly picked = signal<readonly Pick[]>([]);
  readonly picks = this.picked.asReadonly();
  readonly full = computed(() => this.picked().length >= MAX_PICKS);

  has(id: string): boolean {
    return this.picked().some((p) => p.id === id);
  }

  /** Adds or removes a bar; a fifth is refused (false). */
  toggle(entry: Pick | EntryCard): boolean {
    if (this.has(entry.id)) {
      this.remove(entry.id);
      return true;
    }
    if (this.full()) return false;
    this.picked.update((list) => [...list, { id: entry.id, title: entry.title, thumbnailUrl: entry.thumbnailUrl }]);
    return true;
  }

  remove(id: string): void {
    this.picked.update((list) => list.filter((p) => p.id !== id));
  }

  clear(): void {
    this.picked.set([]);
  }
}
