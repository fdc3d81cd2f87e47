import { computed, inject, Injectable, signal } from '@angular/core';
import type { EntryCard, EntryChanges, EntryDetail, Lineage } from '@barwright/contracts';
import { EntriesApi } from './entries-api';

/** The design page of one published entry: the entry, its lineage, remixes and changes, and the viewer's rating. */
@Injectable()
export class EntryStore {
  private readonly api = inject(EntriesApi);
  private readonly current = signal<EntryDetail | null>(null);
  private readonly tree = signal<Lineage | null>(null);
  private readonly remixList = signal<EntryCard[] | null>(null);
  private readonly diff = signal<EntryChanges | null>(null);
  private readonly rating = signal(false);
  private wanted: { stars: number | null } | null = null;

  readonly entry = this.current.asReadonly();
  readonly lineage = this.tree.asReadonly();
  readonly remixes = this.remixList.asReadonly();
  readonly changes = this.diff.asReadonly();
  readonly ratingBusy = this.rating.asReadonly();
  readonly latest = computed(() => this.current()?.latest ?? null);

  async load(id: string): Promise<void> {
    this.current.set(await this.api.detail(id));
    // The rest of the page fills in as it arrives.
    const [lineage, remixes, changes] = await Promise.all([this.api.lineage(id), this.api.remixes(id), this.api.changes(id)]);
    this.tree.set(lineage);
    this.remixList.set(remixes);
    this.diff.set(changes);
  }

  /**
   * Sets the viewer's stars (null removes them). Quick changes (arrow keys across the stars) are not
   * sent one by one: while one request is on its way only the newest choice waits, and goes next.
   */
  async rate(stars: number | null): Promise<void> {
    this.wanted = { stars };
    if (this.rating()) return;
    this.rating.set(true);
    try {
      while (this.wanted) {
        const { stars: next } = this.wanted;
        this.wanted = null;
        const id = this.requireId();
        const answer = next === null ? await this.api.unrate(id) : await this.api.rate(id, next);
        this.current.update((e) => (e ? { ...e, rating: answer.rating, viewer: { ...e.viewer, myStars: answer.myStars } } : e));
      }
    } finally {
      this.wanted = null;
      this.rating.set(false);
    }
  }

  async unrate(): Promise<void> {
    await this.rate(null);
  }

  photoCount(n: number): void {
    this.current.update((e) => (e ? { ...e, photoCount: n } : e));
  }

  async remove(): Promise<void> {
    await this.api.deleteEntry(this.requireId());
  }

  private requireId(): string {
    const entry = this.current();
    if (!entry) throw new Error('The entry is not loaded yet');
    return entry.id;
  }
}
