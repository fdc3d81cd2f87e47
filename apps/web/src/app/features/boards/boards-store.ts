import { computed, inject, Injectable, signal } from '@angular/core';
import type { BoardDetail, BoardSummary } from '@barwright/contracts';
import { BoardsApi } from './boards-api';

/** The boards list page: "my boards" and "shared with me", as the server last answered. */
@Injectable()
export class BoardsStore {
  private readonly api = inject(BoardsApi);
  private readonly lists = signal<{ mine: readonly BoardSummary[]; shared: readonly BoardSummary[] }>({ mine: [], shared: [] });
  private readonly fetchedOnce = signal(false);
  private readonly showArchivedFlag = signal(false);

  readonly loaded = this.fetchedOnce.asReadonly();
  readonly showArchived = this.showArchivedFlag.asReadonly();
  readonly mine = computed(() => this.visible(this.lists().mine));
  readonly shared = computed(() => this.visible(this.lists().shared));
  readonly archivedCount = computed(() => [...this.lists().mine, ...this.lists().shared].filter((b) => b.archived).length);

  async load(): Promise<void> {
    this.lists.set(await this.api.list());
    this.fetchedOnce.set(true);
  }

  setShowArchived(show: boolean): void {
    this.showArchivedFlag.set(show);
  }

  async create(name: string): Promise<BoardDetail> {
    const board = await this.api.create(name);
    this.lists.update((l) => ({ ...l, mine: [board, ...l.mine] }));
    return board;
  }

  private visible(boards: readonly BoardSummary[]): readonly BoardSummary[] {
    return this.showArchivedFlag() ? boards : boards.filter((b) => !b.archived);
  }
}
